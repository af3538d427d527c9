/**
 * The oil-bath heat balance of src/calc/sump.ts, worked by hand on invented figures.
 */
import { describe, expect, it } from 'vitest';
import { BATH_TOLERANCE_K, bathTemperature, housingArea, sumpModel } from '../../src/calc/sump.js';

const model = {
  diameterFactor: 2,
  lengthFactor: 1.5,
  dissipatingShare: 0.7,
  heatTransfer: 15,
  bearingRise: 5,
  maxRise: 250,
};

describe('sump heat balance', () => {
  it('housing area: a cylinder 2 × the radial room across, 1.5 × the axial room long, 70 % dissipating', () => {
    // Room 150 mm × 80 mm: D_h = 0.3 m, L_h = 0.12 m; A = 0.7·(π·0.3·0.12 + 2·π·0.3²/4) = 0.7·(0.113097 + 0.141372).
    expect(housingArea(0.15, 0.08, model)).toBeCloseTo(0.7 * (Math.PI * 0.3 * 0.12 + (2 * Math.PI * 0.09) / 4), 12);
    expect(housingArea(0.15, 0.08, model)).toBeCloseTo(0.178128, 5);
  });

  it('a loss that does not change with temperature gives T = T_amb + P/(h·A)', () => {
    const b = bathTemperature(25, 0.2, model, () => 150);
    // 150 W / (15 W/(m²·K) · 0.2 m²) = 50 K.
    expect(b.temperature).toBeCloseTo(75, 1);
    expect(Math.abs(b.temperature - 75)).toBeLessThanOrEqual(BATH_TOLERANCE_K);
    expect(b.runaway).toBe(false);
  });

  it('a loss that falls as the oil warms balances below the loss at ambient', () => {
    // P(T) = 300·exp(−(T − 25)/40) W: the root of (T − 25)·3 = P(T), by hand ≈ 25 + 38.5 K.
    const loss = (t: number) => 300 * Math.exp(-(t - 25) / 40);
    const b = bathTemperature(25, 0.2, model, loss);
    expect((b.temperature - 25) * 3).toBeCloseTo(loss(b.temperature), 0);
    expect(b.temperature).toBeLessThan(25 + 300 / 3);
    expect(b.loss).toBeCloseTo(loss(b.temperature), 9);
  });

  it('finds the same root from any start, within half the tolerance, in fewer evaluations than bisection', () => {
    // A viscous loss that falls steeply plus a part that hardly changes (a journal with its
    // thrust face): P(T) = 40 + 400·exp(−(T − 20)/25) W, h·A = 1.5 W/K. The root by a
    // bisection run here to 1e-12 K is the reference.
    const loss = (t: number) => 40 + 400 * Math.exp(-(t - 20) / 25);
    const g = (t: number) => (t - 20) * 1.5 - loss(t);
    let lo = 20;
    let hi = 270;
    while (hi - lo > 1e-12)
      if (g((lo + hi) / 2) < 0) lo = (lo + hi) / 2;
      else hi = (lo + hi) / 2;
    for (const start of [undefined, 20, 40, 80, 120, 200, 269]) {
      let calls = 0;
      const b = bathTemperature(20, 0.1, model, (t) => (calls++, loss(t)), start);
      expect(Math.abs(b.temperature - lo), `start ${start}`).toBeLessThanOrEqual(BATH_TOLERANCE_K / 2);
      expect(b.loss).toBe(loss(b.temperature));
      expect(b.iterations).toBe(calls);
      // Bisection over 250 K to 0.05 K took 13 halvings and 2 more evaluations.
      expect(calls, `start ${start}`).toBeLessThanOrEqual(8);
    }
  });

  it('a loss the housing cannot shed within the bound is flagged, at the bound', () => {
    const b = bathTemperature(25, 0.01, model, () => 1e5);
    expect(b.runaway).toBe(true);
    expect(b.temperature).toBe(25 + 250);
  });

  it('reads its figures from data/lubricants.json, h with its source', () => {
    const m = sumpModel();
    expect(m.heatTransfer).toBeGreaterThanOrEqual(10);
    expect(m.heatTransfer).toBeLessThanOrEqual(25);
    expect(m.source).toMatch(/Tribology Handbook/);
    expect(m.dissipatingShare).toBeLessThanOrEqual(1);
  });
});
