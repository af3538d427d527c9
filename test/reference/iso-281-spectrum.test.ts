// Kind: published-formula check. A two-point duty worked by hand from the formulas of
// ISO 281:2007 (ν1, κ = ν/ν1 and a_ISO of cl. 9.3, L10 = (C/P)^p, L10m = a1·a_ISO·L10; the
// formulas and constants from memory) and combined by the Palmgren–Miner linear damage rule
// (Palmgren 1924, Z. VDI 68, 339–341; Miner 1945, J. Appl. Mech. 12, A159–A164; from memory).
// Invented scenario: a conveyor head shaft on a radial ball bearing, C = 32 kN, Cu = 640 N,
// dm = 65 mm, e_C = 0.5, a1 = 1 (90 % reliability).
import { describe, expect, it } from 'vitest';
import { aIso, ratedViscosity } from '../../src/calc/rolling/aiso.js';
import { spectrumLife } from '../../src/calc/rolling/spectrum.js';

const bearing = { type: 'ball' as const, C: 32000, Cu: 640, dm: 0.065, eC: 0.5, a1: 1 };
const rpm = (r: number) => r / 60;
const mm2s = (v: number) => v * 1e-6;

// Point 1: P = 4000 N, 1500 r/min, 60 % of the time, ν = 20 mm²/s (warm).
// Point 2: P = 8000 N, 300 r/min, 40 % of the time, ν = 40 mm²/s (cooler, slower).
const duty = [
  { P: 4000, n: rpm(1500), t: 0.6, nu: mm2s(20) },
  { P: 8000, n: rpm(300), t: 0.4, nu: mm2s(40) },
];

