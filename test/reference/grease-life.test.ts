/**
 * Published-method check: grease life by Booser's law, worked by hand from its form.
 *
 * Source: Booser, E. R. (1974), Grease life forecast for ball bearings, Lubrication
 * Engineering 30(11) 536–541 — L the geometric-mean grease life for 50 % bearing failures, h
 * (nomenclature seen); log10 L = −2.60 + 2450/T − 0.301·S with T in K and S the half-life
 * subtraction factors, speed factor S_N = 0.864·DN/(DN)_L (form and constants from memory,
 * as restated in Khonsari & Booser, Applied Tribology, 2nd ed., Wiley 2008). The speed limit
 * (n·dm)_lim = 500 000 mm·r/min of a deep-groove ball bearing on grease is common practice.
 */
import { describe, expect, it } from 'vitest';
import { greaseLife } from '../../src/calc/rolling/grease.js';

// Invented scenario: a fan shaft on a deep-groove ball bearing, bore 40, outside 80 mm
// (dm = 60 mm), 1500 r/min, running at 100 °C, light load.
const fan = { kind: 'deep-groove ball' as const, n: 25, d: 0.04, D: 0.08, temperature: 100 };

describe('Booser (1974) grease life, log10 L = −2.60 + 2450/T − 0.301·S', () => {
  it('100 °C, n·dm = 90 000: S_N = 0.864·90 000/500 000 = 0.15552; log10 L = −2.60 + 6.56572 − 0.04681 = 3.91891; L = 8297 h', () => {
    const g = greaseLife(fan);
    expect(g.ndm).toBeCloseTo(90000, 6);
    expect(g.halvings.speed).toBeCloseTo(0.15552, 10);
    // Booser 1974, Lubrication Engineering 30(11): the life law, worked by hand
    expect(g.hours!).toBeCloseTo(8296.8, 0);
  });
  it('without the speed factor the law gives 10^3.96572 = 9241 h at 100 °C', () => {
    const g = greaseLife(fan);
    // Booser 1974: L0 = 10^(−2.60 + 2450/373.15); the speed subtraction put back by hand
    expect(g.hours! * Math.pow(10, 0.301 * 0.15552)).toBeCloseTo(9241.1, 0);
  });
  it('ten degrees hotter, 110 °C: the life falls by 10^(2450·(1/383.15 − 1/373.15)) = 0.674', () => {
    const hot = greaseLife({ ...fan, temperature: 110 }).hours!;
    const base = greaseLife(fan).hours!;
    // Booser 1974: the temperature term 2450/T alone changes between the two runs
    expect(hot / base).toBeCloseTo(Math.pow(10, 2450 * (1 / 383.15 - 1 / 373.15)), 10);
    expect(hot / base).toBeCloseTo(0.674, 3);
  });
  it('each unit of S halves the life (0.301 = log10 2)', () => {
    const ball = greaseLife(fan).hours!;
    const roller = greaseLife({ ...fan, kind: 'cylindrical roller' });
    // one half-life for the cylindrical roller kind (common practice) at the same n·dm ratio
    // would be exactly 10^(−0.301); the speed limit differs (400 000), so the speed term is put back
    const speedDelta = roller.halvings.speed - 0.15552;
    expect(roller.hours! / ball).toBeCloseTo(Math.pow(10, -0.301 * (1 + speedDelta)), 10);
  });
});
