// Property-based tests (fast-check): what must hold for any valid case, and why.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { validateCase } from '../../src/case/load.js';
import { checkBushing } from '../../src/calc/bushing/index.js';
import { checkRolling } from '../../src/calc/rolling/index.js';
import { checkJournal } from '../../src/calc/journal/index.js';
import { advise } from '../../src/advise/engine.js';

/** Every number anywhere in a result is finite (no NaN, no Infinity); returns the first bad path. */
function nonFinite(x: unknown, path = '$'): string | null {
  if (typeof x === 'number') return Number.isFinite(x) ? null : `${path} = ${x}`;
  if (Array.isArray(x)) {
    for (let i = 0; i < x.length; i++) {
      const p = nonFinite(x[i], `${path}[${i}]`);
      if (p) return p;
    }
  } else if (x && typeof x === 'object') {
    for (const [k, v] of Object.entries(x)) {
      const p = nonFinite(v, `${path}.${k}`);
      if (p) return p;
    }
  }
  return null;
}

const supplies = ['none', 'grease', 'oil-bath', 'oil-feed'] as const;
const shocks = ['none', 'light', 'moderate', 'heavy'] as const;
const dirt = ['clean', 'normal', 'dirty', 'severe'] as const;

/** Any case a user could write, within the schema's plausibility ranges (log-uniform magnitudes). */
const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true }).map((e) => 10 ** e);
const anyCase = fc
  .record({
    d: logUniform(5, 300), // mm
    rotating: fc.boolean(),
    rpm: logUniform(1, 20000),
    swing: fc.double({ min: 2, max: 300, noNaN: true }),
    hz: logUniform(0.05, 20),
    kN: logUniform(0.01, 500),
    axialShare: fc.double({ min: 0, max: 0.8, noNaN: true }),
    hours: logUniform(100, 200000),
    lengthFactor: fc.double({ min: 0.2, max: 3, noNaN: true }),
    radialFactor: fc.double({ min: 1.05, max: 4, noNaN: true }),
    supply: fc.constantFrom(...supplies),
    shock: fc.constantFrom(...shocks),
    dirt: fc.constantFrom(...dirt),
    inlet: fc.double({ min: 5, max: 90, noNaN: true }),
    grade: fc.constantFrom(22, 32, 46, 68, 100, 150, 220, 320, 460),
    starts: fc.double({ min: 0, max: 200, noNaN: true }),
  })
  .map((g) => ({
    title: 'Property case',
    shaft: g.rotating
      ? { diameter: `${g.d} mm`, speed: `${g.rpm} rpm` }
      : { diameter: `${g.d} mm`, oscillation: { angle: `${g.swing} deg`, frequency: `${g.hz} Hz` } },
    load: { radial: `${g.kN} kN`, axial: `${g.kN * g.axialShare} kN`, shock: g.shock },
    life: { hours: `${g.hours} h` },
    space: { maxLength: `${g.d * g.lengthFactor} mm`, maxOuterDiameter: `${g.d * g.radialFactor} mm` },
    lubrication:
      g.supply === 'oil-bath' || g.supply === 'oil-feed'
        ? { supply: g.supply, oil: `ISO VG ${g.grade}`, inletTemperature: `${g.inlet} degC` }
        : { supply: g.supply },
    environment: { contamination: g.dirt, startsPerHour: g.starts },
  }));

