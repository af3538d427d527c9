// Kind: published-value check of the rolling dimension tables (data/rolling-boundary-dimensions.json,
// data/rolling-tapered-dimensions.json) against open CAD part libraries, whose tables were read
// and transcribed below (seen), keyed by dimension series and bore instead of the libraries'
// own row names. The standards behind them: ISO 15:2017 (radial bearings), and DIN 625-1
// (single-row deep-groove ball), DIN 625-3 (double-row deep-groove ball, dimension series 22),
// DIN 5412-1 (cylindrical roller), ISO 355 / DIN 720 (tapered roller) as the libraries name them.
// Each dataset is also checked the other way: a row whose source claims agreement with a dataset
// must be one the dataset lists.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

interface Row {
  series: string;
  bore_mm: number;
  outerDiameter_mm: number;
  width_mm: number;
  innerRingWidth_mm?: number;
  outerRingWidth_mm?: number;
  source: string;
}
const read = (file: string): Row[] =>
  (JSON.parse(readFileSync(new URL(`../../data/${file}`, import.meta.url), 'utf8')) as { rows: Row[] }).rows;
const radial = read('rolling-boundary-dimensions.json');
const tapered = read('rolling-tapered-dimensions.json');
const find = (rows: Row[], series: string, d: number) => rows.find((r) => r.series === series && r.bore_mm === d);

/** [series, d, D, B] in mm. */
type RadialRow = [series: string, d: number, D: number, B: number];
const BOLTS = 'boltsparts/BOLTS_archive, data/bearings.blt';
const CQW = 'gumyr/cq_warehouse, src/cq_warehouse/';

