// Kind: published-formula checks (ISO 281:2007 rating life) on hand-worked numbers, and
// properties (inverse, nulls for undefined lives).
import { describe, expect, it } from 'vitest';
import {
  basicRatingLife,
  lifeExponent,
  lifeHours,
  reliabilityFactor,
  requiredDynamicRating,
} from '../../../src/calc/rolling/life.js';

describe('basic rating life, ISO 281:2007 L10 = (C/P)^p, L10h = 10^6·L10/(60·n) (seen)', () => {
  it('ball: C = 30 kN, P = 3 kN gives (10)^3 = 1000 million revolutions', () => {
    expect(basicRatingLife(30000, 3000, lifeExponent('ball'))).toBeCloseTo(1000, 9);
  });
  it('roller: p = 10/3, C/P = 10 gives 10^(10/3) ≈ 2154.43 million revolutions (hand: 10^3.3333)', () => {
    expect(basicRatingLife(50000, 5000, lifeExponent('roller'))).toBeCloseTo(2154.43469, 3);
  });
  it('L10h: 1000 million rev at 500 r/min is 10^9/(60·500) = 33 333.3 h', () => {
    expect(lifeHours(1000, 500 / 60)).toBeCloseTo(1e9 / 30000, 6);
  });
  it('no load or no rotation: lives are null, not Infinity', () => {
    expect(basicRatingLife(30000, 0, 3)).toBeNull();
    expect(lifeHours(1000, 0)).toBeNull();
  });
});

describe('required dynamic rating (inverse of L10 = (C/P)^p)', () => {
  it('returns the C whose L10h equals the target', () => {
    const P = 2500;
    const n = 720 / 60;
    const C = requiredDynamicRating(P, n, 20000, 3)!;
    expect(lifeHours(basicRatingLife(C, P, 3)!, n)).toBeCloseTo(20000, 6);
  });
  it('hand-worked: 20 000 h at 720 r/min is 864 million rev; C = 2500·864^(1/3) = 2500·9.524 = 23 811 N', () => {
    expect(requiredDynamicRating(2500, 12, 20000, 3)).toBeCloseTo(2500 * Math.cbrt(864), 6);
    expect(requiredDynamicRating(2500, 12, 20000, 3)).toBeCloseTo(23811, -1);
  });
  it('counts a1: at a1 = 0.25 the rating grows by 4^(1/3)', () => {
    const base = requiredDynamicRating(2500, 12, 20000, 3)!;
    expect(requiredDynamicRating(2500, 12, 20000, 3, 0.25)! / base).toBeCloseTo(Math.cbrt(4), 9);
  });
  it('null with no rotation or no target', () => {
    expect(requiredDynamicRating(2500, 0, 20000, 3)).toBeNull();
    expect(requiredDynamicRating(2500, 12, 0, 3)).toBeNull();
  });
});

describe('a1 = 0.95·[ln(100/R)/ln(100/90)]^(2/3) + 0.05 (ISO 281:2007, cl. 9.2, formula from memory)', () => {
  it('is 1 at 90 % and falls with reliability', () => {
    expect(reliabilityFactor(90).a1).toBeCloseTo(1, 12);
    expect(reliabilityFactor(95).a1).toBeLessThan(1);
    expect(reliabilityFactor(99).a1).toBeLessThan(reliabilityFactor(95).a1);
  });
  it('hand-worked at 95 %: ln(100/95)/ln(100/90) = 0.051293/0.105361 = 0.48683; ^(2/3) = 0.61872; a1 = 0.6378', () => {
    expect(reliabilityFactor(95).a1).toBeCloseTo(0.6379, 3);
  });
  it('outside 90..99.95 % the reliability is held to the range and flagged', () => {
    expect(reliabilityFactor(80)).toMatchObject({ reliabilityUsed: 90, clamped: true, a1: 1 });
    expect(reliabilityFactor(99.99).reliabilityUsed).toBe(99.95);
    expect(reliabilityFactor(99.99).clamped).toBe(true);
  });
});
