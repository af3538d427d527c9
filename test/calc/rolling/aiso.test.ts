// Kind: published-formula checks (ISO 281:2007, cl. 9.3 and annex, a_ISO and ν1; the
// formulas and constants from memory) on values worked by hand from the formulas, plus
// the behaviour at the method's edges.
import { describe, expect, it } from 'vitest';
import { AISO_CAP, aIso, estimatedFatigueLimit, ratedViscosity } from '../../../src/calc/rolling/aiso.js';

/** The standard's formula written out again, independently of the kernel, for continuity checks. */
function ballFormula(y: number, z: number, kappa: number, eCCuP: number): number {
  return 0.1 * Math.pow(1 - Math.pow(2.5671 - y / Math.pow(kappa, z), 0.83) * Math.pow(eCCuP, 1 / 3), -9.3);
}
function rollerFormula(y: number, z: number, kappa: number, eCCuP: number): number {
  return 0.1 * Math.pow(1 - (1.5859 - y / Math.pow(kappa, z)) * Math.pow(eCCuP, 0.4), -9.185);
}

describe('a_ISO in each κ band (values worked by hand from the formula, 6 figures)', () => {
  // κ = 0.2: 0.2^0.054381 = 0.91623; 2.2649/0.91623 = 2.47198; 2.5671 − 2.47198 = 0.095036;
  // ^0.83 = 0.14184; × 0.5^(1/3) = 0.79370 → 0.11258; 1 − 0.11258 = 0.88742; ^−9.3 = 3.03538 → 0.30354.
  it('ball, 0.1 ≤ κ < 0.4: κ = 0.2, e_C·Cu/P = 0.5 → 0.30354', () => {
    expect(aIso('ball', 0.2, 0.5).aISO).toBeCloseTo(0.303538, 5);
  });
  it('ball, 0.4 ≤ κ < 1: κ = 0.6, e_C·Cu/P = 0.3 → 2.39054', () => {
    expect(aIso('ball', 0.6, 0.3).aISO).toBeCloseTo(2.390539, 4);
  });
  it('ball, 1 ≤ κ ≤ 4: κ = 2, e_C·Cu/P = 0.2 → 15.1127', () => {
    expect(aIso('ball', 2, 0.2).aISO).toBeCloseTo(15.11269, 3);
  });
  it('roller in the three bands: 0.15179, 0.39445, 0.93368', () => {
    expect(aIso('roller', 0.2, 0.5).aISO).toBeCloseTo(0.1517885, 5);
    expect(aIso('roller', 0.6, 0.3).aISO).toBeCloseTo(0.3944496, 5);
    expect(aIso('roller', 2, 0.2).aISO).toBeCloseTo(0.9336847, 5);
  });
});

describe('continuity between bands with the published constants', () => {
  it('at κ = 1 the two bands agree exactly (both give y/κ^z = y = 1.9987 / 1.2348)', () => {
    // e_C·Cu/P kept small enough that the ball value stays under the cap of 50
    for (const e of [0.02, 0.05, 0.1]) {
      expect(ballFormula(1.9987, 0.19087, 1, e)).toBe(ballFormula(1.9987, 0.071739, 1, e));
      expect(rollerFormula(1.2348, 0.19087, 1, e)).toBe(rollerFormula(1.2348, 0.071739, 1, e));
      expect(aIso('ball', 1, e).aISO).toBeCloseTo(ballFormula(1.9987, 0.19087, 1, e), 12);
    }
  });
  it('at κ = 0.4 the bands differ by less than 0.1 % (ball) and 0.001 % (roller) for e_C·Cu/P ≤ 1', () => {
    // Bracket term at 0.4: 0.186484 (lower band) against 0.186412 (upper band) for the ball;
    // the rounded five-figure constants leave this step, largest at high e_C·Cu/P
    // (0.097 % at e_C·Cu/P = 1). Roller: 0.1151082 against 0.1151074, under 10^-5 relative.
    for (const e of [0.1, 0.5, 1]) {
      const below = ballFormula(2.2649, 0.054381, 0.4, e);
      const above = aIso('ball', 0.4, e).aISO;
      expect(Math.abs(below / above - 1)).toBeLessThan(1e-3);
      expect(Math.abs(below / above - 1)).toBeGreaterThan(1e-5); // the step is real, not zero
      const rb = rollerFormula(1.3993, 0.054381, 0.4, e);
      expect(Math.abs(rb / aIso('roller', 0.4, e).aISO - 1)).toBeLessThan(1e-5);
    }
  });
});

