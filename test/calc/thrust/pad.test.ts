/**
 * The hydrodynamic thrust pad solver (src/calc/thrust/pad.ts) and its table (pad-table.ts),
 * checked against closed forms: the infinitely wide inclined slider (Reynolds 1886; Hamrock,
 * Schmid & Jacobson 2004, Fundamentals of Fluid Film Lubrication, 2nd ed., ch. 8) and the
 * narrow-pad limit (side flow only, the pad analogue of the short journal bearing, derived
 * below), plus mesh convergence.
 */
import { describe, expect, it } from 'vitest';
import { solvePad, wideSlider } from '../../../src/calc/thrust/pad.js';
import { PAD_TAPERS, padAt, padTable, tiltingTaper } from '../../../src/calc/thrust/pad-table.js';

/**
 * Narrow pad (L/B → 0): ∂/∂z(h³ ∂p/∂z) = 6μU dh/dx alone gives p = (3μU/h³)(−dh/dx)(L²/4 − z²),
 * so W = (μ·U·K·L³/(2·B·h_min²))·∫₀¹ dX/H³ and, with ∫₀¹ dX/H³ = (2 + K)/(2(1 + K)²),
 *   W* = (L/B)²·K·(2 + K)/(4·(1 + K)²).
 */
const narrowPad = (taper: number, widthToLength: number): number =>
  (widthToLength * widthToLength * taper * (2 + taper)) / (4 * (1 + taper) ** 2);

describe('thrust pad solver', () => {
  it('matches the infinitely wide inclined slider (Reynolds 1886; Hamrock, Schmid & Jacobson 2004, ch. 8) within 0.1 %', () => {
    for (const k of [0.3, 1, 1.2, 3, 8]) {
      const exact = wideSlider(k);
      const oneD = solvePad(k, Infinity, { mesh: { nX: 200, nZ: 2 } });
      expect(Math.abs(oneD.load / exact.load - 1)).toBeLessThan(1e-3);
      expect(Math.abs(oneD.friction / exact.friction - 1)).toBeLessThan(1e-3);
      // Flow per unit width at the inlet equals the outlet (no side flow): U·h_min·(1 + K)/(2 + K)… by continuity
      // of the closed form, Q* = (1 + K)/(2 + K) (Hamrock et al. 2004, ch. 8, from memory; it follows from h_m = 2h_in·h_min/(h_in + h_min)).
      expect(oneD.inletFlow).toBeCloseTo((1 + k) / (2 + k), 3);
      // A long finite pad (L/B = 20) approaches the same closed form within 2 %: side leakage near its ends.
      const long = solvePad(k, 20, { mesh: { nX: 48, nZ: 48 } });
      expect(long.load / exact.load).toBeGreaterThan(0.9);
      expect(long.load / exact.load).toBeLessThan(1);
    }
    const long = solvePad(1, 40, { mesh: { nX: 48, nZ: 96 } });
    expect(Math.abs(long.load / wideSlider(1).load - 1)).toBeLessThan(0.02);
  });

  it('carries most near K ≈ 1.19 as a wide slider (Hamrock, Schmid & Jacobson 2004, ch. 8, from memory)', () => {
    let best = 0;
    let bestK = 0;
    for (let k = 0.5; k <= 2.5; k += 0.01) {
      const w = solvePad(k, Infinity, { mesh: { nX: 100, nZ: 2 } }).load;
      if (w > best) [best, bestK] = [w, k];
    }
    expect(bestK).toBeGreaterThan(1.1);
    expect(bestK).toBeLessThan(1.3);
  });

  it('approaches the narrow-pad limit (derived in this file): within 4 % at L/B = 0.02, the gap shrinking about in proportion to L/B (flow in x near the ends)', () => {
    for (const k of [0.5, 1, 2]) {
      const gap = (lb: number): number =>
        Math.abs(solvePad(k, lb, { mesh: { nX: 256, nZ: 8 } }).load / narrowPad(k, lb) - 1);
      const near = gap(0.02);
      expect(near).toBeLessThan(0.04);
      expect(near).toBeLessThan(0.6 * gap(0.05));
    }
  });

  it('converges with the mesh: default 48×12 within 0.5 % of 192×48 in W*, F*, Q_in and X_cp (L/B = 1, K = 1)', () => {
    const fine = solvePad(1, 1, { mesh: { nX: 192, nZ: 48 } });
    const coarse = solvePad(1, 1);
    for (const key of ['load', 'friction', 'inletFlow', 'centreOfPressure'] as const)
      expect(Math.abs(coarse[key] / fine[key] - 1)).toBeLessThan(0.005);
    expect(Math.abs(coarse.sideFlow / fine.sideFlow - 1)).toBeLessThan(0.015);
    // Side leakage and the friction identity F* = ln(1+K)/K + K·W*/2 (by parts, pad.ts).
    expect(coarse.sideFlow).toBeGreaterThan(0);
    expect(coarse.friction).toBeCloseTo(Math.log(2) + coarse.load / 2, 12);
  });

  it('loses load to side leakage as the pad narrows, and its centre of pressure moves aft as K grows', () => {
    const loads = [0.5, 1, 2, 4].map((lb) => solvePad(1, lb).load);
    for (let i = 1; i < loads.length; i++) expect(loads[i]!).toBeGreaterThan(loads[i - 1]!);
    expect(loads[3]!).toBeLessThan(wideSlider(1).load);
    const cps = [0.2, 1, 3].map((k) => solvePad(k, 1).centreOfPressure);
    expect(cps[0]!).toBeGreaterThan(0.5);
    expect(cps[1]!).toBeGreaterThan(cps[0]!);
    expect(cps[2]!).toBeGreaterThan(cps[1]!);
  });

  it('rejects a pad it cannot solve', () => {
    expect(() => solvePad(0, 1)).toThrow(/taper/);
    expect(() => solvePad(1, -1)).toThrow(/L\/B/);
    expect(() => solvePad(1, 1, { maxIter: 3 })).toThrow(/did not converge/);
  });
});

describe('thrust pad table', () => {
  it('interpolates between its rows within 0.3 % of a direct solve', () => {
    const t = padTable(0.9);
    for (const k of [0.08, 0.42, 1.2, 2.8, 6.3, 17]) {
      const direct = solvePad(k, 0.9);
      const p = padAt(t, k);
      expect(Math.abs(p.load / direct.load - 1)).toBeLessThan(0.003);
      expect(Math.abs(p.friction / direct.friction - 1)).toBeLessThan(0.003);
      expect(Math.abs(p.inletFlow / direct.inletFlow - 1)).toBeLessThan(0.003);
      expect(p.centreOfPressure).toBeCloseTo(direct.centreOfPressure, 3);
    }
    expect(padAt(t, PAD_TAPERS[PAD_TAPERS.length - 1]! * 2).extrapolated).toBe(true);
  });

  it('gives a tilting pad the taper whose centre of pressure sits on its pivot', () => {
    const t = padTable(1);
    const k = tiltingTaper(t, 0.58);
    expect(solvePad(k, 1).centreOfPressure).toBeCloseTo(0.58, 3);
    expect(() => tiltingTaper(t, 0.45)).toThrow(/pivot/);
  });
});
