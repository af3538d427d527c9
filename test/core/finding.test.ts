import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  finding,
  remarkKey,
  uniqueRemarks,
  type Finding,
  type FindingValue,
  type Remark,
} from '../../src/core/finding.js';

/** The plain definition: keep a remark unless an earlier one has the same remarkKey. */
const byKey = (xs: Remark[]): Remark[] => {
  const seen = new Set<string>();
  return xs.filter((x) => !seen.has(remarkKey(x)) && !!seen.add(remarkKey(x)));
};

describe('uniqueRemarks', () => {
  it('drops repeated sentences and equal findings, keeping the first of each in order', () => {
    const a = finding('x.a', { n: 1 });
    const xs: Remark[] = ['one', a, finding('x.a', { n: 2 }), 'one', finding('x.a', { n: 1 }), finding('x.b')];
    const out = uniqueRemarks(xs);
    expect(out).toEqual(['one', a, { code: 'x.a', values: { n: 2 } }, { code: 'x.b', values: {} }]);
    expect(out[1]).toBe(a);
  });

  it('treats a sentence that reads as a serialised finding as that finding, as remarkKey does', () => {
    const f = finding('x.a', { n: 1 });
    expect(uniqueRemarks([f, JSON.stringify(f)])).toEqual([f]);
    expect(uniqueRemarks([JSON.stringify(f), f])).toEqual([JSON.stringify(f)]);
  });

  it('keeps findings whose values differ only in key order apart, as remarkKey does', () => {
    const xs = [finding('x.a', { p: 1, q: 2 }), finding('x.a', { q: 2, p: 1 })];
    expect(uniqueRemarks(xs)).toHaveLength(2);
  });

  it('returns a new array, never the input', () => {
    const xs: Remark[] = ['only'];
    expect(uniqueRemarks(xs)).not.toBe(xs);
  });

  it('treats values that JSON writes alike as equal, as remarkKey does', () => {
    // NaN, ±Infinity and null are all written null; -0 is written 0; an undefined value is left out.
    const pairs: [Record<string, FindingValue>, Record<string, FindingValue>][] = [
      [{ n: NaN }, { n: null }],
      [{ n: Infinity }, { n: NaN }],
      [{ n: -0 }, { n: 0 }],
      [{ n: 1, m: undefined as unknown as null }, { n: 1 }],
      [{ n: [NaN, 1] }, { n: [null, 1] as unknown as number[] }],
      [
        { n: 's', k: NaN },
        { n: 's', k: NaN },
      ],
    ];
    for (const [p, q] of pairs) {
      const xs = [finding('x.a', p), finding('x.a', q)];
      expect(uniqueRemarks(xs)).toEqual([xs[0]]);
    }
  });

  it('equals the filter on remarkKey for any list of sentences and findings', () => {
    const code = fc.constantFrom('x.a', 'x.b');
    // Few values, so that repeats are common, among them values JSON writes alike though they
    // differ (NaN, ±Infinity and null; -0 and 0; undefined and absent), lists, and a finding
    // inside a finding.
    const scalar = fc.constantFrom<unknown>(0, -0, 1, NaN, Infinity, null, undefined, 's');
    const value = fc.oneof(scalar, fc.array(fc.constantFrom(1, NaN, null, 's'), { maxLength: 2 }));
    const values = fc.dictionary(fc.constantFrom('n', 'm'), value, { maxKeys: 2 });
    const inner = fc.record({ code, values });
    const f = fc.record({
      code,
      values: fc.oneof(
        values,
        values,
        fc.record({ rests: inner }),
        fc.record({ rests: fc.array(inner, { maxLength: 2 }) }),
      ),
    }) as fc.Arbitrary<Finding>;
    const s = fc.constantFrom('one', 'two', '{"code":"x.a","values":{}}');
    fc.assert(
      fc.property(fc.array(fc.oneof(f, f, f, s), { maxLength: 10 }), (xs: Remark[]) => {
        const out = uniqueRemarks(xs);
        const ref = byKey(xs);
        expect(out.length).toBe(ref.length);
        out.forEach((x, i) => expect(x).toBe(ref[i]));
      }),
      { numRuns: 3000 },
    );
  });
});
