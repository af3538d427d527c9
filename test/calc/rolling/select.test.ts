// Kind: properties of the choice among evaluated candidates (select.ts): the lead of each kind
// found in one pass is the one a stable sort puts first, on invented candidates whose checks
// tie, pass without limits (margin Infinity) or carry a NaN margin.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { governingMargin, makeCheck } from '../../../src/core/check.js';
import { bestCandidate, leadOfEachKind } from '../../../src/calc/rolling/select.js';
import { newNotes } from '../../../src/calc/rolling/findings.js';
import { ROLLING_KINDS } from '../../../src/calc/rolling/kinds.js';
import type { RollingCandidate } from '../../../src/calc/rolling/types.js';

/** An invented candidate with only what the choice reads. */
function candidate(
  i: number,
  kind: RollingCandidate['kind'],
  feasible: boolean,
  margins: number[],
  exclusions: number,
  outer: number | null,
): RollingCandidate {
  return {
    id: `c${i}`,
    type: kind.endsWith('ball') ? 'ball' : 'roller',
    kind,
    form: null,
    arrangement: 'single',
    ratingSource: 'estimated',
    outerDiameter: outer,
    width: 0.02,
    feasible,
    exclusions: Array.from({ length: exclusions }, () => ({ code: 'rolling.no-axial-capacity', values: {} })),
    // A margin m as a "max" check of limit 1: value 1 − m.
    checks: margins.map((m, j) => makeCheck(`k${j}`, 'invented', 1 - m, 1, '1', 'max', 'invented')),
  } as unknown as RollingCandidate;
}

/** The nearest miss by the definition: the first of a stable sort on (exclusions ascending, margin descending). */
function nearestMissBySort(of: RollingCandidate[]): RollingCandidate | undefined {
  const margin = new Map(of.map((k) => [k, governingMargin(k.checks)]));
  return [...of].sort((a, b) => a.exclusions.length - b.exclusions.length || margin.get(b)! - margin.get(a)!)[0];
}

const kinds = fc.constantFrom(...ROLLING_KINDS);
// Few distinct margins so that ties are common; none (margin Infinity) and NaN among them.
const margins = fc.array(fc.constantFrom(-0.5, 0, 0.25, 0.25, 1, NaN), { maxLength: 3 });
const candidates = fc
  .array(fc.tuple(kinds, fc.boolean(), margins, fc.integer({ min: 0, max: 2 }), fc.constantFrom(0.05, 0.06, null)), {
    maxLength: 20,
  })
  .map((xs) => xs.map(([kind, feasible, m, ex, outer], i) => candidate(i, kind, feasible, m, ex, outer)));

describe('leadOfEachKind', () => {
  it('takes, per kind in order, the best feasible candidate, else the first of the stable sort on exclusions and margin', () => {
    fc.assert(
      fc.property(candidates, (list) => {
        const leads = leadOfEachKind(list);
        const expected: RollingCandidate[] = [];
        for (const kind of ROLLING_KINDS) {
          const of = list.filter((k) => k.kind === kind);
          const feasible = of.filter((k) => k.feasible);
          // Among feasible candidates of one kind here only the size and the order differ.
          const sized = [...feasible].sort(
            (a, b) =>
              (a.outerDiameter === null ? 1 : 0) - (b.outerDiameter === null ? 1 : 0) ||
              (a.outerDiameter ?? 0) - (b.outerDiameter ?? 0),
          );
          const lead = sized[0] ?? nearestMissBySort(of);
          if (lead) expected.push(lead);
        }
        expect(leads.map((k) => k.id)).toEqual(expected.map((k) => k.id));
      }),
      { numRuns: 300, seed: 17 },
    );
  });

  it('picks the earlier of two misses with equal margins, and prefers fewer exclusions to a larger margin', () => {
    const a = candidate(0, 'tapered roller', false, [-0.25], 0, 0.05);
    const b = candidate(1, 'tapered roller', false, [-0.25], 0, 0.05);
    const c = candidate(2, 'tapered roller', false, [0.5], 1, 0.05);
    expect(leadOfEachKind([c, a, b]).map((k) => k.id)).toEqual(['c0']);
  });
});

describe('bestCandidate', () => {
  it('is the lead of its kind when one is feasible, null when none is', () => {
    fc.assert(
      fc.property(candidates, (list) => {
        const best = bestCandidate(list, newNotes());
        if (!list.some((k) => k.feasible)) expect(best).toBeNull();
        else {
          expect(best!.feasible).toBe(true);
          expect(leadOfEachKind(list)).toContain(best);
        }
      }),
      { numRuns: 200, seed: 17 },
    );
  });
});
