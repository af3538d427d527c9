// Kind: published-formula checks: ISO 281:2007 dynamic ratings and ISO 76:2006 static ratings
// (formulas from memory; factor tables in data/rolling-ratings.json, from memory) against values
// worked by hand from them; and properties of estimateRatings per kind and arrangement.
import { describe, expect, it } from 'vitest';
import { ratingTables, ratingTablesSchema } from '../../../src/data/rolling-ratings.js';
import {
  ballDynamicRating,
  ballStaticRating,
  estimateRatings,
  ratingFactor,
  rollerDynamicRating,
  rollerStaticRating,
  type RatingInput,
} from '../../../src/calc/rolling/ratings.js';
import { FORMS, ROLLING_KINDS } from '../../../src/calc/rolling/kinds.js';
import { readFileSync } from 'node:fs';

const tables = ratingTables();
const rf = { fcBall: tables.curves.fcBallRadial, f0Ball: tables.curves.f0BallRadial, fcRoller: tables.curves.fcRoller };
const ball = { Dw: 0.012, Dpw: 0.06, Z: 9, i: 1, alpha: 0 };

describe('ball bearing, C = b_m·f_c·(i·cosα)^0.7·Z^(2/3)·Dw^1.8', () => {
  it('Dw = 12 mm, Dpw = 60 mm, Z = 9: γ = 0.2, f_c = 59.9; 1.3·59.9·4.32675·87.6045 = 29 516 N', () => {
    // 9^(2/3) = 4.326749; 12^1.8 = e^(1.8·2.484907) = 87.60447; 1.3·59.9 = 77.87
    const r = ballDynamicRating(ball, rf.fcBall);
    expect(r.gamma).toBeCloseTo(0.2, 12);
    expect(r.factor).toBeCloseTo(59.9, 12);
    expect(r.value).toBeCloseTo(77.87 * 4.326749 * 87.60447, 0);
    expect(r.value).toBeCloseTo(29516.0, 0);
  });
  it('f_c interpolates linearly: γ = 0.23 → (59.6 + 59.0)/2 = 59.3', () => {
    expect(ratingFactor(rf.fcBall, 0.23).factor).toBeCloseTo(59.3, 12);
  });
  it('the Dw > 25.4 mm form meets the Dw ≤ 25.4 mm form at 25.4 mm (3.647 = 25.4^0.4)', () => {
    const g = (Dw: number) => ({ Dw, Dpw: Dw / 0.2, Z: 9, i: 1, alpha: 0 });
    const below = ballDynamicRating(g(0.0254), rf.fcBall).value;
    const above = ballDynamicRating(g(0.025400001), rf.fcBall).value;
    expect(above / below).toBeCloseTo(1, 4);
  });
  it('grows with ball count as Z^(2/3)', () => {
    const r12 = ballDynamicRating({ ...ball, Z: 12 }, rf.fcBall).value;
    expect(r12 / ballDynamicRating(ball, rf.fcBall).value).toBeCloseTo(Math.pow(12 / 9, 2 / 3), 12);
  });
});

describe('ball bearing, C0 = f0·i·Z·Dw²·cosα (ISO 76)', () => {
  it('Dw = 12 mm, γ = 0.2 (f0 = 14.0), Z = 9: 14.0·9·144 = 18 144 N', () => {
    expect(ballStaticRating(ball, rf.f0Ball).value).toBeCloseTo(18144, 6);
  });
  it('between rows: γ = 0.155 → f0 = (15.2 + 14.9)/2 = 15.05', () => {
    expect(ratingFactor(rf.f0Ball, 0.155).factor).toBeCloseTo(15.05, 12);
  });
  it('outside the table the end value is used and flagged', () => {
    const r = ballStaticRating({ ...ball, Dw: 0.02, Dpw: 0.05 }, rf.f0Ball); // γ = 0.4, table ends at 0.30
    expect(r.inTable).toBe(false);
    expect(r.factor).toBe(11.6);
  });
});

describe('cylindrical roller bearing', () => {
  const roller = { Dwe: 0.01, Lwe: 0.0108, Dpw: 0.06, Z: 15, i: 1, alpha: 0 };
  it('C = 1.1·f_c·(Lwe)^(7/9)·Z^(3/4)·Dwe^(29/27): γ = 1/6, f_c = 88.5 + (0.00667/0.02)·0.3 = 88.6', () => {
    // 10.8^(7/9) = 6.3640; 15^0.75 = 7.6220; 10^(29/27) = 11.8665; 1.1·88.6 = 97.46
    const r = rollerDynamicRating(roller, rf.fcRoller);
    expect(r.factor).toBeCloseTo(88.6, 9);
    expect(r.value).toBeCloseTo(97.46 * Math.pow(10.8, 7 / 9) * Math.pow(15, 0.75) * Math.pow(10, 29 / 27), 3);
    expect(r.value).toBeCloseTo(56072, -1);
  });
  it('C0 = 44·(1 − γ)·Z·Lwe·Dwe = 44·(5/6)·15·10.8·10 = 59 400 N', () => {
    expect(rollerStaticRating(roller).value).toBeCloseTo(59400, 6);
  });
});

describe('data/rolling-ratings.json', () => {
  it('passes its schema, names only known kinds and forms, and has a row for every kind', () => {
    const raw: unknown = JSON.parse(
      readFileSync(new URL('../../../data/rolling-ratings.json', import.meta.url), 'utf8'),
    );
    const parsed = ratingTablesSchema.safeParse(raw);
    expect(parsed.success, JSON.stringify(parsed.error?.issues[0])).toBe(true);
    for (const r of tables.kinds) {
      expect(ROLLING_KINDS as readonly string[]).toContain(r.kind);
      if (r.form !== null) expect(FORMS as readonly string[]).toContain(r.form);
    }
    for (const k of ROLLING_KINDS) expect(tables.kinds.some((r) => r.kind === k)).toBe(true);
  });
});

