// Published-value and hand-worked checks of the plain-bushing formulas.
import { describe, expect, it } from 'vitest';
import {
  frictionHeat,
  meanPressure,
  oscillatingSlidingSpeed,
  peakPressure,
  rotatingSlidingSpeed,
  dryTemperatureRise,
  heatResistance,
  wearDepth,
} from '../../../src/calc/bushing/formulas.js';
import { fmtValue } from '../../../src/report/units.js';

const IN = 0.0254;
const LBF = 4.4482216152605;
const PSI = 6894.757293168;
const FT_PER_MIN = 0.3048 / 60;

describe('P, V and PV against a published worked example', () => {
  // Source: bnb-industries.com, "Technical information" page of a
  // plastic-bearing supplier (seen, 2026): shaft 0.625 in, bearing length 1.03125 in, load 35 lb,
  // 120 rpm → P = 54.3 psi, V = 0.2618·D·N = 19.635 ft/min, PV = 1066.2 psi·ft/min.
  const D = 0.625 * IN;
  const L = 1.03125 * IN;
  const F = 35 * LBF;
  const N = 120 / 60;
  it('mean pressure 54.3 psi', () => {
    expect(meanPressure(F, D, L) / PSI).toBeCloseTo(54.3, 1);
  });
  it('sliding speed 19.635 ft/min', () => {
    expect(rotatingSlidingSpeed(D, N) / FT_PER_MIN).toBeCloseTo(19.635, 3);
  });
  it('PV 1066.2 psi·ft/min', () => {
    const pv = meanPressure(F, D, L) * rotatingSlidingSpeed(D, N);
    expect(pv / (PSI * FT_PER_MIN)).toBeCloseTo(1066.2, 0);
    // And the report's conversion of the same figure (1 psi·ft/min = 35.03 Pa·m/s, computed).
    expect(Number(fmtValue(pv, 'Pa*m/s', 'US', 5))).toBeCloseTo(1066.2, 0);
  });
});

describe('hand-worked values from the formulas', () => {
  it('peak pressure is 4/π times the mean (parabolic distribution)', () => {
    // F = 4 kN on D = 40 mm, L = 50 mm: P = 2 MPa, p_peak = 8/π MPa = 2.546 MPa.
    expect(meanPressure(4000, 0.04, 0.05)).toBeCloseTo(2e6, 6);
    expect(peakPressure(4000, 0.04, 0.05)).toBeCloseTo(2.5465e6, -2);
  });

  it('Archard depth: k = 1e-6 mm³/(N·m), p = 1 MPa, V = 0.1 m/s, 1000 h → 0.36 mm', () => {
    // sliding distance s = 0.1 m/s × 3.6e6 s = 3.6e5 m; h = k·p·s = 1e-6 mm³/(N·m) × 1 N/mm² × 3.6e5 m = 0.36 mm.
    expect(wearDepth(1e-15, 1e6, 0.1, 3.6e6)).toBeCloseTo(3.6e-4, 12);
    expect(wearDepth(1e-15, 1e6, 0.1, 3.6e6, 2, 3)).toBeCloseTo(6 * 3.6e-4, 12);
  });

  it('oscillation: a 90° swing at 1 Hz on a 40 mm shaft slides π/2·0.04·1 = 0.0628 m/s on average', () => {
    expect(oscillatingSlidingSpeed(0.04, Math.PI / 2, 1)).toBeCloseTo(0.0628319, 6);
  });

  it('heat and the dry-bearing temperature rise ΔT = R·μ·P·V', () => {
    // Q = 0.1 × 1000 N × 0.5 m/s = 50 W.
    expect(frictionHeat(0.1, 1000, 0.5)).toBeCloseTo(50, 10);
    // A material rated 75 degC at PV_max 1.16 MPa·m/s with μ = 0.08, limits taken at 20 degC:
    // R = (75 − 20) / (0.08 × 1.16e6) = 5.927e-4 K·m²/W; at PV 0.5 MPa·m/s
    // ΔT = 5.927e-4 × 0.08 × 0.5e6 = 23.71 K (= 55 K × 0.5/1.16).
    const R = heatResistance(75, 20, 0.08, 1.16e6);
    expect(R).toBeCloseTo(5.927e-4, 7);
    expect(dryTemperatureRise(R, 0.08, 0.5e6)).toBeCloseTo(23.71, 2);
    // At the PV limit the surface reaches the limit temperature; a limit below the room gives no rise.
    expect(20 + dryTemperatureRise(R, 0.08, 1.16e6)).toBeCloseTo(75, 9);
    expect(heatResistance(15, 20, 0.1, 1e6)).toBe(0);
  });
});
