// Kind: properties of the internal-geometry estimate (common practice, stated in
// src/calc/rolling/geometry.ts and data/rolling-ratings.json) and sizes worked by hand. Not a
// published-value check: the estimate is ours, and a supplier's rating replaces it (the
// published-geometry checks are in test/reference/rating-geometry.test.ts).
import { describe, expect, it } from 'vitest';
import { boundaryDimensions, needleDimensions, taperedDimensions } from '../../../src/data/rolling.js';
import { ratingTables } from '../../../src/data/rolling-ratings.js';
import {
  estimateBallGeometry,
  estimateKindGeometry,
  estimateRollerGeometry,
} from '../../../src/calc/rolling/geometry.js';
import { estimateRatings, kindRow, type RatingInput } from '../../../src/calc/rolling/ratings.js';

const tables = ratingTables();
/** The first estimate's factors (kept for its callers until they move to estimateRatings). */
const FIRST = {
  ballDiameterFactor: 0.6,
  ballGammaMax: 0.3,
  ballFillAngle_deg: 190,
  rollerDiameterFactor: 0.5,
  rollerLengthFactor: 0.6,
  rollerPitchFactor: 1.25,
};

describe('first estimate (estimateBallGeometry, estimateRollerGeometry)', () => {
  it('40 × 80 mm: dm = 60, Dw = 0.6·20 = 12 mm, Z = floor(190°/(2·asin 0.2)) + 1 = floor(190/23.07) + 1 = 9', () => {
    const g = estimateBallGeometry(0.04, 0.08, FIRST);
    expect(g.Dpw).toBeCloseTo(0.06, 12);
    expect(g.Dw).toBeCloseTo(0.012, 12);
    expect(g.Z).toBe(9);
  });
  it('roller 45 × 85 × 19: Dwe = 10, Lwe = 11.4, Z = floor(π·65/12.5) = 16', () => {
    const g = estimateRollerGeometry(0.045, 0.085, 0.019, FIRST);
    expect([g.Dwe, g.Lwe, g.Z]).toEqual([expect.closeTo(0.01, 12), expect.closeTo(0.0114, 12), 16]);
  });
});

describe('estimateKindGeometry, worked by hand', () => {
  it('deep-groove ball 45 × 85: Dw = min(0.6·20, 0.22·65) = 12 mm, Z = floor(190°/(2·asin(12/65))) + 1 = 9', () => {
    const g = estimateKindGeometry(kindRow(tables, 'deep-groove ball', null), 0.045, 0.085, 0.019, 0, null);
    expect(g.Dw).toBeCloseTo(0.012, 12);
    expect(g.Z).toBe(9);
    expect(g.Lwe).toBeNull();
  });
  it('deep-groove ball 10 × 30: 0.6·10 = 6 mm is held to 0.22·20 = 4.4 mm; Z = floor(190/25.42) + 1 = 8', () => {
    const g = estimateKindGeometry(kindRow(tables, 'deep-groove ball', null), 0.01, 0.03, 0.009, 0, null);
    expect(g.Dw).toBeCloseTo(0.0044, 12);
    expect(g.Z).toBe(8);
  });
  it('cylindrical roller 45 × 85 × 19: Dwe = 10 mm, Lwe = 0.5·19 − 1 = 8.5 mm, Z = floor(π·65/15) = 13', () => {
    const g = estimateKindGeometry(kindRow(tables, 'cylindrical roller', null), 0.045, 0.085, 0.019, 0, null);
    expect(g.Dw).toBeCloseTo(0.01, 12);
    expect(g.Lwe).toBeCloseTo(0.0085, 12);
    expect(g.Z).toBe(13);
  });
  it('drawn cup needle Fw 20, D 26, C 16: Dwe = 0.65·3 = 1.95 mm, dm = 21.95 mm, Lwe = 0.6·16 − 1 = 8.6 mm', () => {
    const g = estimateKindGeometry(kindRow(tables, 'needle roller', 'drawn cup'), 0.02, 0.026, 0.016, 0, null);
    expect(g.Dw).toBeCloseTo(0.00195, 12);
    expect(g.dm).toBeCloseTo(0.02195, 12);
    expect(g.Lwe).toBeCloseTo(0.0086, 12);
    expect(g.Fw).toBeCloseTo(0.02, 12);
  });
});