describe('two-point spectrum worked by hand (ISO 281:2007 cl. 9.3 formulas, from memory)', () => {
  const r = spectrumLife(duty, bearing);

  // Point 1, n = 1500 r/min ≥ 1000: ν1 = 4500·n^−0.5·dm^−0.5 = 4500/(38.7298·8.06226) = 14.4115 mm²/s;
  // κ1 = 20/14.4115 = 1.38778 (band 1 ≤ κ ≤ 4: y = 1.9987, z = 0.071739);
  // κ1^z = exp(0.071739·ln 1.38778) = exp(0.023509) = 1.023788; y/κ^z = 1.95226;
  // 2.5671 − 1.95226 = 0.614840, ^0.83 = 0.667840; e_C·Cu/P = 0.5·640/4000 = 0.08, ^(1/3) = 0.430887;
  // bracket 1 − 0.667840·0.430887 = 0.712237, ^−9.3 = 23.4744 → a_ISO,1 = 2.34744.
  // L10,1 = (32000/4000)^3 = 512; L10m,1 = 1201.89·10⁶ rev; L10mh,1 = 1201.89·10⁶/(60·1500) = 13 354.3 h.
  it('point 1: ν1 = 14.4115 mm²/s, κ = 1.38778, a_ISO = 2.34744, L10mh = 13 354.3 h', () => {
    expect(ratedViscosity(rpm(1500), 0.065)! * 1e6).toBeCloseTo(14.411534, 4);
    expect(r.points[0]!.kappa).toBeCloseTo(1.387777, 5);
    expect(r.points[0]!.aISO).toBeCloseTo(2.347441, 4);
    expect(r.points[0]!.L10mh).toBeCloseTo(13354.33, 0);
    expect(r.points[0]!.kappaRange).toBe('inside');
  });

  // Point 2, n = 300 r/min < 1000: ν1 = 45000·n^−0.83·dm^−0.5; 300^0.83 = exp(0.83·5.703782) = 113.770;
  // ν1 = 45000/(113.770·8.06226) = 49.0620 mm²/s; κ2 = 40/49.0620 = 0.815295 (band 0.4 ≤ κ < 1:
  // y = 1.9987, z = 0.19087); κ^z = exp(0.19087·(−0.204209)) = 0.961773; y/κ^z = 2.07814;
  // 2.5671 − 2.07814 = 0.488959, ^0.83 = 0.552200; e_C·Cu/P = 0.04, ^(1/3) = 0.341995;
  // bracket 1 − 0.188850 = 0.811150, ^−9.3 = 7.00419 → a_ISO,2 = 0.700419.
  // L10,2 = 4^3 = 64; L10m,2 = 44.8268·10⁶ rev; L10mh,2 = 44.8268·10⁶/(60·300) = 2490.38 h.
  it('point 2: ν1 = 49.0620 mm²/s, κ = 0.815295, a_ISO = 0.700419, L10mh = 2490.38 h', () => {
    expect(ratedViscosity(rpm(300), 0.065)! * 1e6).toBeCloseTo(49.061994, 4);
    expect(r.points[1]!.kappa).toBeCloseTo(0.815295, 5);
    expect(r.points[1]!.aISO).toBeCloseTo(0.700419, 5);
    expect(r.points[1]!.L10mh).toBeCloseTo(2490.377, 1);
  });

  // Combination over the revolutions (Palmgren–Miner): Σ ni·ti = 1500·0.6 + 300·0.4 = 1020 (r/min);
  // L10m = 1020/(900/1201.89 + 120/44.8268) = 1020/(0.748821 + 2.676970) = 297.741·10⁶ rev;
  // in hours at the mean speed 1020 r/min: 297.741·10⁶/(60·1020) = 4865.06 h — the same as
  // Σ ti/Σ(ti/L10mh,i) = 1/(0.6/13 354.3 + 0.4/2490.38) = 1/2.05547·10⁻⁴ = 4865.06 h.
  it('combined modified life: 4865.06 h (297.741·10⁶ rev at the mean 1020 r/min)', () => {
    expect(r.L10mh).toBeCloseTo(4865.055, 1);
    expect((r.L10mh! * 60 * 1020) / 1e6).toBeCloseTo(297.7414, 3);
  });

  // Basic life, definition unchanged: P = ((4000³·900 + 8000³·120)/1020)^(1/3) = (1.147451·10¹¹)^(1/3)
  // = 4886.87 N; L10 = (32000/4886.87)³ = 280.774·10⁶ rev; L10h = 280.774·10⁶/(60·1020) = 4587.81 h;
  // effective a_ISO = 4865.06/4587.81 = 1.06043.
  it('basic life from the combined load: P = 4886.87 N, L10 = 280.774, L10h = 4587.81 h, a_ISO,eq = 1.06043', () => {
    expect(r.P).toBeCloseTo(4886.871, 2);
    expect(r.L10).toBeCloseTo(280.7742, 3);
    expect(r.L10h).toBeCloseTo(4587.814, 2);
    expect(r.aISOEquivalent).toBeCloseTo(1.06043, 4);
    expect(r.staticOnly).toBe(false);
  });

  // The shortcut this replaces: one a_ISO at the mean speed (1020 r/min, ν1 = 17.4766 mm²/s) and
  // the mean load, with the warm oil's 20 mm²/s: κ = 1.14439, e_C·Cu/P = 0.065482, a_ISO = 1.62974,
  // L10mh = 1.62974·4587.81 = 7476.9 h, 54 % above the point-by-point 4865.1 h: the slow, heavy
  // point is where the film is thin and most life is spent.
  it('the single a_ISO at the mean point overstates this duty by about 54 %', () => {
    const nu1 = ratedViscosity(rpm(1020), 0.065)!;
    expect(nu1 * 1e6).toBeCloseTo(17.476552, 4);
    const shortcut = aIso('ball', mm2s(20) / nu1, (0.5 * 640) / r.P).aISO * r.L10h!;
    expect(shortcut).toBeCloseTo(7476.95, 0);
    expect(shortcut / r.L10mh!).toBeCloseTo(1.5369, 3);
  });
});
