/**
 * A finding: what a kernel or the advisor found, as data. The code names the finding and the
 * values carry the numbers (SI) and names it rests on; the words a reader sees are written in
 * one place, src/report/findings/, so JSON, text and the note say the same thing.
 */
export type FindingValue =
  number | string | boolean | null | Finding | readonly (number | string)[] | readonly Finding[];

export interface Finding {
  /** Stable code, "<option>.<what>", e.g. "rolling.kappa-below-range". */
  code: string;
  /** Numbers in SI base units (temperatures °C), ids and names the wording needs, or the findings it rests on. */
  values: Record<string, FindingValue>;
}

/** An assumption a kernel made: the case field it stands for, the value taken, and why, as data. */
export interface AssumedFinding extends Finding {
  field: string;
}

/** Build a finding (a small helper so call sites read as data). */
export function finding(code: string, values: Record<string, FindingValue> = {}): Finding {
  return { code, values };
}

/** Build an assumed finding for `field`. */
export function assumedFinding(field: string, code: string, values: Record<string, FindingValue> = {}): AssumedFinding {
  return { field, code, values };
}

/**
 * A reason or caution as it travels to the report: a sentence already written (a rule file's
 * `because`, a check's label) or a finding that the report words.
 */
export type Remark = string | Finding;

/** A key that is equal for equal remarks (for removing repeats). */
export function remarkKey(r: Remark): string {
  return typeof r === 'string' ? r : JSON.stringify(r);
}

/** What JSON.stringify writes under `key` of `o` (own enumerable properties only); NONE when absent. */
const NONE = Symbol('none');
const own = (o: object, key: string): unknown =>
  Object.prototype.propertyIsEnumerable.call(o, key) ? (o as Record<string, unknown>)[key] : NONE;
/** A value that JSON writes as itself and reads back equal: a string, a boolean or a finite number. */
const scalar = (v: unknown): boolean =>
  typeof v === 'string' || typeof v === 'boolean' || (typeof v === 'number' && Number.isFinite(v));
const plain = (v: unknown): v is object =>
  typeof v === 'object' && v !== null && typeof (v as { toJSON?: unknown }).toJSON !== 'function';

/**
 * True only when `a` and `b` surely serialise differently: JSON that is equal reads back
 * equal, so a scalar that differs under the same key (the code, a value, an element of a
 * list of values) or lists of different lengths prove the texts differ. False means "maybe
 * equal", to be settled by comparing remarkKey.
 */
function surelyDifferent(a: Finding, b: Finding): boolean {
  if (!plain(a) || !plain(b)) return false;
  const ca = own(a, 'code');
  const cb = own(b, 'code');
  if (scalar(ca) && scalar(cb) && ca !== cb) return true;
  const va = own(a, 'values');
  const vb = own(b, 'values');
  if (!plain(va) || !plain(vb)) return false;
  for (const k of Object.keys(va)) {
    const p = own(va, k);
    const q = own(vb, k);
    if (scalar(p) && scalar(q)) {
      if (p !== q) return true;
    } else if (Array.isArray(p) && Array.isArray(q) && plain(p) && plain(q)) {
      if (p.length !== q.length) return true;
      for (let i = 0; i < p.length; i++) if (scalar(p[i]) && scalar(q[i]) && p[i] !== q[i]) return true;
    }
  }
  return false;
}

/** Whether `x` repeats one of `kept` (the same sentence, or a finding with the same key). */
function repeats(x: Remark, kept: readonly Remark[], keyOf: (f: Finding) => string): boolean {
  if (typeof x === 'string') return kept.includes(x);
  for (const y of kept) if (typeof y !== 'string' && !surelyDifferent(x, y) && keyOf(x) === keyOf(y)) return true;
  return false;
}

/**
 * The remarks without repeats (equal `remarkKey`), first occurrence kept, in order: the same
 * as filtering on remarkKey, without serialising every finding. A finding is serialised only
 * when an earlier kept one cannot be told from it by surelyDifferent (a different code, or a
 * scalar value that differs). A list with a sentence that could read as a serialised finding
 * (starting with "{"), a finding that serialises itself (toJSON) or more than 64 remarks is
 * filtered on remarkKey directly.
 */
export function uniqueRemarks(xs: readonly Remark[]): Remark[] {
  if (xs.length > 64 || xs.some((x) => (typeof x === 'string' ? x.startsWith('{') : !plain(x)))) {
    const seen = new Set<string>();
    return xs.filter((x) => !seen.has(remarkKey(x)) && !!seen.add(remarkKey(x)));
  }
  const out: Remark[] = [];
  // Each finding serialised at most once, and only when needed.
  let keys: Map<Finding, string> | undefined;
  const keyOf = (f: Finding): string => {
    let k = (keys ??= new Map()).get(f);
    if (k === undefined) keys.set(f, (k = remarkKey(f)));
    return k;
  };
  for (const x of xs) if (!repeats(x, out, keyOf)) out.push(x);
  return out;
}
