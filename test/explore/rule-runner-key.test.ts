// The rule runner's memo: fact sets that differ in a way a condition can see never share a
// stored run. Awkward values: strings holding the key's own separators, a number and its text,
// NaN, null and undefined, a fact compared with another fact.
import { describe, expect, it } from 'vitest';
import type { RuleFacts } from '../../src/advise/engine.js';
import type { LoadedRule } from '../../src/advise/load-rules.js';
import { ruleRunner } from '../../src/explore/rule-runner.js';

const rule = (name: string, conditions: unknown): LoadedRule =>
  ({
    name,
    because: 'a test rule',
    source: 'test',
    conditions,
    event: { type: 'score', option: 'bushing', points: 1 },
    file: 'rules/test.json',
    concern: 'test',
  }) as unknown as LoadedRule;

const RULES = [
  rule('x-is-a-bar-b', { all: [{ fact: 'case', path: '$.x', operator: 'equal', value: 'a|b' }] }),
  rule('x-is-s1', { all: [{ fact: 'case', path: '$.x', operator: 'equal', value: 's1:' }] }),
  rule('x-is-one', { all: [{ fact: 'case', path: '$.x', operator: 'equal', value: 1 }] }),
  rule('x-is-null', { all: [{ fact: 'case', path: '$.x', operator: 'equal', value: null }] }),
  rule('x-in-list', { all: [{ fact: 'case', path: '$.x', operator: 'in', value: ['a', 'b', '1'] }] }),
  rule('y-below-5', { any: [{ fact: 'duty', path: '$.y', operator: 'lessThan', value: 5 }] }),
  rule('y-at-most-5', { all: [{ fact: 'duty', path: '$.y', operator: 'lessThanInclusive', value: 5 }] }),
  rule('y-above-w', {
    all: [{ fact: 'duty', path: '$.y', operator: 'greaterThan', value: { fact: 'duty', path: '$.w' } }],
  }),
  rule('not-z', { not: { fact: 'figures', path: '$.z', operator: 'equal', value: true } }),
];

describe('rule runner memo key', () => {
  it('fires, for every fact set, what a fresh run fires', async () => {
    const xs: unknown[] = ['a|b', 'a', 'b', 'a|', '|b', 's1:', 1, '1', null, undefined, 'null', 'u'];
    const ys: unknown[] = [1, 5, 9, NaN, '3', undefined];
    const ws: unknown[] = [2, 7, 'x', NaN];
    const zs: unknown[] = [true, false, 'true', 1, 't', 'f', undefined];
    const memo = ruleRunner(RULES, { memo: true });
    const fresh = ruleRunner(RULES);
    const names = (r: { results: { name: string }[] }) => r.results.map((x) => x.name).sort();
    let n = 0;
    for (const x of xs)
      for (const y of ys)
        for (const w of ws)
          for (const z of zs) {
            const facts = { case: { x }, duty: { y, w }, figures: { z } } as unknown as RuleFacts;
            expect(names(await memo.run(facts))).toEqual(names(await fresh.run(facts)));
            n++;
          }
    expect(n).toBe(xs.length * ys.length * ws.length * zs.length);
    expect(memo.stats.hits).toBeGreaterThan(0);
  });
});
