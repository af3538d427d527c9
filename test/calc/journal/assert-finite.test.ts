import { describe, expect, it } from 'vitest';
import { assertFinite } from '../../../src/calc/journal/result.js';

// The journal check's last guard: a result holding NaN or an infinity is never reported.
describe('assertFinite', () => {
  it('passes a result whose every number is finite, whatever the nesting', () => {
    expect(() =>
      assertFinite({ a: 1, b: [0, -2.5, { c: 1e-300 }], d: 'text', e: null, f: undefined, g: true }),
    ).not.toThrow();
  });
  it('names the first number that is not finite by its path', () => {
    expect(() => assertFinite({ a: 1, points: [{ flow: 2 }, { flow: 3 }, { flow: NaN }] })).toThrow(
      'journal: internal error, result.points[2].flow is NaN',
    );
    expect(() => assertFinite({ sweep: [[1, Infinity]] })).toThrow('result.sweep[0][1] is Infinity');
    expect(() => assertFinite(-Infinity)).toThrow('result is -Infinity');
  });
  it('reads own keys only, as the result object has them', () => {
    const proto = { inherited: NaN };
    const own = Object.assign(Object.create(proto) as object, { x: 1 });
    expect(() => assertFinite(own)).not.toThrow();
  });
});