describe('edges of the method', () => {
  it('κ = 0.1: the bracket term 2.5671 − 2.2649/0.1^0.054381 is only 7.5e-5, so a_ISO ≈ 0.1 whatever e_C·Cu/P', () => {
    // ball: 0.10028 at e_C·Cu/P = 0.5, 0.10035 at 1, 0.10060 at 5 (worked from the formula)
    expect(aIso('ball', 0.1, 0.5).aISO).toBeCloseTo(0.10028, 5);
    expect(aIso('ball', 0.1, 5).aISO).toBeCloseTo(0.100604, 5);
  });
  it('κ = 0.1, roller: the term is −5.9e-5 (the formula would give 0.09995); held at zero, a_ISO = 0.1 exactly', () => {
    expect(aIso('roller', 0.1, 1).aISO).toBe(0.1);
  });
  it('e_C·Cu/P → 0 gives a_ISO → 0.1 at any κ (the bracket tends to 1)', () => {
    for (const k of [0.15, 0.5, 2, 4]) {
      expect(aIso('ball', k, 0).aISO).toBe(0.1);
      expect(aIso('ball', k, 1e-12).aISO).toBeCloseTo(0.1, 3);
    }
  });
  it('κ > 4 is taken as 4', () => {
    const a = aIso('ball', 9, 0.1);
    expect(a.kappaRange).toBe('above');
    expect(a.kappaUsed).toBe(4);
    expect(a.aISO).toBeCloseTo(aIso('ball', 4, 0.1).aISO, 12);
    expect(aIso('ball', 4, 0.1).aISO).toBeCloseTo(7.201835, 4); // worked from the formula
  });
  it('κ < 0.1 is flagged as outside the method, never NaN', () => {
    const a = aIso('ball', 0.03, 0.5);
    expect(a.kappaRange).toBe('below');
    expect(Number.isFinite(a.aISO)).toBe(true);
  });
  it('a load ratio that is not a number (0/0) gives the floor 0.1, not the cap of 50', () => {
    expect(aIso('ball', 2, NaN)).toMatchObject({ aISO: 0.1, capped: false });
    expect(aIso('roller', 2, NaN)).toMatchObject({ aISO: 0.1, capped: false });
  });
  it('roller at κ = 0.1 (term held at zero) stays at the floor even for an unbounded load ratio (0·∞)', () => {
    expect(aIso('roller', 0.1, Infinity)).toMatchObject({ aISO: 0.1, capped: false });
  });
  it('a large e_C·Cu/P drives the bracket to zero or below: capped at 50, finite', () => {
    const a = aIso('ball', 4, 10);
    expect(a.aISO).toBe(AISO_CAP);
    expect(a.capped).toBe(true);
  });
});

describe('rated viscosity ν1 (ISO 281:2007, from memory)', () => {
  it('n < 1000 r/min: 45000·500^-0.83·50^-0.5 = 36.6085 mm²/s', () => {
    expect(ratedViscosity(500 / 60, 0.05)! * 1e6).toBeCloseTo(36.60854, 3);
  });
  it('n ≥ 1000 r/min: 4500·3000^-0.5·50^-0.5 = 11.6190 mm²/s', () => {
    expect(ratedViscosity(3000 / 60, 0.05)! * 1e6).toBeCloseTo(11.61895, 3);
  });
  it('the two branches are 2.3 % apart at 1000 r/min (45000·1000^-0.83 = 145.6 against 4500·1000^-0.5 = 142.3)', () => {
    const below = ratedViscosity(999.999 / 60, 0.05)!;
    const at = ratedViscosity(1000 / 60, 0.05)!;
    expect(below / at).toBeGreaterThan(1.02);
    expect(below / at).toBeLessThan(1.025);
  });
  it('null with no rotation', () => {
    expect(ratedViscosity(0, 0.05)).toBeNull();
  });
});

describe('fatigue load limit estimate (ISO 281:2007 Annex B, from memory: Cu ≈ C0/22 ball, C0/8.2 roller)', () => {
  it('dm ≤ 100 mm: plain ratios', () => {
    expect(estimatedFatigueLimit('ball', 22000, 0.06)).toBeCloseTo(1000, 9);
    expect(estimatedFatigueLimit('roller', 8200, 0.06)).toBeCloseTo(1000, 9);
  });
  it('dm = 144 mm: times (100/144)^0.5 = 0.8333', () => {
    expect(estimatedFatigueLimit('ball', 22000, 0.144)).toBeCloseTo(1000 / 1.2, 6);
  });
  // Source: ISO 281:2007 Annex B, from memory — roller bearings above dm = 100 mm:
  // Cu = C0/8.2·(100/dm)^0.3. Worked by hand: C0 = 8200 N, dm = 200 mm:
  // (100/200)^0.3 = 1/2^0.3 = 1/1.231144 = 0.812252 → Cu = 1000 N·0.812252 = 812.252 N
  // (the ball exponent 0.5 would give 707.107 N).
  it('roller, dm = 200 mm: times (100/200)^0.3 = 0.812252 → 812.252 N', () => {
    expect(estimatedFatigueLimit('roller', 8200, 0.2)).toBeCloseTo(812.252, 2);
  });
  // Same formula at dm = 144 mm: ln(100/144) = −0.364643, × 0.3 = −0.109393, exp(−0.109393) = 1 − 0.109393 + 0.005983 − 0.000218 + 0.000006 = 0.896378.
  it('roller, dm = 144 mm: times (100/144)^0.3 = 0.896378 (not the ball factor 0.8333)', () => {
    expect(estimatedFatigueLimit('roller', 8200, 0.144)).toBeCloseTo(896.378, 2);
  });
});
