/**
 * checkJournal on an invented scenario (never a textbook problem): the steady bearings of a
 * vertical line shaft driving an irrigation canal lift pump, 60 mm journal, 1450 rev/min,
 * 2.5 kN radial load from shaft whip and the belt-side head. Expectations follow from the
 * physics (sources per test: Raimondi & Boyd 1958 for the film, Trumpler 1966 from memory
 * for the limits, common practice for supply and motion) — no hard-coded answers.
 */
import { describe, expect, it } from 'vitest';
import { checkJournal, type JournalResult } from '../../../src/calc/journal/index.js';
import { lineShaftCase } from '../../helpers/case.js';
import { allFinite } from '../../helpers/finite.js';

/** The codes of a result's warnings (their words are the report's, src/report/findings/journal.ts). */
const codes = (r: JournalResult) => r.warnings.map((w) => w.code);

const CONTRACT_KEYS = [
  'option',
  'length',
  'radialClearance',
  'lengthToDiameter',
  'sommerfeld',
  'eccentricityRatio',
  'minFilmThickness',
  'attitudeAngle',
  'frictionCoefficient',
  'petroffFrictionCoefficient',
  'frictionTorque',
  'powerLoss',
  'flow',
  'sideFlow',
  'peakPressure',
  'effectiveTemperature',
  'maxTemperature',
  'viscosity',
  'oil',
  'feasible',
  'checks',
  'sweep',
  'assumed',
  'warnings',
  'sheet',
];

describe('checkJournal — line-shaft steady bearing, oil feed', () => {
  const r = checkJournal(lineShaftCase());

  it('returns every contract key, finite numbers only', () => {
    for (const k of CONTRACT_KEYS) expect(r).toHaveProperty(k);
    expect(r.option).toBe('journal');
    expect(allFinite(r)).toBe(true);
  });

  it('is feasible: film, temperature and start-up pass (Trumpler 1966, from memory)', () => {
    expect(r.feasible).toBe(true);
    for (const id of ['min-film', 'max-temperature', 'start-unit-load'])
      expect(r.checks.find((c) => c.id === id)?.pass).toBe(true);
    for (const c of r.checks) expect(c.source.length).toBeGreaterThan(0);
  });

  it('keeps the design inside the space and the common-practice ranges (L/D 0.5–1, c/r 0.0005–0.002)', () => {
    expect(r.length).toBeLessThanOrEqual(0.07 + 1e-12);
    expect(r.lengthToDiameter).toBeGreaterThanOrEqual(0.5 - 1e-12);
    expect(r.lengthToDiameter).toBeLessThanOrEqual(1 + 1e-12);
    expect(r.clearanceRatio).toBeGreaterThanOrEqual(0.0005 - 1e-12);
    expect(r.clearanceRatio).toBeLessThanOrEqual(0.002 + 1e-12);
    expect(r.oil).toMatch(/^ISO VG \d+$/);
    expect(r.sweep.filter((s) => s.chosen)).toHaveLength(1);
    // The chosen row has the largest film margin among rows that pass and are not lightly loaded.
    const ok = r.sweep.filter((s) => s.passes && s.eccentricityRatio >= 0.2);
    const best = Math.max(...ok.map((s) => s.filmMargin));
    expect(r.sweep.find((s) => s.chosen)!.filmMargin).toBeCloseTo(best, 12);
  });

  it('headline figures are consistent: h0 = c(1 − ε), f above Petroff, power = 2πN·T', () => {
    expect(r.minFilmThickness).toBeCloseTo(r.radialClearance * (1 - r.eccentricityRatio), 15);
    expect(r.frictionCoefficient).toBeGreaterThan(r.petroffFrictionCoefficient);
    expect(r.powerLoss).toBeCloseTo(2 * Math.PI * (1450 / 60) * r.frictionTorque, 9);
    expect(r.sideFlow).toBeLessThan(r.flow);
    expect(r.maxTemperature).toBeGreaterThan(r.effectiveTemperature);
  });

  it('the mid-length pressure profile peaks near the table peak pressure (within 2 %)', () => {
    const pmax = Math.max(...r.pressureProfile.map((p) => p.pressure));
    expect(Math.abs(pmax / r.peakPressure - 1)).toBeLessThan(0.02);
  });

  it('writes a calculation sheet with formula and substituted values for each key figure', () => {
    const labels = r.sheet.map((s) => s.label).join('|');
    for (const key of [
      'Sommerfeld',
      'Eccentricity',
      'Minimum film',
      'Friction coefficient',
      'Power loss',
      'Temperature rise',
    ])
      expect(labels).toContain(key);
    for (const s of r.sheet) {
      expect(s.formula.length).toBeGreaterThan(0);
      expect(s.substituted.length).toBeGreaterThan(0);
    }
  });
});

