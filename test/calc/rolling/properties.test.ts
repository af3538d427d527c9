// Kind: properties of checkRolling (monotonic in contamination, shock and reliability;
// type preference honoured), on an invented packaging-line case: a 50 mm shaft of a
// film-unwind roll, 600 r/min, purely radial load.
import { describe, expect, it } from 'vitest';
import type { CaseSI, Contamination, Shock } from '../../../src/case/types.js';
import { checkRolling } from '../../../src/calc/rolling/index.js';

function unwindShaft(over: Partial<CaseSI> = {}): CaseSI {
  return {
    title: 'film unwind roll shaft',
    shaft: { diameter: 0.05, speed: 10 },
    load: { radial: 3000, axial: 0, shock: 'none' },
    life: { hours: 40000, wearAllowance: 0.0002, reliability: 90 },
    space: { maxLength: 0.04, maxOuterDiameter: 0.12 },
    lubrication: { supply: 'oil-bath', oilGrade: 68, inletTemperature: 30 },
    environment: { ambient: 30, contamination: 'normal', startsPerHour: 1 },
    priorities: { cost: 3, friction: 3, maintenance: 3, noise: 3, precision: 3 },
    ...over,
  };
}

const lifeOf = (c: CaseSI, id = 'dgb-02-50') => checkRolling(c).candidates.find((k) => k.id === id)!.L10mh!;

describe('monotonic behaviour', () => {
  it('cleaner oil gives a longer modified life (e_C grows from severe to clean)', () => {
    const levels: Contamination[] = ['severe', 'dirty', 'normal', 'clean'];
    const lives = levels.map((l) =>
      lifeOf(unwindShaft({ environment: { ambient: 30, contamination: l, startsPerHour: 1 } })),
    );
    for (let i = 1; i < lives.length; i++) expect(lives[i]!).toBeGreaterThan(lives[i - 1]!);
  });
  it('heavier shock lowers the life (service factor) and raises the static-safety limit', () => {
    const shocks: Shock[] = ['none', 'light', 'moderate', 'heavy'];
    const runs = shocks.map(
      (s) => checkRolling(unwindShaft({ load: { radial: 3000, axial: 0, shock: s } })).candidates[0]!,
    );
    for (let i = 1; i < runs.length; i++) {
      expect(runs[i]!.L10h!).toBeLessThan(runs[i - 1]!.L10h!);
      const lim = (k: (typeof runs)[number]) => k.checks.find((x) => x.id === 'static-safety')!.limit;
      expect(lim(runs[i]!)).toBeGreaterThanOrEqual(lim(runs[i - 1]!));
    }
  });
  it('higher reliability lowers L10mh by a1 and raises the required rating', () => {
    const r90 = checkRolling(unwindShaft());
    const r99 = checkRolling(unwindShaft({ life: { hours: 40000, wearAllowance: 0.0002, reliability: 99 } }));
    const k90 = r90.candidates[0]!;
    const k99 = r99.candidates[0]!;
    expect(k99.L10mh! / k90.L10mh!).toBeCloseTo(k99.a1, 9);
    expect(r99.requiredDynamicRating!).toBeGreaterThan(r90.requiredDynamicRating!);
  });
});

describe('type preference and roller bearings', () => {
  it('type "roller" lists only roller kinds; the pure radial load goes to a cylindrical roller bearing', () => {
    const r = checkRolling(unwindShaft({ rolling: { type: 'roller' } }));
    expect(r.candidates.length).toBeGreaterThan(0);
    expect(r.candidates.every((k) => k.type === 'roller')).toBe(true);
    expect(r.chosen?.kind).toBe('cylindrical roller');
    const k = r.candidates[0]!;
    expect(k.L10).toBeCloseTo(Math.pow(k.dynamicRating / k.equivalentLoad, 10 / 3), 6);
  });
  it('ball and roller of one envelope: the ball is preferred when both pass (it also takes thrust)', () => {
    const r = checkRolling(unwindShaft());
    const best = r.candidates.find((k) => k.id === r.best)!;
    expect(best.type).toBe('ball');
  });
});
