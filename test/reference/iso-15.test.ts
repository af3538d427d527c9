// Kind: published-value check of the data table data/rolling-boundary-dimensions.json
// against ISO 15 boundary dimensions (ISO 15, Rolling bearings — Radial bearings —
// Boundary dimensions, general plan; d × D × B, diameter series 2 and 3, bores 20–50 mm;
// from memory, written down apart from the data file), and properties of the whole table.
import { describe, expect, it } from 'vitest';
import { boundaryDimensions } from '../../src/data/rolling.js';

const REFERENCE: ReadonlyArray<[d: number, s02: [number, number], s03: [number, number]]> = [
  [20, [47, 14], [52, 15]],
  [25, [52, 15], [62, 17]],
  [30, [62, 16], [72, 19]],
  [35, [72, 17], [80, 21]],
  [40, [80, 18], [90, 23]],
  [45, [85, 19], [100, 25]],
  [50, [90, 20], [110, 27]],
];

const rows = boundaryDimensions().rows;
const row = (type: 'ball' | 'roller', series: string, d: number) =>
  rows.find((r) => r.type === type && r.series === series && r.bore_mm === d);

describe('ISO 15 rows, diameter series 2 and 3 (from memory)', () => {
  for (const [d, [D2, B2], [D3, B3]] of REFERENCE) {
    it(`bore ${d}: series 02 ${D2}×${B2}, series 03 ${D3}×${B3}`, () => {
      expect(row('ball', '02', d)).toMatchObject({ outerDiameter_mm: D2, width_mm: B2 });
      expect(row('ball', '03', d)).toMatchObject({ outerDiameter_mm: D3, width_mm: B3 });
      expect(row('roller', '02', d)).toMatchObject({ outerDiameter_mm: D2, width_mm: B2 });
    });
  }
});

describe('the boundary-dimension table', () => {
  it('covers bores 10 to 100 mm, every row with a source and a generic designation', () => {
    const bores = rows.map((r) => r.bore_mm);
    expect(Math.min(...bores)).toBe(10);
    expect(Math.max(...bores)).toBe(100);
    for (const r of rows) {
      expect(r.source).toMatch(/ISO 15/);
      expect(r.designation).toMatch(/^(deep-groove ball|cylindrical roller), dimension series 0[23], bore \d+$/);
    }
  });
  it('no row claims to have been seen (all are from memory)', () => {
    expect(rows.every((r) => /from memory/.test(r.source) && !/\(seen\)/.test(r.source))).toBe(true);
  });
  it('within a series, D and B grow with the bore; series 03 is larger than 02 at every bore', () => {
    for (const series of ['02', '03']) {
      const s = rows.filter((r) => r.type === 'ball' && r.series === series).sort((a, b) => a.bore_mm - b.bore_mm);
      for (let i = 1; i < s.length; i++) {
        expect(s[i]!.outerDiameter_mm).toBeGreaterThan(s[i - 1]!.outerDiameter_mm);
        expect(s[i]!.width_mm).toBeGreaterThanOrEqual(s[i - 1]!.width_mm);
      }
    }
    for (const r of rows.filter((q) => q.series === '02' && q.type === 'ball')) {
      expect(row('ball', '03', r.bore_mm)!.outerDiameter_mm).toBeGreaterThan(r.outerDiameter_mm);
    }
  });
});
