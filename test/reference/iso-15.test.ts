// Kind: properties of the rolling dimension tables that follow from the standards' plans:
// ISO 15:2017 (radial bearings, boundary dimensions, general plan: a diameter series fixes D at
// each bore, a width series B), ISO 355:2019 (metric tapered roller bearings: total width T,
// ring widths B and C, angle series) and ISO 1206 / ISO 3245 (needle roller bearings). The
// tables are read as plain JSON; their values are checked against open datasets in
// open-dimension-data.test.ts.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

const read = <T>(file: string): { description: string; units: Record<string, string>; rows: T[] } =>
  JSON.parse(readFileSync(new URL(`../../data/${file}`, import.meta.url), 'utf8'));

interface Radial {
  series: string;
  bore_mm: number;
  outerDiameter_mm: number;
  width_mm: number;
  source: string;
}
interface Tapered extends Radial {
  innerRingWidth_mm: number;
  outerRingWidth_mm: number;
  contactAngle_deg: number;
}
interface Needle {
  series: string;
  form: string;
  rollerSetBore_mm: number;
  bore_mm: number | null;
  outerDiameter_mm: number;
  width_mm: number;
  source: string;
}

const radial = read<Radial>('rolling-boundary-dimensions.json');
const tapered = read<Tapered>('rolling-tapered-dimensions.json');
const needle = read<Needle>('rolling-needle-dimensions.json');

/** The ISO 15 bore steps from 10 to 200 mm (bore codes 00 to 40). */
const BORES = [10, 12, 15, 17, 20, 25, 30, 35, 40, 45, 50, 55, 60, 65, 70, 75, 80, 85, 90, 95, 100];
BORES.push(105, 110, 120, 130, 140, 150, 160, 170, 180, 190, 200);

const ofSeries = <T extends { series: string; bore_mm: number | null }>(rows: T[], s: string) =>
  rows.filter((r) => r.series === s).sort((a, b) => (a.bore_mm ?? 0) - (b.bore_mm ?? 0));
const at = <T extends { series: string; bore_mm: number | null }>(rows: T[], s: string, d: number) =>
  rows.find((r) => r.series === s && r.bore_mm === d);
/** Every row's source names its standard, says the figure is from memory, and says whether it was checked. */
const wellSourced = (source: string, standard: RegExp) =>
  standard.test(source) &&
  /\(from memory\)/.test(source) &&
  (/agrees with .+\(seen\)/.test(source) || /not checked against open data/.test(source) || /seen\)/.test(source));

describe('ISO 15 table (data/rolling-boundary-dimensions.json)', () => {
  const rows = radial.rows;
  it('holds series 10, 02, 03, 22 and 23, one row per series and bore, every unit in mm', () => {
    expect([...new Set(rows.map((r) => r.series))].sort()).toEqual(['02', '03', '10', '22', '23']);
    expect(new Set(rows.map((r) => `${r.series}/${r.bore_mm}`)).size).toBe(rows.length);
    expect(radial.units).toEqual({ bore_mm: 'mm', outerDiameter_mm: 'mm', width_mm: 'mm' });
  });
  it('has every bore step from 10 to 200 mm in series 02 and 03', () => {
    for (const s of ['02', '03']) expect(ofSeries(rows, s).map((r) => r.bore_mm)).toEqual(BORES);
  });
  it('within a series, D grows with the bore and B does not shrink', () => {
    for (const s of ['10', '02', '03', '22', '23']) {
      const r = ofSeries(rows, s);
      expect(r.length).toBeGreaterThan(20);
      for (let i = 1; i < r.length; i++) {
        expect(r[i]!.outerDiameter_mm).toBeGreaterThan(r[i - 1]!.outerDiameter_mm);
        expect(r[i]!.width_mm).toBeGreaterThanOrEqual(r[i - 1]!.width_mm);
      }
    }
  });
  it('at each bore D of series 03 > 02 > 10', () => {
    for (const d of BORES) {
      expect(at(rows, '03', d)!.outerDiameter_mm).toBeGreaterThan(at(rows, '02', d)!.outerDiameter_mm);
      expect(at(rows, '02', d)!.outerDiameter_mm).toBeGreaterThan(at(rows, '10', d)!.outerDiameter_mm);
    }
  });
  it("series 22 has 02's D and a larger B; series 23 has 03's D and a larger B", () => {
    for (const [wide, narrow] of [
      ['22', '02'],
      ['23', '03'],
    ] as const) {
      for (const r of ofSeries(rows, wide)) {
        const n = at(rows, narrow, r.bore_mm)!;
        expect(r.outerDiameter_mm).toBe(n.outerDiameter_mm);
        expect(r.width_mm).toBeGreaterThan(n.width_mm);
      }
    }
  });
  it('every row has a source naming ISO 15 and its check', () => {
    for (const r of rows) expect(wellSourced(r.source, /ISO 15:2017, dimension series/), r.source).toBe(true);
  });
});

