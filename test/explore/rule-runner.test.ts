// Equivalence test: advise() with the sweep's rule runner (one Engine, own path resolver,
// memo) gives the same ranking as advise() with its own fresh Engine per case.
import { describe, expect, it } from 'vitest';
import { advise } from '../../src/advise/engine.js';
import { loadRules } from '../../src/advise/load-rules.js';
import { ruleRunner, resolvePath } from '../../src/explore/rule-runner.js';
import { scaleCase } from '../../src/explore/scale.js';
import { oilFedLineShaft, pivot } from './cases.js';
import { pumpCase } from '../helpers/case.js';

const strip = (a: Awaited<ReturnType<typeof advise>>) => ({
  recommendation: a.recommendation,
  ranking: a.ranking,
  tieBreak: a.tieBreak,
  toMakeFeasible: a.toMakeFeasible,
  warnings: a.warnings,
});

describe('rule runner', () => {
  it('resolves the simple paths the rule schema admits', () => {
    expect(resolvePath({ a: { b: [1, { c: 2 }] } }, '$.a.b[1].c')).toBe(2);
    expect(resolvePath({ a: 1 }, '$.x.y')).toBeUndefined();
    expect(resolvePath({ a: 1 }, '$')).toEqual({ a: 1 });
  });

  it('memo and reused Engine give the same advice as a fresh Engine, over scaled cases', async () => {
    const rules = loadRules();
    const memo = ruleRunner(rules, { memo: true });
    const plain = ruleRunner(rules);
    const bases = [oilFedLineShaft().case, pivot('6000 h').case, pumpCase()];
    let n = 0;
    for (const c of bases)
      for (const fl of [0.2, 1, 4])
        for (const fn of [0.1, 1, 8]) {
          const cc = scaleCase(c, fl, fn);
          const ref = await advise(cc, [], rules);
          const a = await advise(cc, [], rules, { runRules: memo.run });
          const b = await advise(cc, [], rules, { runRules: plain.run });
          expect(strip(a)).toEqual(strip(ref));
          expect(b).toEqual(ref);
          n++;
        }
    expect(n).toBe(27);
    expect(memo.stats.hits).toBeGreaterThan(0);
  });
});
