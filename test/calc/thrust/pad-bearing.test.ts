/**
 * The dimensional pad thrust bearing (src/calc/thrust/pad-bearing.ts): load matching, the taper
 * depth, the heat balance and the Walther viscosity at the effective temperature, each checked
 * against the dimensionless pad solved directly (pad.ts) and the formulas of the module comment.
 * Settings invented: a 40–80 mm ring of 8 pads at 1450 rpm.
 */
import { describe, expect, it } from 'vitest';
import { dynamicViscosity } from '../../../src/calc/lubricant.js';
import { solvePad } from '../../../src/calc/thrust/pad.js';
import { padBearing, padRectangle, type PadRing } from '../../../src/calc/thrust/pad-bearing.js';
import { oilGrade } from '../../../src/data/load.js';

const ring: PadRing = { inner: 0.04, outer: 0.08, pads: 8, padAngle: (0.8 * 2 * Math.PI) / 8 };
const fixed = { kind: 'fixed' as const, viscosity: 0.03, density: 870, specificHeat: 1950 };
const speed = 1450 / 60;

describe('pad thrust bearing', () => {
  it('matches the load W/N = W*·μ·U·B²·L/h_min² of the pad solved directly (pad.ts) within 0.5 %', () => {
    const r = padBearing({
      ring,
      form: { kind: 'taper-ratio', taper: 1.2 },
      load: 4000,
      speed,
      fluid: fixed,
      inletTemperature: 50,
    });
    const { length: B, width: L, meanRadius } = padRectangle(ring);
    const U = 2 * Math.PI * speed * meanRadius;
    const direct = solvePad(1.2, L / B);
    const h = Math.sqrt((direct.load * fixed.viscosity * U * B * B * L) / (4000 / 8));
    expect(r.minFilmThickness / h).toBeCloseTo(1, 2);
    expect(r.velocity).toBeCloseTo(U, 12);
    expect(r.unitLoad).toBeCloseTo(4000 / (8 * B * L), 6);
    // Power N·F·U with F = F*·μ·U·B·L/h_min, and the adiabatic balance F·U = ρ·c_p·ΔT·(Q_in − Q_s/2) per pad.
    const F = (direct.friction * fixed.viscosity * U * B * L) / h;
    expect(r.powerLoss / (8 * F * U)).toBeCloseTo(1, 2);
    const perPad = r.powerLoss / 8;
    expect(perPad / (870 * 1950 * r.temperatureRise * ((r.flow - r.sideFlow / 2) / 8))).toBeCloseTo(1, 9);
    expect(r.effectiveTemperature).toBeCloseTo(50 + r.temperatureRise / 2, 9);
  });

  it('with the taper depth so found, carries the same load at the same film, and a lighter load on a thicker film', () => {
    const input = { ring, load: 4000, speed, fluid: fixed, inletTemperature: 50 };
    const design = padBearing({ ...input, form: { kind: 'taper-ratio', taper: 1.2 } });
    const taperDepth = design.inletFilmThickness - design.minFilmThickness;
    const same = padBearing({ ...input, form: { kind: 'tapered', taperDepth } });
    expect(same.minFilmThickness / design.minFilmThickness).toBeCloseTo(1, 4);
    const light = padBearing({ ...input, load: 1000, form: { kind: 'tapered', taperDepth } });
    expect(light.minFilmThickness).toBeGreaterThan(same.minFilmThickness);
    expect(light.taper).toBeLessThan(same.taper);
    // A load far beyond the taper's reach is flagged rather than solved off the table.
    const crushed = padBearing({ ...input, load: 4e7, form: { kind: 'tapered', taperDepth } });
    expect(crushed.extrapolated).toBe(true);
  });

  it('settles at the temperature whose Walther viscosity gives that temperature (ISO VG 68, from data/lubricants.json)', () => {
    const oil = oilGrade(68)!;
    const r = padBearing({
      ring,
      form: { kind: 'tilting', pivot: 0.58 },
      load: 4000,
      speed,
      fluid: { kind: 'oil', oil },
      inletTemperature: 50,
    });
    expect(r.thermalRunaway).toBe(false);
    expect(Math.abs(r.effectiveTemperature - (50 + r.temperatureRise / 2))).toBeLessThan(1e-9);
    // μ was taken at T_eff to within the balance's 0.01 K.
    const muLow = dynamicViscosity(oil, r.effectiveTemperature + 0.02);
    const muHigh = dynamicViscosity(oil, r.effectiveTemperature - 0.02);
    expect(r.viscosity).toBeGreaterThan(muLow);
    expect(r.viscosity).toBeLessThan(muHigh);
  });

  it('refuses a ring it cannot evaluate, naming the quantity', () => {
    const base = {
      form: { kind: 'tilting' as const, pivot: 0.58 },
      load: 4000,
      speed,
      fluid: fixed,
      inletTemperature: 50,
    };
    expect(() => padBearing({ ...base, ring: { ...ring, outer: 0.03 } })).toThrow(/outer diameter/);
    expect(() => padBearing({ ...base, ring: { ...ring, pads: 12, padAngle: 1 } })).toThrow(/full circle/);
    expect(() => padBearing({ ...base, ring, speed: 0 })).toThrow(/speed/);
  });
});