describe('ISO 355 tapered table (data/rolling-tapered-dimensions.json)', () => {
  const rows = tapered.rows;
  it('holds series 302, 303, 322, 323 (and 320) from bore 15 or 17 to 200 mm, one row per series and bore', () => {
    for (const s of ['302', '303', '322', '323', '320']) {
      const b = ofSeries(rows, s).map((r) => r.bore_mm);
      expect(b[0]).toBeLessThanOrEqual(20);
      expect(b.at(-1)).toBe(200);
      expect(b.every((d) => BORES.includes(d))).toBe(true);
    }
    expect(new Set(rows.map((r) => `${r.series}/${r.bore_mm}`)).size).toBe(rows.length);
  });
  it('T >= B >= C on every row, and D and T grow with the bore within a series', () => {
    for (const r of rows) {
      expect(r.width_mm).toBeGreaterThanOrEqual(r.innerRingWidth_mm);
      expect(r.innerRingWidth_mm).toBeGreaterThanOrEqual(r.outerRingWidth_mm);
    }
    for (const s of ['302', '303', '322', '323', '320']) {
      const r = ofSeries(rows, s);
      for (let i = 1; i < r.length; i++) {
        expect(r[i]!.outerDiameter_mm).toBeGreaterThan(r[i - 1]!.outerDiameter_mm);
        expect(r[i]!.width_mm).toBeGreaterThanOrEqual(r[i - 1]!.width_mm);
      }
    }
  });
  it('D follows the ISO 15 diameter series: 302 and 322 as 02, 303 and 323 as 03, 320 as 10; the wide series are wider', () => {
    const iso = radial.rows;
    const pairs = [
      ['302', '02'],
      ['322', '02'],
      ['303', '03'],
      ['323', '03'],
      ['320', '10'],
    ] as const;
    for (const [s, dimSeries] of pairs) {
      for (const r of ofSeries(rows, s))
        expect(r.outerDiameter_mm).toBe(at(iso, dimSeries, r.bore_mm)!.outerDiameter_mm);
    }
    for (const [wide, narrow] of [
      ['322', '302'],
      ['323', '303'],
    ] as const) {
      for (const r of ofSeries(rows, wide)) {
        const n = at(rows, narrow, r.bore_mm);
        if (n) expect(r.width_mm).toBeGreaterThan(n.width_mm);
      }
    }
  });
  it("the contact angle lies in the series' ISO 355 angle series (2: 10 deg to 13 deg 52 min, 3: to 15 deg 59 min)", () => {
    const series2 = [10, 13 + 52 / 60];
    const series3 = [13 + 52 / 60, 15 + 59 / 60];
    for (const r of rows) {
      const [lo, hi] = ['303', '323'].includes(r.series) ? series2 : series3;
      expect(r.contactAngle_deg).toBeGreaterThanOrEqual(lo!);
      expect(r.contactAngle_deg).toBeLessThanOrEqual(hi!);
    }
  });
  it('every row has a source naming ISO 355 and its check', () => {
    for (const r of rows)
      expect(wellSourced(r.source, /ISO 355:2019, dimension series \d[A-G]{2}/), r.source).toBe(true);
  });
});

describe('needle roller table (data/rolling-needle-dimensions.json)', () => {
  const rows = needle.rows;
  it('drawn cups have no inner ring; machined rows of series 48, 49, 69 have one with Fw > d', () => {
    for (const r of rows) {
      if (r.form === 'drawn cup') {
        expect(r.series).toBe('drawn cup');
        expect(r.bore_mm).toBeNull();
      } else {
        expect(r.form).toBe('machined');
        expect(['48', '49', '69']).toContain(r.series);
        expect(r.rollerSetBore_mm).toBeGreaterThan(r.bore_mm!);
      }
      expect(r.outerDiameter_mm).toBeGreaterThan(r.rollerSetBore_mm);
    }
  });
  it('within a series Fw and D grow together; series 69 shares 49 dimensions at a greater width', () => {
    for (const s of ['drawn cup', '48', '49', '69']) {
      const r = rows.filter((q) => q.series === s).sort((a, b) => a.rollerSetBore_mm - b.rollerSetBore_mm);
      expect(r.length).toBeGreaterThan(5);
      for (let i = 1; i < r.length; i++) expect(r[i]!.outerDiameter_mm).toBeGreaterThan(r[i - 1]!.outerDiameter_mm);
    }
    for (const r of rows.filter((q) => q.series === '69')) {
      const n = rows.find((q) => q.series === '49' && q.bore_mm === r.bore_mm)!;
      expect([r.rollerSetBore_mm, r.outerDiameter_mm]).toEqual([n.rollerSetBore_mm, n.outerDiameter_mm]);
      expect(r.width_mm).toBeGreaterThan(n.width_mm);
    }
  });
  it('machined bores run from 10 to 200 mm; every row has a source naming its standard', () => {
    const d = rows.flatMap((r) => (r.bore_mm === null ? [] : [r.bore_mm]));
    expect([Math.min(...d), Math.max(...d)]).toEqual([10, 200]);
    for (const r of rows) {
      const std = r.form === 'drawn cup' ? /ISO 3245/ : /ISO 1206/;
      expect(wellSourced(r.source, std), r.source).toBe(true);
    }
  });
});
