// Kind: properties of the internal-geometry estimate (common practice, stated in
// src/calc/rolling/geometry.ts) and one size worked by hand. Not a published-value check:
// the estimate is ours, and a supplier's rating replaces it.
import { describe, expect, it } from 'vitest';
import { boundaryDimensions, rollingFactors } from '../../../src/data/rolling.js';
import { estimateBallGeometry, estimateRollerGeometry } from '../../../src/calc/rolling/geometry.js';
import {
  ballDynamicRating,
  ballStaticRating,
  rollerDynamicRating,
  rollerStaticRating,
} from '../../../src/calc/rolling/ratings.js';

const f = rollingFactors();

describe('ball geometry from d × D', () => {
  it('40 × 80 mm: dm = 60, Dw = 0.6·20 = 12 mm, Z = floor(190°/(2·asin 0.2) ) + 1 = floor(190/23.07) + 1 = 9', () => {
    const g = estimateBallGeometry(0.04, 0.08, f.geometryEstimate);
    expect(g.Dpw).toBeCloseTo(0.06, 12);
    expect(g.Dw).toBeCloseTo(0.012, 12);
    expect(g.Z).toBe(9);
  });
  it('small thick-ringed sizes are held to Dw/dm ≤ 0.30 (10 × 35 mm would give 0.33)', () => {
    const g = estimateBallGeometry(0.01, 0.035, f.geometryEstimate);
    expect(g.Dw / g.Dpw).toBeCloseTo(0.3, 12);
  });
  it('the balls fit on the pitch circle without touching: Z·Dw < π·dm', () => {
    for (const r of boundaryDimensions().rows.filter((q) => q.type === 'ball')) {
      const g = estimateBallGeometry(r.bore_mm / 1000, r.outerDiameter_mm / 1000, f.geometryEstimate);
      expect(g.Z * g.Dw).toBeLessThan(Math.PI * g.Dpw);
    }
  });
});

describe('ratings estimated over the whole ISO 15 table', () => {
  it('are finite and positive, inside the factor tables; C0 < C for deep-groove ball bearings', () => {
    for (const r of boundaryDimensions().rows) {
      const d = r.bore_mm / 1000;
      const D = r.outerDiameter_mm / 1000;
      const B = r.width_mm / 1000;
      if (r.type === 'ball') {
        const g = estimateBallGeometry(d, D, f.geometryEstimate);
        const C = ballDynamicRating(g, f.ratingFactors.fcBall);
        const C0 = ballStaticRating(g, f.ratingFactors.f0Ball);
        expect(C.inTable && C0.inTable).toBe(true);
        expect(C.value).toBeGreaterThan(0);
        expect(C0.value).toBeLessThan(C.value);
      } else {
        const g = estimateRollerGeometry(d, D, B, f.geometryEstimate);
        expect(rollerDynamicRating(g, f.ratingFactors.fcRoller).inTable).toBe(true);
        expect(rollerStaticRating(g).value).toBeGreaterThan(0);
        expect(g.Z).toBeGreaterThanOrEqual(3);
      }
    }
  });
  it('for one bore, series 03 rates higher than series 02, and a roller higher than a ball of the same envelope', () => {
    const rows = boundaryDimensions().rows.filter((q) => q.bore_mm === 50);
    const C = (id: string) => {
      const r = rows.find((q) => q.id === id)!;
      const d = r.bore_mm / 1000;
      const D = r.outerDiameter_mm / 1000;
      return r.type === 'ball'
        ? ballDynamicRating(estimateBallGeometry(d, D, f.geometryEstimate), f.ratingFactors.fcBall).value
        : rollerDynamicRating(
            estimateRollerGeometry(d, D, r.width_mm / 1000, f.geometryEstimate),
            f.ratingFactors.fcRoller,
          ).value;
    };
    expect(C('dgb-03-50')).toBeGreaterThan(C('dgb-02-50'));
    expect(C('cyl-02-50')).toBeGreaterThan(C('dgb-02-50'));
  });
});