// prettier-ignore
const RADIAL_DATASETS: ReadonlyArray<{ cite: string; rows: RadialRow[] }> = [
  {
    // BOLTS, class "singlerowradialbearing", standard DIN625-1, columns d1, d2, B.
    cite: `${BOLTS} (DIN 625-1 table)`,
    rows: [
      ['10', 10, 26, 8], ['10', 12, 28, 8], ['10', 15, 32, 9], ['10', 17, 35, 10], ['10', 20, 42, 12],
      ['10', 25, 47, 12], ['10', 30, 55, 13], ['10', 35, 62, 14],
      ['02', 10, 30, 9], ['02', 12, 32, 10], ['02', 15, 35, 11], ['02', 17, 40, 12], ['02', 20, 47, 14],
      ['02', 25, 52, 15], ['02', 30, 62, 16],
      ['03', 10, 35, 11], ['03', 12, 37, 12], ['03', 15, 42, 13], ['03', 17, 47, 14], ['03', 20, 52, 15],
      ['03', 25, 62, 17],
    ],
  },
  {
    // BOLTS, class "cylindricalrollerbearing", standard DIN5412-1, columns d1, d2, B (bores to 200 mm).
    cite: `${BOLTS} (DIN 5412-1 table)`,
    rows: [
      ['02', 15, 35, 11], ['02', 17, 40, 12], ['02', 20, 47, 14], ['02', 25, 52, 15], ['02', 30, 62, 16],
      ['02', 35, 72, 17], ['02', 40, 80, 18], ['02', 45, 85, 19], ['02', 50, 90, 20], ['02', 55, 100, 21],
      ['02', 60, 110, 22], ['02', 65, 120, 23], ['02', 70, 125, 24], ['02', 75, 130, 25], ['02', 80, 140, 26],
      ['02', 85, 150, 28], ['02', 90, 160, 30], ['02', 95, 170, 32], ['02', 100, 180, 34], ['02', 105, 190, 36],
      ['02', 110, 200, 38], ['02', 120, 215, 40], ['02', 130, 230, 40], ['02', 140, 250, 42], ['02', 150, 270, 45],
      ['02', 160, 290, 48], ['02', 170, 310, 52], ['02', 180, 320, 52], ['02', 190, 340, 55], ['02', 200, 360, 58],
    ],
  },
  {
    // BOLTS, class "doublerowradialbearing", standard DIN625-3: double-row deep-groove ball
    // bearings, whose boundary dimensions are those of ISO 15 dimension series 22 (from memory).
    cite: `${BOLTS} (DIN 625-3 table)`,
    rows: [
      ['22', 10, 30, 14], ['22', 12, 32, 14], ['22', 15, 35, 14], ['22', 17, 40, 16], ['22', 20, 47, 18],
      ['22', 25, 52, 18], ['22', 30, 62, 20], ['22', 35, 72, 23], ['22', 40, 80, 23], ['22', 45, 85, 23],
      ['22', 50, 90, 23], ['22', 55, 100, 25], ['22', 60, 110, 28], ['22', 65, 120, 31], ['22', 70, 125, 31],
      ['22', 75, 130, 31], ['22', 80, 140, 33], ['22', 85, 150, 36], ['22', 90, 160, 40],
    ],
  },
  {
    // BOSL2, function ball_bearing_info(), columns ID, OD, width (metric rows).
    cite: 'BelfrySCAD/BOSL2, ball_bearings.scad',
    rows: [
      ['10', 10, 26, 8], ['10', 12, 28, 8], ['10', 15, 32, 9], ['10', 17, 35, 10], ['10', 35, 62, 14],
      ['02', 10, 30, 9], ['02', 12, 32, 10], ['02', 15, 35, 11], ['02', 17, 40, 12], ['02', 20, 47, 14],
      ['02', 25, 52, 15], ['02', 30, 62, 16], ['02', 35, 72, 17], ['02', 40, 80, 18], ['02', 45, 85, 19],
      ['02', 50, 90, 20], ['02', 55, 100, 21], ['02', 60, 110, 22],
      ['03', 12, 37, 12], ['03', 15, 42, 13], ['03', 17, 47, 14], ['03', 20, 52, 15], ['03', 25, 62, 17],
      ['03', 30, 72, 19], ['03', 35, 80, 21], ['03', 40, 90, 23], ['03', 45, 100, 25], ['03', 50, 110, 27],
      ['03', 55, 120, 29], ['03', 60, 130, 31],
    ],
  },
  {
    // omdl, table dtr_motion_bearing_radial_ball, columns id, od, b.
    cite: 'royasutton/omdl, database/component/motion/bearing_radial_ball.scad',
    rows: [
      ['10', 10, 26, 8], ['10', 12, 28, 8], ['10', 15, 32, 9], ['10', 17, 35, 10], ['10', 20, 42, 12],
      ['10', 25, 47, 12], ['10', 30, 55, 13], ['10', 35, 62, 14], ['10', 40, 68, 15], ['10', 45, 75, 16],
      ['10', 50, 80, 16], ['10', 55, 90, 18], ['10', 60, 95, 18], ['10', 65, 100, 18],
      ['02', 10, 30, 9], ['02', 12, 32, 10], ['02', 15, 35, 11], ['02', 17, 40, 12], ['02', 20, 47, 14],
      ['02', 25, 52, 15], ['02', 30, 62, 16], ['02', 35, 72, 17], ['02', 40, 80, 18], ['02', 45, 85, 19],
      ['02', 50, 90, 20],
      ['03', 10, 35, 11], ['03', 12, 37, 12], ['03', 15, 42, 13],
    ],
  },
  {
    cite: `${CQW}single_row_deep_groove_ball_bearing_parameters.csv`,
    rows: [['10', 10, 26, 8], ['02', 10, 30, 9], ['03', 10, 35, 11]],
  },
  {
    cite: `${CQW}single_row_cylindrical_roller_bearing_parameters.csv`,
    rows: [
      ['02', 15, 35, 11], ['02', 17, 40, 12], ['02', 20, 47, 14], ['02', 25, 52, 15], ['22', 17, 40, 16],
      ['22', 20, 47, 18], ['03', 17, 47, 14], ['03', 20, 52, 15], ['23', 20, 52, 21],
    ],
  },
  {
    cite: `${CQW}single_row_angular_contact_ball_bearing_parameters.csv`,
    rows: [
      ['02', 10, 30, 9], ['02', 12, 32, 10], ['02', 15, 35, 11], ['02', 17, 40, 12], ['03', 12, 37, 12],
      ['03', 15, 42, 13], ['03', 17, 47, 14], ['03', 20, 52, 15], ['03', 25, 62, 17],
    ],
  },
];