/** Every size of the shipped dimension tables as rating inputs, with the kinds each serves. */
function allInputs(): RatingInput[] {
  const out: RatingInput[] = [];
  const base = { form: null, arrangement: 'single' as const, contactAngle: 0 };
  for (const r of boundaryDimensions().rows) {
    const dims = { d: r.bore_mm / 1000, D: r.outerDiameter_mm / 1000, B: r.width_mm / 1000 };
    const kinds: RatingInput['kind'][] = ['22', '23'].includes(r.series)
      ? ['self-aligning ball', 'spherical roller']
      : ['deep-groove ball', 'angular-contact ball', 'cylindrical roller', 'self-aligning ball'];
    for (const kind of kinds) out.push({ ...base, kind, ...dims });
  }
  for (const r of taperedDimensions().rows)
    out.push({
      ...base,
      kind: 'tapered roller',
      contactAngle: r.contactAngle_deg,
      d: r.bore_mm / 1000,
      D: r.outerDiameter_mm / 1000,
      B: r.width_mm / 1000,
    });
  for (const r of needleDimensions().rows)
    out.push({
      ...base,
      kind: 'needle roller',
      form: r.form === 'drawn cup' ? 'drawn cup' : 'machined with inner ring',
      d: (r.bore_mm ?? r.rollerSetBore_mm) / 1000,
      D: r.outerDiameter_mm / 1000,
      B: r.width_mm / 1000,
      rollerSetBore: r.rollerSetBore_mm / 1000,
    });
  return out;
}

describe('estimateRatings over every shipped dimension table', () => {
  const inputs = allInputs();
  it('covers every kind', () => {
    expect(new Set(inputs.map((x) => x.kind)).size).toBe(7);
  });
  it('finite, positive, inside the factor tables; elements fit on the pitch circle and in the section', () => {
    for (const x of inputs) {
      const r = estimateRatings(x);
      const at = `${x.kind} ${x.d * 1000}×${x.D * 1000}×${x.B * 1000}`;
      expect(Number.isFinite(r.C) && r.C > 0, at).toBe(true);
      expect(Number.isFinite(r.C0) && r.C0 > 0, at).toBe(true);
      expect(r.inTable, at).toBe(true);
      expect(r.Z * r.Dw, at).toBeLessThan(Math.PI * r.dm);
      expect(r.dm + r.Dw, at).toBeLessThan(x.D);
      expect(r.dm - r.Dw, at).toBeGreaterThanOrEqual(x.d - 1e-12); // needles run on Fw = d
      if (r.Lwe !== null) expect(r.Lwe * (r.rows === 2 ? 2 : 1), at).toBeLessThan(x.B);
    }
  });
  it('for one bore and kind, series 03 rates higher than series 02; a cylindrical roller above a deep-groove ball', () => {
    const at = (series: string, kind: RatingInput['kind']) => {
      const r = boundaryDimensions().rows.find((q) => q.series === series && q.bore_mm === 50)!;
      const x: RatingInput = {
        kind,
        form: null,
        arrangement: 'single',
        contactAngle: 0,
        d: r.bore_mm / 1000,
        D: r.outerDiameter_mm / 1000,
        B: r.width_mm / 1000,
      };
      return estimateRatings(x);
    };
    for (const k of ['deep-groove ball', 'cylindrical roller'] as const) {
      expect(at('03', k).C).toBeGreaterThan(at('02', k).C);
      expect(at('03', k).C0).toBeGreaterThan(at('02', k).C0);
    }
    expect(at('02', 'cylindrical roller').C).toBeGreaterThan(at('02', 'deep-groove ball').C);
  });
});
