/**
 * data/journal-criteria.json: Trumpler's criteria in their published form with exact
 * conversions, a confidence on every criterion row, and a low-confidence limit that informs
 * but never excludes.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CONFIDENCES, journalCriteria, mayGate } from '../../../src/data/journal-criteria.js';
import { designChecks, evaluateDesign } from '../../../src/calc/journal/design.js';
import { oilGrade } from '../../../src/data/load.js';
import { seedTables } from '../../../src/calc/journal/table.js';
import { shippedJournalTables } from '../../../src/data/journal-tables.js';

const raw = JSON.parse(readFileSync(new URL('../../../data/journal-criteria.json', import.meta.url), 'utf8')) as {
  criteria: Record<string, { value: number; confidence: string; published?: { value: number; unit: string } }>;
};

/** Exact conversions to SI: 1 in = 25.4 mm (exact by definition), 1 psi = 6894.757 Pa, °C = (°F − 32)/1.8. */
const toSI: Record<string, (v: number) => number> = {
  in: (v) => v * 0.0254,
  psi: (v) => v * 6894.757,
  degF: (v) => (v - 32) / 1.8,
  '1': (v) => v,
};

describe('journal criteria: published form, exact conversions, confidence', () => {
  it("writes Trumpler's h0 >= 0.0002 in + 0.00004·D as 5.08 µm + 0.00004·D (25.4 µm/in)", () => {
    const c = journalCriteria();
    expect(c.minFilmBase).toBeCloseTo(0.0002 * 0.0254, 15);
    expect(c.minFilmBase).toBeCloseTo(5.08e-6, 15);
    expect(c.minFilmPerDiameter).toBe(0.00004);
  });

  it("writes Trumpler's start-up unit load 300 psi as 2.068 MPa (6894.757 Pa/psi) and 250 °F as 121.11 °C", () => {
    const c = journalCriteria();
    expect(c.maxStartUnitLoad).toBeCloseTo(300 * 6894.757, 1);
    expect(c.maxTemperature).toBeCloseTo((250 - 32) / 1.8, 5);
    expect(c.designLoadFactor).toBe(2);
  });

  it('every row with a published form holds its exact conversion', () => {
    for (const [key, row] of Object.entries(raw.criteria)) {
      if (!row.published) continue;
      const convert = toSI[row.published.unit];
      expect(convert, `${key}: unit ${row.published.unit}`).toBeDefined();
      expect(row.value / convert!(row.published.value), key).toBeCloseTo(1, 6);
    }
  });

  it('gives every criterion row a confidence; only the low one may not gate', () => {
    for (const [key, row] of Object.entries(raw.criteria))
      expect(CONFIDENCES as readonly string[], key).toContain(row.confidence);
    expect(raw.criteria['oilBathFlowCapacity_m3_s']!.confidence).toBe('low');
    expect(mayGate('low')).toBe(false);
    expect(mayGate('published')).toBe(true);
  });

  it('an oil-ring capacity exceeded by a 300 mm bath-lubricated guide bearing is advice, not an exclusion', () => {
    // Guards the failure where the low-confidence ring capacity excluded every design of a
    // large turbine guide bearing. Invented duty: D 300 mm, L 180 mm, 20 kN, 3000 rpm, VG 46.
    seedTables(shippedJournalTables().tables);
    const crit = journalCriteria();
    const D = 0.3;
    const candidate = {
      length: 0.18,
      radialClearance: 0.00015,
      fluid: { kind: 'oil' as const, oil: oilGrade(46)! },
      oil: 'ISO VG 46',
      grade: 46,
    };
    const e = evaluateDesign(D, candidate, [{ share: 1, load: 20e3, speed: 50 }], 50, 20e3, crit);
    const checks = designChecks(e, undefined, 'oil-bath', crit, 50);
    const flow = checks.find((k) => k.id === 'supply-flow')!;
    expect(flow.value).toBeGreaterThan(flow.limit);
    expect(flow.pass).toBe(false);
    expect(flow.advisory).toBe(true);
    expect(flow.label).toMatch(/confidence: low/);
    expect(flow.source).toMatch(/confidence: low/);
  });
});
