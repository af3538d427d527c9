// withPath: a deep copy of a case document with one field set, the same as a structuredClone of
// the document with that field set, and never a change to the document itself.
import { describe, expect, it } from 'vitest';
import { withPath } from '../../src/advise/to-feasible-levers.js';

/** The plain definition: structuredClone, then set the path (parents made as needed). */
function reference(doc: unknown, path: string, value: unknown): Record<string, unknown> {
  const copy = structuredClone(doc) as Record<string, unknown>;
  const keys = path.split('.');
  let o = copy;
  for (const k of keys.slice(0, -1)) {
    const next = o[k];
    if (next === null || typeof next !== 'object' || Array.isArray(next)) o[k] = {};
    o = o[k] as Record<string, unknown>;
  }
  o[keys[keys.length - 1]!] = value;
  return copy;
}

describe('withPath', () => {
  const doc = () => ({
    title: 'invented roller',
    shaft: { diameter: '40 mm', speed: '100 rpm' },
    load: {
      points: [
        { radial: '2 kN', share: 0.5 },
        { radial: '1 kN', share: 0.5 },
      ],
      shock: 'light',
    },
    space: { maxLength: '60 mm' },
    none: null,
  });

  it('copies the document deeply and sets the field, leaving the document as it was', () => {
    const d = doc();
    const before = structuredClone(d);
    for (const [path, value] of [
      ['space.maxLength', '80 mm'],
      ['lubrication.supply', 'oil-bath'],
      ['shaft.speed.x', '1'],
      ['none.y', 2],
    ] as const) {
      const out = withPath(d, path, value);
      expect(out).toStrictEqual(reference(d, path, value));
      expect(d).toStrictEqual(before);
      (out.load as { points: { radial: string }[] }).points[0]!.radial = 'changed';
      expect(d).toStrictEqual(before);
    }
  });

  it('keeps what structuredClone keeps for trees that are not plain data', () => {
    const shared = { radial: '1 kN' };
    const aliased = { load: { a: shared, b: shared }, space: { maxLength: '60 mm' } };
    const out = withPath(aliased, 'load.a.radial', '2 kN');
    expect(out).toStrictEqual(reference(aliased, 'load.a.radial', '2 kN'));
    // One object reached twice stays one object, as in structuredClone.
    const load = out.load as { a: object; b: object };
    expect(load.a).toBe(load.b);
    const dated = { made: new Date(0), space: {} };
    expect(withPath(dated, 'space.maxLength', '1 m')).toStrictEqual(reference(dated, 'space.maxLength', '1 m'));
    const list = [1, 2, 3];
    delete list[1];
    const sparse = { list, space: {} };
    expect(withPath(sparse, 'space.x', 1)).toStrictEqual(reference(sparse, 'space.x', 1));
    const proto = JSON.parse('{"__proto__": {"x": 1}, "space": {}}') as unknown;
    expect(withPath(proto, 'space.x', 1)).toStrictEqual(reference(proto, 'space.x', 1));
  });
});
