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

/**
 * The remarks without repeats (equal `remarkKey`), first occurrence kept, in order. The same
 * as filtering on remarkKey, without serialising every finding: two findings with different
 * codes never have equal keys (the code is in the key), so a finding is serialised only when
 * another finding shares its code, or when a sentence could read like a serialised finding
 * (starts with "{").
 */
export function uniqueRemarks(xs: readonly Remark[]): Remark[] {
  if (xs.length < 2) return xs.slice();
  const codes = new Map<unknown, number>();
  let jsonLike = false;
  for (const x of xs)
    if (typeof x === 'string') jsonLike ||= x.startsWith('{');
    else codes.set(x.code, (codes.get(x.code) ?? 0) + 1);
  const seen = new Set<string>();
  const out: Remark[] = [];
  for (const x of xs) {
    if (typeof x !== 'string' && !jsonLike && typeof x.code === 'string' && codes.get(x.code) === 1) {
      out.push(x);
      continue;
    }
    const k = remarkKey(x);
    if (seen.has(k)) continue;
    seen.add(k);
    out.push(x);
  }
  return out;
}
