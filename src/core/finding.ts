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
