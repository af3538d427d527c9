/**
 * Load matching and thermal balance (operating-point.ts): round trips and balances that
 * the method must satisfy by construction, on an invented geometry. Sources: Raimondi &
 * Boyd (1958) for S and the variables; their Part III heat balance with the side flow
 * leaving at the mean temperature (from memory; common practice).
 */
import { describe, expect, it } from 'vitest';
import { dynamicViscosity, density } from '../../../src/calc/lubricant.js';
import { oilGrade } from '../../../src/data/load.js';
import { matchLoad, operatingPoint, type OperatingInput } from '../../../src/calc/journal/operating-point.js';
import { sommerfeldAt, tableFor } from '../../../src/calc/journal/table.js';

// Invented: a 70 mm journal, 56 mm long (L/D 0.8), c/r = 0.0012, at 16 rev/s.
const geometry = { diameter: 0.07, length: 0.056, radialClearance: 0.035 * 0.0012 };
const vg68 = oilGrade(68)!;

describe('load matching (Raimondi & Boyd 1958: S = (r/c)²μN/P)', () => {
  it('round-trips ε → load → ε at fixed viscosity', () => {
    const t = tableFor(0.8);
    const mu = 0.025;
    const n = 16;
    const r = geometry.diameter / 2;
    for (const eps of [0.05, 0.3, 0.6, 0.85, 0.96]) {
      const s = sommerfeldAt(t, eps);
      const unitLoad = ((r / geometry.radialClearance) ** 2 * mu * n) / s;
      const load = unitLoad * geometry.length * geometry.diameter;
      const input: OperatingInput = {
        geometry,
        load,
        speed: n,
        fluid: { kind: 'fixed', viscosity: mu, density: 870, specificHeat: 1950 },
        inletTemperature: 40,
      };
      const res = operatingPoint(t, input);
      expect(res.eccentricityRatio).toBeCloseTo(eps, 8);
      expect(res.minFilmThickness).toBeCloseTo(geometry.radialClearance * (1 - eps), 12);
      expect(res.thermalIterations).toBe(0); // fixed viscosity: no thermal iteration
    }
  });

  it('more load gives a thinner film, more speed a thicker one', () => {
    const t = tableFor(0.8);
    const base: OperatingInput = {
      geometry,
      load: 6000,
      speed: 16,
      fluid: { kind: 'oil', oil: vg68 },
      inletTemperature: 45,
    };
    const h = operatingPoint(t, base).minFilmThickness;
    expect(operatingPoint(t, { ...base, load: 12000 }).minFilmThickness).toBeLessThan(h);
    expect(operatingPoint(t, { ...base, speed: 32 }).minFilmThickness).toBeGreaterThan(h);
  });

  it('rejects impossible inputs by name', () => {
    const t = tableFor(0.8);
    const base: OperatingInput = {
      geometry,
      load: 6000,
      speed: 16,
      fluid: { kind: 'oil', oil: vg68 },
      inletTemperature: 45,
    };
    expect(() => operatingPoint(t, { ...base, speed: 0 })).toThrow(/speed/);
    expect(() => operatingPoint(t, { ...base, load: -1 })).toThrow(/load/);
  });
});

describe('thermal balance (Raimondi & Boyd 1958, Part III, from memory; common practice)', () => {
  const t = tableFor(0.8);
  const input: OperatingInput = {
    geometry,
    load: 6000,
    speed: 16,
    fluid: { kind: 'oil', oil: vg68 },
    inletTemperature: 45,
  };
  const res = operatingPoint(t, input);

  it('converges to T_eff = T_in + ΔT/2 within 0.01 K, with μ = μ(T_eff) on the Walther line', () => {
    expect(res.thermalRunaway).toBe(false);
    expect(Math.abs(res.effectiveTemperature - (45 + res.temperatureRise / 2))).toBeLessThan(1e-9);
    // The viscosity used was evaluated at a temperature within 0.01 K of T_eff.
    const muLo = dynamicViscosity(vg68, res.effectiveTemperature + 0.01);
    const muHi = dynamicViscosity(vg68, res.effectiveTemperature - 0.01);
    expect(res.viscosity).toBeGreaterThanOrEqual(muLo);
    expect(res.viscosity).toBeLessThanOrEqual(muHi);
    expect(res.maxTemperature).toBeCloseTo(45 + res.temperatureRise, 9);
  });

  it('balances energy: H = ρ·cp·ΔT·(Q − Qs/2)', () => {
    const rho = res.densityUsed;
    expect(rho).toBeGreaterThan(density(vg68, res.effectiveTemperature + 0.02));
    const carried = rho * vg68.specificHeat * res.temperatureRise * (res.flow - res.sideFlow / 2);
    expect(carried / res.powerLoss).toBeCloseTo(1, 9);
  });

  it('a hotter inlet gives a thinner film', () => {
    const hot = operatingPoint(t, { ...input, inletTemperature: 70 });
    expect(hot.minFilmThickness).toBeLessThan(res.minFilmThickness);
  });

  it('flags thermal runaway instead of returning a number above the 250 °C ceiling', () => {
    // A tight clearance and the heaviest grade at high speed: no equilibrium below 250 °C.
    const tight = { ...geometry, radialClearance: 0.035 * 0.0002 };
    const hot = operatingPoint(t, {
      geometry: tight,
      load: 500,
      speed: 200,
      fluid: { kind: 'oil', oil: oilGrade(460)! },
      inletTemperature: 60,
    });
    expect(hot.thermalRunaway).toBe(true);
    expect(Number.isFinite(hot.maxTemperature)).toBe(true);
    expect(hot.maxTemperature).toBeGreaterThan(250);
  });

  it('isothermal matchLoad and the converged point agree at the converged viscosity', () => {
    const iso = matchLoad(t, input, res.viscosity, res.densityUsed, vg68.specificHeat);
    expect(iso.eccentricityRatio).toBeCloseTo(res.eccentricityRatio, 12);
  });
});
