// rollingFigures with no feasible bearing shows the nearest miss: the candidate a stable sort on
// descending governing margin puts first, whatever the margins (equal, infinite, NaN).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { rollingFigures } from '../../src/advise/facts.js';
import { governingMargin, type CheckRecord } from '../../src/core/check.js';
import type { RollingResult } from '../../src/calc/rolling/types.js';
import type { CaseSI } from '../../src/case/types.js';

const check = (margin: number, advisory: boolean): CheckRecord => ({
  id: 'k',
  label: 'a check',
  value: 1,
  limit: 1,
  unit: '1',
  margin,
  pass: margin >= 0,
  source: 'test',
  sense: 'max',
  ...(advisory ? { advisory: true } : {}),
});

describe('rollingFigures: the nearest miss', () => {
  it('is the first candidate of a stable sort on descending governing margin', () => {
    const margin = fc.constantFrom(-0.5, -0.2, 0, 0.3, Infinity, -Infinity, NaN);
    const checks = fc.array(fc.tuple(margin, fc.boolean()), { maxLength: 3 });
    const c = { life: { hours: 1000 } } as CaseSI;
    fc.assert(
      fc.property(fc.array(checks, { maxLength: 7 }), (list) => {
        const candidates = list.map((ks, i) => ({
          id: `c${i}`,
          exclusions: [],
          checks: ks.map(([m, a]) => check(m, a)),
          L10h: 1,
        }));
        const r = { feasible: false, best: null, candidates, warnings: [] } as unknown as RollingResult;
        const sorted = [...candidates].sort((a, b) => governingMargin(b.checks) - governingMargin(a.checks));
        expect(rollingFigures(r, c).design.bearing).toBe(sorted[0]?.id);
      }),
      { numRuns: 3000 },
    );
  });
});
