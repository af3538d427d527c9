// compareFigures against its plain definition (each ratio from a pool built for that option),
// over figures with the awkward numbers a check can give: null, 0 and -0, NaN and Infinity.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compareFigures, type Figures, type OptionFigures } from '../../src/advise/facts.js';
import { OPTIONS, type OptionName } from '../../src/core/options.js';

type Measure = 'frictionPower' | 'lifeHours' | 'length' | 'outerDiameter';

function ratioToBest(figs: Figures, option: OptionName, key: Measure, best: 'min' | 'max'): number | null {
  const own = figs[option][key];
  const pool = OPTIONS.filter((o) => figs[o].feasible)
    .map((o) => figs[o][key])
    .filter((x): x is number => typeof x === 'number' && Number.isFinite(x));
  if (own === null || !Number.isFinite(own) || !pool.length) return null;
  const ref = best === 'min' ? Math.min(...pool) : Math.max(...pool);
  if (ref === 0) return own === 0 ? 1 : null;
  return own / ref;
}

function reference(figs: Figures): Figures {
  const feasible = OPTIONS.filter((o) => figs[o].feasible);
  const out = {} as Figures;
  for (const o of OPTIONS) {
    const f = figs[o];
    const mine = f.frictionPower;
    const others = feasible
      .filter((x) => x !== o)
      .map((x) => figs[x].frictionPower)
      .filter((x): x is number => x !== null);
    const pool = feasible.map((x) => figs[x].frictionPower).filter((x): x is number => x !== null);
    out[o] = {
      ...f,
      compare: {
        feasibleCount: feasible.length,
        frictionToLowest: ratioToBest(figs, o, 'frictionPower', 'min'),
        frictionLowest: f.feasible && mine !== null && others.length > 0 && others.every((x) => mine <= x),
        frictionMargin: mine === null || !others.length ? null : Math.min(...others) - mine,
        frictionAboveLowest: mine === null || !pool.length ? null : mine - Math.min(...pool),
        lifeToLongest: ratioToBest(figs, o, 'lifeHours', 'max'),
        lengthToShortest: ratioToBest(figs, o, 'length', 'min'),
        outerDiameterToSmallest: ratioToBest(figs, o, 'outerDiameter', 'min'),
      },
    };
  }
  return out;
}

describe('compareFigures', () => {
  it('equals its plain definition for any three options', () => {
    const n = fc.constantFrom<number | null>(null, 0, -0, 1, 2.5, 7, NaN, Infinity);
    const option: fc.Arbitrary<OptionFigures> = fc.record({
      feasible: fc.boolean(),
      design: fc.constant({}),
      lifeHours: n,
      lifeRatio: fc.constant(null),
      frictionPower: n,
      length: n,
      outerDiameter: n,
      failed: fc.constant([]),
      why: fc.constant([]),
    });
    fc.assert(
      fc.property(option, option, option, (bushing, rolling, journal) => {
        const figs = { bushing, rolling, journal } as Figures;
        expect(compareFigures(figs)).toStrictEqual(reference(figs));
      }),
      { numRuns: 3000 },
    );
  });
});
