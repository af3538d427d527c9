/**
 * checkJournal on an invented two-point duty (a line-shaft steady bearing of our own): the
 * calculation sheet prints `substituted = value unit`, so each line's expression must be the
 * value it is printed with; the temperature margin is the share of the allowed rise above
 * the inlet (check.ts convention); the film criterion text comes from the criteria data; the
 * mean power loss is the share-weighted mean of the points (definition of a time mean).
 */
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../helpers/sheet.js';
import { lineShaftCase } from '../../helpers/case.js';
import type { CaseSI } from '../../../src/case/types.js';
import { checkJournal } from '../../../src/calc/journal/index.js';
import { allowableFilmText } from '../../../src/calc/journal/design.js';
import { journalCriteria } from '../../../src/data/journal-criteria.js';

/** The line-shaft case with a two-speed duty. */
function steady(over: Partial<CaseSI> = {}): CaseSI {
  return lineShaftCase({
    title: 'line-shaft steady bearing, two-speed duty (invented)',
    duty: [
      { share: 0.6, radial: 2000, axial: 0, speed: 1450 / 60 },
      { share: 0.4, radial: 4000, axial: 0, speed: 960 / 60 },
    ],
    ...over,
  });
}

describe('journal calculation sheet: each substituted expression is the value it is printed with', () => {
  const r = checkJournal(steady());
  it('numerical lines evaluate to their value within 1 % (four-figure numbers); the rest are functions of their arguments', () => {
    let numerical = 0;
    for (const l of r.sheet) {
      const v = evaluate(l.substituted);
      if (v === null) {
        expect(l.substituted.trim().endsWith(')'), `${l.label}: "${l.substituted}"`).toBe(true);
        continue;
      }
      numerical++;
      expect(
        Math.abs(v - l.value) / Math.max(Math.abs(l.value), 1e-30),
        `${l.label}: "${l.substituted}" = ${v}, value ${l.value}`,
      ).toBeLessThan(0.01);
    }
    expect(numerical).toBeGreaterThanOrEqual(12);
  });
  it('the attitude angle line is written as φ(ε, L/D), not "ε = …" beside an angle', () => {
    const phi = r.sheet.find((l) => l.label === 'Attitude angle φ')!;
    expect(phi.substituted).toMatch(/^φ\(ε = [\d.]+, L\/D = [\d.]+\)$/);
    expect(phi.value).toBe(r.attitudeAngle);
  });
});

describe('film criterion text from the criteria data', () => {
  it('label and sheet formula carry h_base and k_D of data/journal-criteria.json', () => {
    const crit = journalCriteria();
    expect(allowableFilmText(crit)).toBe('5.08 µm + 0.00004·D'); // the shipped values: Trumpler's 0.0002 in = 5.08e-6 m, and 4.0e-5
    expect(allowableFilmText({ ...crit, minFilmBase: 8e-6, minFilmPerDiameter: 5e-5 })).toBe('8 µm + 0.00005·D');
    const r = checkJournal(steady());
    expect(r.checks.find((k) => k.id === 'min-film')!.label).toContain(allowableFilmText(crit));
    expect(r.sheet.find((l) => l.label.startsWith('Allowable minimum film'))!.formula).toBe(
      `h_allow = ${allowableFilmText(crit)}`,
    );
  });
});

describe('max-temperature margin: share of the allowed rise above the inlet', () => {
  it('margin = (T_limit − T_max)/(T_limit − T_in), and the source says so', () => {
    const r = checkJournal(steady());
    const k = r.checks.find((x) => x.id === 'max-temperature')!;
    expect(k.margin).toBeCloseTo((k.limit - k.value) / (k.limit - 40), 12);
    expect(k.source).toContain('margin: share of the allowed rise above the inlet temperature');
  });
  it('inlet 30 °C: measured from 30 °C, not from absolute zero', () => {
    const cool = checkJournal(steady({ lubrication: { supply: 'oil-feed', inletTemperature: 30, oilGrade: 68 } }));
    const k = cool.checks.find((x) => x.id === 'max-temperature')!;
    expect(k.margin).toBeCloseTo((k.limit - k.value) / (k.limit - 30), 12);
    // measured from absolute zero it would be several times smaller: (121 − T)/(121 + 273.15)
    expect(k.margin).toBeGreaterThan(((k.limit - k.value) / (k.limit + 273.15)) * 3);
  });
});

describe('mean power loss over the duty', () => {
  it('is Σ share·powerLoss/Σ share over points, and lies between the points', () => {
    const r = checkJournal(steady());
    const expected =
      r.points.reduce((s, p) => s + p.share * p.powerLoss, 0) / r.points.reduce((s, p) => s + p.share, 0);
    expect(r.meanPowerLoss).toBeCloseTo(expected, 9);
    const losses = r.points.map((p) => p.powerLoss);
    expect(r.meanPowerLoss).toBeGreaterThan(Math.min(...losses));
    expect(r.meanPowerLoss).toBeLessThan(Math.max(...losses));
  });
  it('single point: equals the governing power loss', () => {
    const r = checkJournal(steady({ duty: undefined }));
    expect(r.meanPowerLoss).toBeCloseTo(r.powerLoss, 9);
  });
});
