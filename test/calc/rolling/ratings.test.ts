// Kind: published-formula checks: ISO 281:2007 dynamic ratings (cl. 6.1, 7.1) and ISO 76
// static ratings (formulas from memory; factor tables in data/rolling-factors.json, from
// memory) against values worked by hand from them.
import { describe, expect, it } from 'vitest';
import { rollingFactors } from '../../../src/data/rolling.js';
import {
  ballDynamicRating,
  ballStaticRating,
  ratingFactor,
  rollerDynamicRating,
  rollerStaticRating,
} from '../../../src/calc/rolling/ratings.js';

const rf = rollingFactors().ratingFactors;
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
  it('between rows: γ = 0.15 → f0 = (15.4 + 14.9)/2 = 15.15', () => {
    expect(ratingFactor(rf.f0Ball, 0.15).factor).toBeCloseTo(15.15, 12);
  });
  it('outside the table the end value is used and flagged', () => {
    const r = ballStaticRating({ ...ball, Dw: 0.02, Dpw: 0.05 }, rf.f0Ball); // γ = 0.4
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