describe('estimateRatings', () => {
  const x = (kind: RatingInput['kind'], over: Partial<RatingInput> = {}): RatingInput => ({
    kind,
    form: null,
    arrangement: 'single',
    contactAngle: 0,
    d: 0.045,
    D: 0.085,
    B: 0.019,
    ...over,
  });
  it('every kind gives finite positive C and C0 inside its factor tables at 45 × 85 × 19', () => {
    for (const kind of ROLLING_KINDS) {
      const r = estimateRatings(x(kind, kind === 'needle roller' ? { d: 0.05, D: 0.062, B: 0.02 } : {}));
      expect(r.C, kind).toBeGreaterThan(0);
      expect(r.C0, kind).toBeGreaterThan(0);
      expect(r.inTable, kind).toBe(true);
      expect(r.f0 === null, kind).toBe(r.Lwe !== null); // f0 for balls only
    }
  });
  it('a pair is i = 2: ball C × 2^0.7, roller C × 2^(7/9), C0 × 2, whatever the pair arrangement', () => {
    for (const kind of ['angular-contact ball', 'tapered roller', 'cylindrical roller'] as const) {
      const one = estimateRatings(x(kind));
      for (const arrangement of ['pair back-to-back', 'pair face-to-face', 'pair tandem'] as const) {
        const pair = estimateRatings(x(kind, { arrangement }));
        expect(pair.rows).toBe(2 * one.rows);
        expect(pair.C / one.C).toBeCloseTo(Math.pow(2, kind === 'angular-contact ball' ? 0.7 : 7 / 9), 12);
        expect(pair.C0 / one.C0).toBeCloseTo(2, 12);
      }
    }
  });
  it('two deep-groove ball bearings paired take the double-row f_c column, a little below 2^0.7 C', () => {
    const one = estimateRatings(x('deep-groove ball'));
    const pair = estimateRatings(x('deep-groove ball', { arrangement: 'pair tandem' }));
    const ratio = pair.C / one.C / Math.pow(2, 0.7);
    expect(ratio).toBeLessThan(1);
    expect(ratio).toBeCloseTo(pair.fc / one.fc, 12);
    expect(pair.C0 / one.C0).toBeCloseTo(2, 12);
  });
  it('self-aligning ball: two rows, its own lower f_c and f0 columns: below a deep-groove ball of the same envelope', () => {
    const sa = estimateRatings(x('self-aligning ball'));
    const dg = estimateRatings(x('deep-groove ball'));
    expect(sa.rows).toBe(2);
    expect(sa.f0!).toBeLessThan(4); // ISO 76 self-aligning column, about 2–3.5
    expect(sa.C0).toBeLessThan(dg.C0);
  });
  it('contact angle: given in degrees and used (cos α lowers C), the kind default when 0 (assumed), none for deep-groove', () => {
    const a25 = estimateRatings(x('angular-contact ball', { contactAngle: 25 }));
    const a40 = estimateRatings(x('angular-contact ball', { contactAngle: 40 }));
    expect(a25.alpha).toBeCloseTo((25 * Math.PI) / 180, 12);
    expect(a40.C).toBeLessThan(a25.C);
    const dflt = estimateRatings(x('spherical roller'));
    expect(dflt.assumed.contactAngle).toBeCloseTo(dflt.alpha, 12);
    expect(dflt.alpha).toBeGreaterThan((9 * Math.PI) / 180);
    expect(estimateRatings(x('deep-groove ball')).alpha).toBe(0);
  });
  it('tapered roller: C = 1.1·f_c·(Lwe·cosα)^(7/9)·Z^(3/4)·Dwe^(29/27) on the geometry it reports', () => {
    const r = estimateRatings(x('tapered roller', { contactAngle: 15, B: 0.02075 }));
    const c = Math.cos(r.alpha);
    const mm = 1000;
    const expected = 1.1 * r.fc * Math.pow(r.Lwe! * mm * c, 7 / 9) * Math.pow(r.Z, 0.75) * Math.pow(r.Dw * mm, 29 / 27);
    expect(r.C / expected).toBeCloseTo(1, 12);
    expect(r.C0).toBeCloseTo(44 * (1 - r.gamma) * r.Z * r.Lwe! * mm * r.Dw * mm * c, 6);
  });
  it('needle roller: drawn cup assumed when no form (b_m 1.0), the roller set bore estimated for machined rings with an inner ring', () => {
    const none = estimateRatings(x('needle roller', { d: 0.02, D: 0.026, B: 0.016 }));
    expect(none.assumed.form).toBe('drawn cup');
    expect(none.Dw * 1000).toBeGreaterThan(1.5);
    expect(none.Dw * 1000).toBeLessThan(3);
    const inner = estimateRatings(
      x('needle roller', { form: 'machined with inner ring', d: 0.045, D: 0.068, B: 0.022 }),
    );
    expect(inner.assumed.rollerSetBore).toBeCloseTo(0.045 + 0.3 * 0.023, 12);
    const given = estimateRatings(
      x('needle roller', { form: 'machined with inner ring', d: 0.045, D: 0.068, B: 0.022, rollerSetBore: 0.052 }),
    );
    expect(given.assumed.rollerSetBore).toBeUndefined();
    expect(given.dm).toBeCloseTo(0.052 + given.Dw, 12);
  });
});
