// Kind: published-table checks. ISO 281:2007, cl. 6.2, Table 3 (X, Y, e of radial and
// angular-contact ball bearings, keyed on f0·Fa/C0) and ISO 76:2006 (X0, Y0 of angular-contact
// ball bearings), rows written out here from memory and reproduced at every row by the kernels
// of src/calc/rolling/load-factors.ts; the shipped table data/rolling-load-factors.json passes
// its zod schema.
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dynamicLoad, staticLoad, type BearingLoadSpec } from '../../src/calc/rolling/load-factors.js';

const C0 = 100000;
const ball = (over: Partial<BearingLoadSpec>): BearingLoadSpec => ({
  kind: 'deep-groove ball',
  form: null,
  arrangement: 'single',
  contactAngle: 0,
  C0,
  f0: 10,
  ...over,
});
/** Fa giving the key k for a spec (i·f0·Fa/C0 = k). */
const faFor = (b: BearingLoadSpec, k: number) =>
  (k * b.C0) /
  (b.f0! *
    (b.kind === 'angular-contact ball' && b.arrangement !== 'single' && b.arrangement !== 'pair tandem' ? 2 : 1));

/** ISO 281:2007 Table 3, radial contact groove ball bearings: f0·Fa/C0, e, Y (X = 0.56 above e); from memory. */
const RADIAL: ReadonlyArray<[number, number, number]> = [
  [0.172, 0.19, 2.3],
  [0.345, 0.22, 1.99],
  [0.689, 0.26, 1.71],
  [1.03, 0.28, 1.55],
  [1.38, 0.3, 1.45],
  [2.07, 0.34, 1.31],
  [3.45, 0.38, 1.15],
  [5.17, 0.42, 1.04],
  [6.89, 0.44, 1.0],
];

describe('ISO 281:2007 Table 3, radial contact groove ball bearings (from memory), every row', () => {
  for (const [k, e, Y] of RADIAL) {
    it(`f0·Fa/C0 = ${k}: e = ${e}, X = 0.56, Y = ${Y}`, () => {
      const b = ball({});
      const Fa = faFor(b, k);
      const r = dynamicLoad(b, Fa / (2 * e), Fa);
      expect([r.e, r.X, r.Y]).toEqual([e, 0.56, Y].map((v, i) => (i === 1 ? v : expect.closeTo(v, 12))));
      expect(dynamicLoad(b, Fa / (0.99 * e), Fa)).toMatchObject({ X: 1, Y: 0 });
    });
  }
});

/** Table 3, angular contact, α = 10° and 15°: key, e, single-row Y (X 0.46 / 0.44), double-row Y below and above e (X 0.75 / 0.72); from memory. */
const KEYED: Record<number, { X1: number; X2: number; rows: [number, number, number, number, number][] }> = {
  10: {
    X1: 0.46,
    X2: 0.75,
    rows: [
      [0.172, 0.29, 1.88, 2.18, 3.06],
      [1.38, 0.4, 1.34, 1.55, 2.18],
      [6.89, 0.54, 1.0, 1.16, 1.63],
    ],
  },
  15: {
    X1: 0.44,
    X2: 0.72,
    rows: [
      [0.172, 0.38, 1.47, 1.65, 2.39],
      [1.03, 0.46, 1.23, 1.38, 2.0],
      [6.89, 0.56, 1.0, 1.12, 1.63],
    ],
  },
};

describe('ISO 281:2007 Table 3, angular contact 10° and 15° (from memory), sample rows single and double', () => {
  for (const [angle, t] of Object.entries(KEYED)) {
    for (const [k, e, Y1, Y2below, Y2above] of t.rows) {
      it(`${angle}°, key ${k}: e = ${e}; single X ${t.X1} Y ${Y1}; double Y ${Y2below} | X ${t.X2} Y ${Y2above}`, () => {
        const single = ball({ kind: 'angular-contact ball', contactAngle: Number(angle) });
        const double = { ...single, arrangement: 'pair back-to-back' as const };
        const Fa = faFor(single, k);
        const s = dynamicLoad(single, Fa / (2 * e), Fa);
        expect(s.e!).toBeCloseTo(e, 12);
        expect([s.X, s.Y]).toEqual([t.X1, expect.closeTo(Y1, 12)]);
        const Fa2 = faFor(double, k);
        expect(dynamicLoad(double, Fa2 / (0.5 * e), Fa2).Y).toBeCloseTo(Y2below, 12);
        const above = dynamicLoad(double, Fa2 / (2 * e), Fa2);
        expect([above.X, above.Y]).toEqual([t.X2, expect.closeTo(Y2above, 12)]);
      });
    }
  }
});

