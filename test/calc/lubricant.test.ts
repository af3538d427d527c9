/**
 * Properties of the Walther viscosity–temperature law (ASTM D341 form, from memory) as
 * implemented in src/calc/lubricant.ts, between and beyond its two reference points.
 * Reference points: ISO 3448 midpoints at 40 °C (seen) and ν100 of data/lubricants.json
 * (from memory, VI about 95–100).
 */
import { describe, expect, it } from 'vitest';
import {
  density,
  dynamicViscosity,
  kinematicViscosity,
  waltherConstants,
  waltherViscosity,
} from '../../src/calc/lubricant.js';
import { lubricants, oilGrade } from '../../src/data/load.js';

const W = (nu: number) => Math.log10(Math.log10(nu + 0.7));
const X = (tC: number) => Math.log10(tC + 273.15);

describe('Walther law (ASTM D341, from memory)', () => {
  it('passes through both reference points of every grade (ISO 3448 ν40, seen; ν100 from memory)', () => {
    for (const g of lubricants().grades) {
      expect(kinematicViscosity(g, 40)).toBeCloseTo(g.nu40, 9);
      expect(kinematicViscosity(g, 100)).toBeCloseTo(g.nu100, 9);
    }
  });

  it('is a straight line in log log(ν + 0.7) against log T, between and beyond the points', () => {
    const oil = oilGrade(68)!;
    const k = waltherConstants(40, oil.nu40, 100, oil.nu100);
    const slope = (W(oil.nu100) - W(oil.nu40)) / (X(100) - X(40));
    for (const t of [-10, 0, 20, 60, 80, 120, 150]) {
      const nu = waltherViscosity(k, t);
      // Collinearity with the two reference points (the defining property of the law).
      expect((W(nu) - W(oil.nu40)) / (X(t) - X(40))).toBeCloseTo(slope, 9);
    }
  });

  it('falls monotonically with temperature and stays positive and finite from −10 °C to 150 °C', () => {
    for (const g of lubricants().grades) {
      let prev = Infinity;
      for (let t = -10; t <= 150; t += 5) {
        const nu = kinematicViscosity(g, t);
        expect(Number.isFinite(nu)).toBe(true);
        expect(nu).toBeGreaterThan(0);
        expect(nu).toBeLessThan(prev);
        prev = nu;
      }
    }
  });

  it('between the points lies between the reference viscosities; beyond them, outside', () => {
    const oil = oilGrade(46)!;
    const nu70 = kinematicViscosity(oil, 70);
    expect(nu70).toBeLessThan(oil.nu40);
    expect(nu70).toBeGreaterThan(oil.nu100);
    expect(kinematicViscosity(oil, 20)).toBeGreaterThan(oil.nu40);
    expect(kinematicViscosity(oil, 130)).toBeLessThan(oil.nu100);
  });

  it('dynamic viscosity is ν·ρ with ρ falling 0.065 %/K (from memory)', () => {
    const oil = oilGrade(100)!;
    const t = 55;
    expect(dynamicViscosity(oil, t)).toBeCloseTo(kinematicViscosity(oil, t) * 1e-6 * density(oil, t), 12);
    expect(density(oil, 15 + 100)).toBeCloseTo(oil.density15 * (1 - 0.065), 9);
  });

  it("takes the density coefficient from the grade (the table's one figure), not a constant of its own", () => {
    const oil = oilGrade(100)!;
    expect(oil.densityCoefficient).toBe(0.00065);
    expect(density({ ...oil, densityCoefficient: 0.0008 }, 15 + 100)).toBeCloseTo(oil.density15 * (1 - 0.08), 9);
  });
});
