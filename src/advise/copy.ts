/** Thrown inside copyTree when the tree is not one it copies as structuredClone would. */
const NOT_PLAIN = Symbol('not plain');

/**
 * A deep copy of parsed data (a case document, the rules), what structuredClone gives. A tree
 * of plain objects, dense arrays and primitives is copied directly (several times faster for a
 * case file or the rules); anything else (a Date, an object of another prototype, a sparse
 * array, a "__proto__" key, an object reached twice, as a YAML alias gives) is left to
 * structuredClone itself.
 */
export function copyData(doc: unknown): unknown {
  const seen = new Set<object>();
  const copyTree = (v: unknown): unknown => {
    if (typeof v !== 'object' || v === null) {
      if (typeof v === 'function' || typeof v === 'symbol') throw NOT_PLAIN;
      return v;
    }
    if (seen.has(v)) throw NOT_PLAIN;
    seen.add(v);
    if (Array.isArray(v)) {
      if (Object.getPrototypeOf(v) !== Array.prototype || Object.keys(v).length !== v.length) throw NOT_PLAIN;
      return v.map(copyTree);
    }
    if (Object.getPrototypeOf(v) !== Object.prototype) throw NOT_PLAIN;
    const out: Record<string, unknown> = {};
    for (const k of Object.keys(v)) {
      if (k === '__proto__') throw NOT_PLAIN;
      out[k] = copyTree((v as Record<string, unknown>)[k]);
    }
    return out;
  };
  try {
    return copyTree(doc);
  } catch (e) {
    if (e === NOT_PLAIN) return structuredClone(doc);
    throw e;
  }
}
