// Kind: the friction moment M = M_v + M_l (Palmgren 1959; Harris & Kotzalas 2007, chapter on
// friction; formulas and factors from memory, factors in data/rolling-running.json) on
// hand-worked numbers, the shares of a pair, and the property that the moment grows with load
// and with speed. No published worked example could be read; the numbers below are worked
// by hand from the formulas.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  bearingShares,
  frictionMoment,
  viscousMoment,
  type FrictionInput,
} from '../../../src/calc/rolling/friction.js';
import { ARRANGEMENTS, ROLLING_KINDS } from '../../../src/calc/rolling/kinds.js';

// Invented scenario: a deep-groove ball bearing, bore 40, outside 80 (dm = 60 mm), C0 = 19 kN,
// 1500 r/min in an oil bath of 20 mm²/s at operating temperature, 4 kN radial.
const bath: FrictionInput = {
  kind: 'deep-groove ball',
  form: null,
  arrangement: 'single',
  supply: 'oil-bath',
  nu: 20e-6,
  n: 25,
  dm: 0.06,
  Fr: 4000,
  Fa: 0,
  C0: 19000,
};

describe('viscous term M_v = 10⁻⁷·f0·(ν·n)^(2/3)·dm³ (N·mm; ν mm²/s, n r/min, dm mm)', () => {
  it('f0 = 2, ν·n = 20·1500 = 30 000, ^(2/3) = 965.49; ·60³ = 41.71 N·mm', () => {
    expect(viscousMoment(2, 20e-6, 25, 0.06)).toBeCloseTo(0.041709, 6);
  });
  it('below ν·n = 2000: 160·10⁻⁷·f0·dm³ = 160e-7·2·216 000 = 6.912 N·mm, and the two forms nearly meet there', () => {
    expect(viscousMoment(2, 1e-6, 1000 / 60, 0.06)).toBeCloseTo(0.006912, 9);
    const below = viscousMoment(2, 1e-6, 1999 / 60, 0.06);
    const above = viscousMoment(2, 1e-6, 2001 / 60, 0.06);
    expect(Math.abs(above / below - 1)).toBeLessThan(0.01);
  });
  it('no rotation, no viscous moment', () => {
    expect(viscousMoment(2, 20e-6, 0, 0.06)).toBe(0);
  });
});

describe('load term M_l = f1·P1·dm, f1 = z·(P0/C0)^y', () => {
  it('deep-groove ball: P0 = 4000 N, (4000/19 000)^0.55 = 0.42444, f1 = 0.0005·0.42444 = 2.1222e-4; M_l = 2.1222e-4·4000·0.06 = 0.050933 N·m', () => {
    const m = frictionMoment(bath);
    expect(m.f1[0]).toBeCloseTo(2.1222e-4, 8);
    expect(m.P1[0]).toBe(4000);
    expect(m.load).toBeCloseTo(0.050933, 6);
    expect(m.viscous).toBeCloseTo(0.041709, 6);
    expect(m.total).toBeCloseTo(0.092642, 6);
  });
  it('axial load: P1 = max(3·Fa − 0.1·Fr, Fr) = 3·2000 − 400 = 5600 N; P0 = 0.6·4000 + 0.5·2000 = 3400 < Fr, so 4000', () => {
    const m = frictionMoment({ ...bath, Fa: 2000 });
    expect(m.P1[0]).toBeCloseTo(5600, 9);
    expect(m.f1[0]).toBeCloseTo(2.1222e-4, 8);
  });
  it('a given P0 replaces the estimate', () => {
    const m = frictionMoment({ ...bath, P0: 9500 });
    expect(m.f1[0]).toBeCloseTo(0.0005 * Math.pow(0.5, 0.55), 12);
  });
  it('tapered roller: f1 = 0.0004, P1 = max(3·Fa, Fr)', () => {
    const m = frictionMoment({ ...bath, kind: 'tapered roller', Fa: 2000 });
    expect(m.f1[0]).toBe(0.0004);
    expect(m.P1[0]).toBe(6000);
    expect(m.load).toBeCloseTo(0.0004 * 6000 * 0.06, 12);
  });
  it('cylindrical roller with axial load adds the rib term 0.005·Fa·dm', () => {
    const none = frictionMoment({ ...bath, kind: 'cylindrical roller', form: 'ribs on both rings' });
    const ax = frictionMoment({ ...bath, kind: 'cylindrical roller', form: 'ribs on both rings', Fa: 500 });
    expect(ax.load - none.load).toBeCloseTo(0.005 * 500 * 0.06, 12);
  });
});

describe('pairs', () => {
  it('back-to-back: radial load shared, axial on one bearing; tandem shares both', () => {
    expect(bearingShares('pair back-to-back', 4000, 1000)).toEqual([
      { Fr: 2000, Fa: 1000 },
      { Fr: 2000, Fa: 0 },
    ]);
    expect(bearingShares('pair tandem', 4000, 1000)).toEqual([
      { Fr: 2000, Fa: 500 },
      { Fr: 2000, Fa: 500 },
    ]);
  });
  it('a pair churns twice the oil of one bearing', () => {
    const one = frictionMoment({ ...bath, kind: 'angular-contact ball' });
    const two = frictionMoment({ ...bath, kind: 'angular-contact ball', arrangement: 'pair face-to-face' });
    expect(two.viscous).toBeCloseTo(2 * one.viscous, 12);
  });
});

describe('the moment grows with load, and with speed above ν·n = 2000 (property)', () => {
  it('for every kind, arrangement and supply', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...ROLLING_KINDS),
        fc.constantFrom(...ARRANGEMENTS),
        fc.constantFrom('grease' as const, 'oil-bath' as const, 'oil-feed' as const),
        fc.double({ min: 100, max: 50000, noNaN: true }),
        fc.double({ min: 0.5, max: 100, noNaN: true }),
        (kind, arrangement, supply, Fr, n) => {
          const x: FrictionInput = { ...bath, kind, arrangement, supply, Fr, n, Fa: 0.1 * Fr };
          const m = frictionMoment(x);
          const heavier = frictionMoment({ ...x, Fr: 1.5 * Fr, Fa: 0.15 * Fr });
          const faster = frictionMoment({ ...x, n: 1.5 * n });
          expect(heavier.total).toBeGreaterThan(m.total);
          // Palmgren's viscous term is flat below ν·n = 2000 (mm²/s·r/min): there it must not fall
          if (bath.nu * 1e6 * n * 60 >= 2000) expect(faster.total).toBeGreaterThan(m.total);
          else expect(faster.total).toBeGreaterThanOrEqual(m.total);
          expect(heavier.viscous).toBeCloseTo(m.viscous, 12);
        },
      ),
      { numRuns: 200 },
    );
  });
});