describe('properties', () => {
  it('for any valid case: no exception and no NaN or Infinity anywhere in the advice (it is all numbers a reviewer reads)', async () => {
    await fc.assert(
      fc.asyncProperty(anyCase, async (raw) => {
        const { case: c, assumed } = validateCase(raw);
        const a = await advise(c, assumed);
        expect(
          nonFinite(
            JSON.parse(
              JSON.stringify(a, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? `NONFINITE:${v}` : v)),
            ),
          ),
        ).toBeNull();
        expect(JSON.stringify(a)).not.toMatch(/NONFINITE/);
      }),
      { numRuns: 60, seed: 20261201 },
    );
  });

  it('more radial load never lengthens a bushing wear life (Archard: wear rate ∝ load)', () => {
    fc.assert(
      fc.property(
        logUniform(0.05, 20),
        fc.double({ min: 1, max: 5, noNaN: true }),
        fc.constantFrom('sintered-bronze', 'nylon', 'ptfe-lined-steel'),
        (kN, k, material) => {
          const base = {
            title: 'p',
            shaft: { diameter: '40 mm', speed: '100 rpm' },
            life: { hours: '5000 h' },
            space: { maxLength: '50 mm', maxOuterDiameter: '80 mm' },
            bushing: { material, length: '40 mm' },
          };
          const lo = checkBushing(validateCase({ ...base, load: { radial: `${kN} kN` } }).case).materials[0]!;
          const hi = checkBushing(validateCase({ ...base, load: { radial: `${kN * k} kN` } }).case).materials[0]!;
          expect(hi.lifeHours).toBeLessThanOrEqual(lo.lifeHours * (1 + 1e-12));
        },
      ),
      { numRuns: 100, seed: 7 },
    );
  });

  it('a longer bushing never wears deeper (pressure and so wear rate ∝ 1/L)', () => {
    fc.assert(
      fc.property(fc.double({ min: 10, max: 80, noNaN: true }), fc.double({ min: 1, max: 3, noNaN: true }), (L, k) => {
        const base = {
          title: 'p',
          shaft: { diameter: '40 mm', speed: '300 rpm' },
          load: { radial: '2 kN' },
          life: { hours: '5000 h' },
          space: { maxLength: '300 mm', maxOuterDiameter: '80 mm' },
        };
        const short = checkBushing(validateCase({ ...base, bushing: { material: 'acetal', length: `${L} mm` } }).case)
          .materials[0]!;
        const long = checkBushing(
          validateCase({ ...base, bushing: { material: 'acetal', length: `${L * k} mm` } }).case,
        ).materials[0]!;
        expect(long.wearDepth).toBeLessThanOrEqual(short.wearDepth * (1 + 1e-12));
      }),
      { numRuns: 100, seed: 11 },
    );
  });

  it('more load never lengthens a rolling bearing life (L10 ∝ (C/P)^p and a_ISO falls with P)', () => {
    fc.assert(
      fc.property(
        logUniform(0.2, 10),
        fc.double({ min: 1, max: 4, noNaN: true }),
        fc.constantFrom('none', 'grease', 'oil-bath'),
        (kN, k, supply) => {
          const base = {
            title: 'p',
            shaft: { diameter: '40 mm', speed: '900 rpm' },
            life: { hours: '20000 h' },
            space: { maxLength: '40 mm', maxOuterDiameter: '100 mm' },
            lubrication: supply === 'oil-bath' ? { supply, oil: 'ISO VG 68' } : { supply },
            rolling: { type: 'ball', dynamicRating: '30 kN', staticRating: '19 kN' },
          };
          const lo = checkRolling(validateCase({ ...base, load: { radial: `${kN} kN` } }).case).candidates[0]!;
          const hi = checkRolling(validateCase({ ...base, load: { radial: `${kN * k} kN` } }).case).candidates[0]!;
          expect(hi.L10h!).toBeLessThanOrEqual(lo.L10h! * (1 + 1e-12));
          expect(hi.L10mh!).toBeLessThanOrEqual(lo.L10mh! * (1 + 1e-9));
        },
      ),
      { numRuns: 100, seed: 13 },
    );
  });

  it('more load never thickens a journal film (fixed geometry and oil: S ∝ 1/W, and h0/c falls as S falls)', () => {
    fc.assert(
      fc.property(
        logUniform(0.5, 20),
        fc.double({ min: 1.01, max: 4, noNaN: true }),
        fc.boolean(),
        (kN, k, fixedViscosity) => {
          const base = {
            title: 'p',
            shaft: { diameter: '60 mm', speed: '1500 rpm' },
            life: { hours: '50000 h' },
            space: { maxLength: '60 mm', maxOuterDiameter: '120 mm' },
            lubrication: fixedViscosity
              ? { supply: 'oil-feed', viscosity: '0.03 Pa*s' }
              : { supply: 'oil-feed', oil: 'ISO VG 46', inletTemperature: '40 degC' },
            journal: { length: '50 mm', clearanceRatio: 0.001 },
          };
          const lo = checkJournal(validateCase({ ...base, load: { radial: `${kN} kN` } }).case);
          const hi = checkJournal(validateCase({ ...base, load: { radial: `${kN * k} kN` } }).case);
          expect(hi.minFilmThickness).toBeLessThanOrEqual(lo.minFilmThickness * (1 + 1e-9));
        },
      ),
      { numRuns: 40, seed: 17 },
    );
  });

  it('results do not depend on the unit system the case was written in (units are converted once, at the edge)', async () => {
    await fc.assert(
      fc.asyncProperty(logUniform(10, 150), logUniform(50, 3000), logUniform(0.2, 30), async (dmm, rpm, kN) => {
        const IN = 25.4;
        const LBF = 4.4482216152605;
        const si = {
          title: 'u',
          shaft: { diameter: `${dmm} mm`, speed: `${rpm} rpm` },
          load: { radial: `${kN} kN` },
          life: { hours: '20000 h' },
          space: { maxLength: `${dmm} mm`, maxOuterDiameter: `${dmm * 2.5} mm` },
          lubrication: { supply: 'oil-feed', oil: 'ISO VG 46', inletTemperature: '40 degC' },
          environment: { ambient: '25 degC' },
        };
        const us = {
          ...si,
          shaft: { diameter: `${dmm / IN} in`, speed: `${rpm / 60} rev/s` },
          load: { radial: `${(kN * 1000) / LBF} lbf` },
          space: { maxLength: `${dmm / IN} in`, maxOuterDiameter: `${(dmm * 2.5) / IN} in` },
          lubrication: { supply: 'oil-feed', oil: 'ISO VG 46', inletTemperature: '104 degF' },
          environment: { ambient: '77 degF' },
        };
        const a = validateCase(si);
        const b = validateCase(us);
        const ra = await advise(a.case, a.assumed);
        const rb = await advise(b.case, b.assumed);
        expect(rb.recommendation).toBe(ra.recommendation);
        const near = (x: number | null, y: number | null) =>
          x === null || y === null
            ? expect(y).toBe(x)
            : expect(Math.abs(y - x)).toBeLessThanOrEqual(1e-5 * Math.max(Math.abs(x), 1e-12));
        near(ra.checks.journal.minFilmThickness, rb.checks.journal.minFilmThickness);
        near(ra.checks.bushing.materials[0]!.wearDepth, rb.checks.bushing.materials[0]!.wearDepth);
        near(ra.checks.rolling.candidates[0]?.L10h ?? null, rb.checks.rolling.candidates[0]?.L10h ?? null);
      }),
      { numRuns: 30, seed: 23 },
    );
  });
});
