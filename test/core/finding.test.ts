import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { finding, remarkKey, uniqueRemarks, type Remark } from '../../src/core/finding.js';

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

  it('equals the filter on remarkKey for any list of sentences and findings', () => {
    const code = fc.constantFrom('x.a', 'x.b', 'x.c');
    const value = fc.oneof(fc.integer({ min: 0, max: 2 }), fc.constantFrom('s', 't'), fc.constant(null));
    const f = fc.record({ code, values: fc.dictionary(fc.constantFrom('n', 'm'), value, { maxKeys: 2 }) });
    const s = fc.constantFrom('one', 'two', '{"code":"x.a","values":{}}');
    fc.assert(
      fc.property(fc.array(fc.oneof(f, s), { maxLength: 8 }), (xs: Remark[]) => {
        expect(uniqueRemarks(xs)).toEqual(byKey(xs));
        const out = uniqueRemarks(xs);
        expect(out.every((x) => xs.includes(x))).toBe(true);
      }),
    );
  });
});
