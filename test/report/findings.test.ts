// Findings as data: every finding the kernels and the advisor emit over the example cases and
// the scenario matrix has words, and the words are the report's alone (a property of the code,
// not physics).
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { advise } from '../../src/advise/engine.js';
import { parseCaseText, validateCase, type LoadedCase } from '../../src/case/load.js';
import type { Finding } from '../../src/core/finding.js';
import { describe as wordOf, describeAssumption, describeWarning } from '../../src/report/findings/index.js';
import { worded } from '../../src/report/findings/worded.js';
import { SCENARIOS } from '../advise/scenarios.js';

const ROOT = join(import.meta.dirname, '../..');
const exampleFiles = (dir: string) =>
  readdirSync(join(ROOT, dir))
    .filter((f) => f.endsWith('.yaml'))
    .map((f) => join(dir, f));

const cases: [string, LoadedCase][] = [
  ...[...exampleFiles('examples'), ...exampleFiles('examples/batch')].map((f): [string, LoadedCase] => [
    f,
    parseCaseText(readFileSync(join(ROOT, f), 'utf8'), f),
  ]),
  ...SCENARIOS.map((s): [string, LoadedCase] => [s.id, validateCase(s.case, s.id)]),
];

/** Every finding object anywhere in a value. */
function findingsIn(value: unknown, out: Finding[] = []): Finding[] {
  if (Array.isArray(value)) value.forEach((v) => findingsIn(v, out));
  else if (typeof value === 'object' && value !== null) {
    if (typeof (value as Finding).code === 'string' && typeof (value as Finding).values === 'object')
      out.push(value as Finding);
    else Object.values(value).forEach((v) => findingsIn(v, out));
  }
  return out;
}

describe('findings', () => {
  it.each(cases)('%s: every finding has words, and the JSON form holds none unworded', async (_id, loaded) => {
    const a = await advise(loaded.case, loaded.assumed);
    const found = findingsIn(a);
    expect(found.length).toBeGreaterThan(0);
    for (const f of found) {
      const text = 'field' in f ? describeAssumption(f as Finding & { field: string }).reason : wordOf(f);
      expect(text.length, f.code).toBeGreaterThan(0);
      expect(text, f.code).not.toMatch(/undefined|NaN|\[object Object\]/);
    }
    for (const w of a.warnings) expect(describeWarning(w)).toMatch(/^(bushing|rolling|journal): /);
    expect(findingsIn(worded(a))).toEqual([]);
  });

  it('an unknown code is a defect, not a silent blank', () => {
    expect(() => wordOf({ code: 'bushing.no-such-finding', values: {} })).toThrow(/no wording/);
  });
});