const key = (series: string, d: number) => `${series}/${d}`;
const claimedBy = (rows: Row[], cite: string) =>
  rows
    .filter((r) => r.source.includes(`${cite};`) || r.source.includes(`${cite} (seen)`))
    .map((r) => key(r.series, r.bore_mm))
    .sort();

describe('ISO 15 rows against open CAD part libraries (values transcribed from each file, seen)', () => {
  for (const { cite, rows } of RADIAL_DATASETS) {
    it(`${cite}: ${rows.length} rows agree in D and B`, () => {
      for (const [series, d, D, B] of rows) {
        expect(find(radial, series, d), key(series, d)).toMatchObject({ outerDiameter_mm: D, width_mm: B });
      }
    });
    it(`${cite}: exactly the rows it lists claim agreement with it`, () => {
      expect(claimedBy(radial, cite)).toEqual(rows.map(([s, d]) => key(s, d)).sort());
    });
  }
  it('a row no dataset lists says it was not checked', () => {
    expect(find(radial, '23', 200)!.source).toMatch(/not checked against open data/);
  });
});

/** [series, d, D, T, B, C] in mm. */
type TaperedRow = [series: string, d: number, D: number, T: number, B: number, C: number];
const TAPERED_CITE = `${CQW}single_row_tapered_roller_bearing_parameters.csv`;
/** gumyr/cq_warehouse, single_row_tapered_roller_bearing_parameters.csv, columns d, D, T, B, C (seen). */
// prettier-ignore
const CQW_TAPERED: TaperedRow[] = [
  ['302', 17, 40, 13.25, 12, 11], ['302', 20, 47, 15.25, 14, 12], ['302', 25, 52, 16.25, 15, 13],
  ['302', 30, 62, 17.25, 16, 14],
  ['303', 15, 42, 14.25, 13, 11], ['303', 17, 47, 15.25, 14, 12], ['303', 20, 52, 16.25, 15, 13],
  ['303', 25, 62, 18.25, 17, 15], ['303', 30, 72, 20.75, 19, 16],
  ['322', 30, 62, 21.25, 20, 17],
  ['323', 17, 47, 20.25, 19, 16], ['323', 20, 52, 22.25, 21, 18], ['323', 25, 62, 25.25, 24, 20],
  ['323', 30, 72, 28.75, 27, 23],
  ['320', 20, 42, 15, 15, 12], ['320', 25, 47, 15, 15, 11.5], ['320', 30, 55, 17, 17, 13],
];

describe(`ISO 355 tapered rows against ${TAPERED_CITE} (seen)`, () => {
  it(`${CQW_TAPERED.length} rows agree in D, T, B and C`, () => {
    for (const [series, d, D, T, B, C] of CQW_TAPERED) {
      expect(find(tapered, series, d), key(series, d)).toMatchObject({
        outerDiameter_mm: D,
        width_mm: T,
        innerRingWidth_mm: B,
        outerRingWidth_mm: C,
      });
    }
  });
  it('exactly the rows it lists claim agreement with it', () => {
    expect(claimedBy(tapered, TAPERED_CITE)).toEqual(CQW_TAPERED.map(([s, d]) => key(s, d)).sort());
  });
  it('series 322, bore 25: the dataset lists only a steep-angle variant (C 15); the row keeps C 16 and says so', () => {
    const r = find(tapered, '322', 25)!;
    expect(r).toMatchObject({ outerDiameter_mm: 52, width_mm: 19.25, innerRingWidth_mm: 18, outerRingWidth_mm: 16 });
    expect(r.source).toContain(TAPERED_CITE);
    expect(r.source).toMatch(/steep-angle variant.*C 15/);
  });
});