/** Table 3, α = 20° … 45°: e; single X, Y; double Y below e, X and Y above; from memory. */
const FIXED: ReadonlyArray<[number, number, number, number, number, number, number]> = [
  [20, 0.57, 0.43, 1.0, 1.09, 0.7, 1.63],
  [25, 0.68, 0.41, 0.87, 0.92, 0.67, 1.41],
  [30, 0.8, 0.39, 0.76, 0.78, 0.63, 1.24],
  [35, 0.95, 0.37, 0.66, 0.66, 0.6, 1.07],
  [40, 1.14, 0.35, 0.57, 0.55, 0.57, 0.93],
  [45, 1.34, 0.33, 0.5, 0.47, 0.54, 0.81],
];

describe('ISO 281:2007 Table 3, angular contact 20° … 45° (from memory), every row', () => {
  for (const [angle, e, X1, Y1, Y2b, X2, Y2] of FIXED) {
    it(`${angle}°: e ${e}; single ${X1}/${Y1}; double ${Y2b} | ${X2}/${Y2}`, () => {
      const single = ball({ kind: 'angular-contact ball', contactAngle: angle });
      const s = dynamicLoad(single, 1000, 3 * e * 1000);
      expect([s.e, s.X, s.Y]).toEqual([e, X1, Y1]);
      const d = { ...single, arrangement: 'pair face-to-face' as const };
      expect(dynamicLoad(d, 1000, 0.5 * e * 1000)).toMatchObject({ X: 1, Y: Y2b });
      expect(dynamicLoad(d, 1000, 3 * e * 1000)).toMatchObject({ X: X2, Y: Y2 });
      // the table's double-row columns meet at e within its rounding: 1 + Y2b·e ≈ X2 + Y2·e
      expect(Math.abs(1 + Y2b * e - (X2 + Y2 * e))).toBeLessThan(0.02);
    });
  }
});

/** ISO 76:2006, angular contact groove ball bearings: α, Y0 single row (X0 0.5), Y0 double row (X0 1); from memory. */
const STATIC: ReadonlyArray<[number, number, number]> = [
  [15, 0.46, 0.92],
  [20, 0.42, 0.84],
  [25, 0.38, 0.76],
  [30, 0.33, 0.66],
  [35, 0.29, 0.58],
  [40, 0.26, 0.52],
  [45, 0.22, 0.44],
];

describe('ISO 76:2006, angular contact ball bearings (from memory), every row', () => {
  for (const [angle, Y01, Y02] of STATIC) {
    it(`${angle}°: single 0.5 / ${Y01}, double 1 / ${Y02}`, () => {
      const s = ball({ kind: 'angular-contact ball', contactAngle: angle });
      expect(staticLoad(s, 1000, 10000)).toEqual({ P0: 500 + Y01 * 10000, X0: 0.5, Y0: Y01 });
      const d = staticLoad({ ...s, arrangement: 'pair back-to-back' }, 1000, 10000);
      expect([d.X0, d.Y0]).toEqual([1, Y02]);
    });
  }
});

describe('data/rolling-load-factors.json passes its schema', () => {
  let before: string | undefined;
  beforeAll(() => {
    before = process.env.SHAFTWISE_DATA_DIR;
    process.env.SHAFTWISE_DATA_DIR = fileURLToPath(new URL('../../data/', import.meta.url));
  });
  afterAll(() => {
    if (before === undefined) delete process.env.SHAFTWISE_DATA_DIR;
    else process.env.SHAFTWISE_DATA_DIR = before;
  });
  it('validates, with nine keys and three key-dependent angles', async () => {
    const { loadFactors } = await import('../../src/data/rolling-load-factors.js');
    const t = loadFactors();
    expect(t.angularContactKeyed.keys).toHaveLength(9);
    expect(t.angularContactKeyed.angles.map((a) => a.angle)).toEqual([5, 10, 15]);
    expect(t.radialBall.rows.map((r) => r.key)).toEqual(RADIAL.map(([k]) => k));
  });
  it('the schema refuses a column of the wrong length', async () => {
    const { loadFactorsSchema } = await import('../../src/data/rolling-load-factors.js');
    const { loadFactors } = await import('../../src/data/rolling-load-factors.js');
    const bad = structuredClone(loadFactors());
    bad.angularContactKeyed.angles[0]!.single.Y.pop();
    expect(loadFactorsSchema.safeParse(bad).success).toBe(false);
  });
});