describe('checkJournal — supplies that cannot keep a full film (common practice)', () => {
  it('supply none: not feasible, with a failing supply check and zero film', () => {
    const r = checkJournal(lineShaftCase({ lubrication: { supply: 'none', inletTemperature: 30 } }));
    expect(r.feasible).toBe(false);
    expect(r.checks.find((c) => c.id === 'supply')?.pass).toBe(false);
    expect(r.minFilmThickness).toBe(0);
    expect(allFinite(r)).toBe(true);
  });

  it('grease: not feasible; the base-oil numbers are still computed and flagged as an upper bound', () => {
    const r = checkJournal(lineShaftCase({ lubrication: { supply: 'grease', inletTemperature: 40 } }));
    expect(r.feasible).toBe(false);
    expect(r.checks.find((c) => c.id === 'supply')?.pass).toBe(false);
    expect(r.oil).toMatch(/grease base oil/);
    expect(r.minFilmThickness).toBeGreaterThan(0);
    expect(codes(r)).toContain('journal.grease-upper-bound');
  });
});

describe('checkJournal — oscillating shaft (equivalent rotational speed, duty.ts)', () => {
  it('a slow swing of the same shaft gives a film far below the allowable, and says reversal passes through zero', () => {
    // A gate-drive shaft on the same canal (invented): ±10° swing every 12 s.
    const r = checkJournal(
      lineShaftCase({ shaft: { diameter: 0.06, oscillation: { angle: (20 * Math.PI) / 180, frequency: 1 / 12 } } }),
    );
    expect(r.feasible).toBe(false);
    // "Far below": under a quarter of the allowable even with the sweep choosing the thickest-film design.
    expect(r.minFilmThickness).toBeLessThan(0.25 * r.allowableFilmThickness);
    expect(r.checks.find((c) => c.id === 'min-film')?.pass).toBe(false);
    expect(r.checks.find((c) => c.id === 'motion')?.pass).toBe(false);
    expect(codes(r)).toContain('journal.oscillating');
    expect(allFinite(r)).toBe(true);
  });
});

describe('checkJournal — given geometry and fixed viscosity', () => {
  it('reports exactly that geometry and viscosity, with no sweep over grades', () => {
    const r = checkJournal(
      lineShaftCase({
        lubrication: { supply: 'oil-feed', inletTemperature: 40, viscosity: 0.03 },
        journal: { length: 0.045, clearanceRatio: 0.0011 },
      }),
    );
    expect(r.length).toBe(0.045);
    expect(r.radialClearance).toBeCloseTo(0.03 * 0.0011, 15);
    expect(r.viscosity).toBe(0.03);
    expect(r.oil).toBe('fixed viscosity');
    expect(r.sweep).toHaveLength(1);
    // S = (r/c)²μN/P by definition (Raimondi & Boyd 1958).
    const P = 2500 / (0.045 * 0.06);
    expect(r.sommerfeld).toBeCloseTo(((1 / 0.0011) ** 2 * 0.03 * (1450 / 60)) / P, 9);
  });
});

describe('checkJournal — duty spectrum', () => {
  it('headline figures are those of the point with the smallest film margin', () => {
    const r = checkJournal(
      lineShaftCase({
        lubrication: { supply: 'oil-feed', inletTemperature: 40, oilGrade: 68 },
        duty: [
          { share: 0.6, radial: 2000, axial: 0, speed: 1450 / 60 },
          { share: 0.3, radial: 4000, axial: 0, speed: 960 / 60 },
          { share: 0.1, radial: 1000, axial: 0, speed: 1450 / 60 },
        ],
      }),
    );
    expect(r.points).toHaveLength(3);
    const margins = r.points.map((p) => p.filmMargin);
    const gi = margins.indexOf(Math.min(...margins));
    expect(r.governingPoint).toBe(gi);
    expect(r.minFilmThickness).toBe(r.points[gi]!.minFilmThickness);
    expect(r.oil).toBe('ISO VG 68');
    // The start-up check uses the largest radial load of the case.
    expect(r.checks.find((c) => c.id === 'start-unit-load')!.value).toBeCloseTo(4000 / (r.length * 0.06), 6);
  });

  it('an unknown oil grade is a clear error naming the field', () => {
    expect(() =>
      checkJournal(lineShaftCase({ lubrication: { supply: 'oil-feed', inletTemperature: 40, oilGrade: 55 } })),
    ).toThrow(/oilGrade ISO VG 55/);
  });
});

describe('checkJournal — lightly loaded', () => {
  it('warns of whirl when the eccentricity ratio stays below 0.2 (common practice)', () => {
    const r = checkJournal(
      lineShaftCase({
        load: { radial: 150, axial: 0, shock: 'none' },
        lubrication: { supply: 'oil-feed', inletTemperature: 40, oilGrade: 68 },
        journal: { length: 0.06, clearanceRatio: 0.001 },
      }),
    );
    expect(r.eccentricityRatio).toBeLessThan(0.2);
    expect(r.checks.find((c) => c.id === 'light-load')?.pass).toBe(false);
    const whirl = r.warnings.find((w) => w.code === 'journal.light-load');
    expect(whirl?.values['eccentricityRatio']).toBe(r.checks.find((c) => c.id === 'light-load')!.value);
    // Near-concentric: friction approaches Petroff (within 5 % at ε < 0.2).
    expect(Math.abs(r.frictionCoefficient / r.petroffFrictionCoefficient - 1)).toBeLessThan(0.05);
  });
});
