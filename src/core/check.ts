/**
 * The check record: the one shape every quantitative check produces.
 * Rules, reports and the map read this record; nobody re-derives a pass/fail.
 *
 * Margin convention (dimensionless, positive = passes):
 *   sense "max" (value must not exceed limit):     margin = (limit − value) / limit
 *   sense "min" (value must reach at least limit): margin = (value − limit) / limit
 * A margin of 0.25 therefore reads "25 % of the limit to spare".
 *
 * Temperatures (unit "degC") are measured from a reference instead of from 0 °C, which would
 * make the margin depend on the temperature scale: margin = (limit − value)/(limit − T_ref),
 * the share of the allowed rise left, with T_ref the inlet or ambient temperature the check
 * names (absolute zero, −273.15 °C, when it names none).
 */
export interface CheckRecord {
  /** Stable identifier, e.g. "pressure", "pv", "wear-life". */
  id: string;
  /** What is checked, in words a reviewer reads. */
  label: string;
  /** The computed value, SI base units (temperatures °C, lives in hours where unit says "h"). */
  value: number;
  /** The limit it is held against, same unit. */
  limit: number;
  /** Unit of value and limit, e.g. "Pa", "m/s", "Pa*m/s", "m", "h", "degC", "1". */
  unit: string;
  /** Signed margin as defined above. */
  margin: number;
  pass: boolean;
  /** Where the limit comes from: standard, book, table — or "common practice" / "from memory". */
  source: string;
  /** Whether the limit is an upper ("max") or lower ("min") bound. */
  sense: 'max' | 'min';
  /** Advice rather than a limit: shown with its mark, but it does not decide feasibility. */
  advisory?: boolean;
}

/** Mark a check as advice: it is reported but does not gate feasibility. */
export function advisory(record: CheckRecord): CheckRecord {
  // Written out field by field: one fixed object shape is several times faster than a spread in sweeps.
  return {
    id: record.id,
    label: record.label,
    value: record.value,
    limit: record.limit,
    unit: record.unit,
    margin: record.margin,
    pass: record.pass,
    source: record.source,
    sense: record.sense,
    advisory: true,
  };
}

/** True when every check that is a limit (not advice) passes. */
export function allLimitsPass(checks: CheckRecord[]): boolean {
  return checks.every((k) => k.pass || k.advisory === true);
}

/**
 * Build a check record, computing margin and pass from the sense of the limit; `reference`
 * is the temperature a "degC" margin is measured from (see above).
 */
export function makeCheck(
  id: string,
  label: string,
  value: number,
  limit: number,
  unit: string,
  sense: 'max' | 'min',
  source: string,
  reference?: number,
): CheckRecord {
  const margin = marginOf(value, limit, unit, sense, reference);
  return { id, label, value, limit, unit, margin, pass: passes(value, limit, sense), source, sense };
}

/**
 * advisory(makeCheck(...)) built as one record (the same fields in the same order), for checks
 * made in sweeps.
 */
export function makeAdvisoryCheck(
  id: string,
  label: string,
  value: number,
  limit: number,
  unit: string,
  sense: 'max' | 'min',
  source: string,
  reference?: number,
): CheckRecord {
  const margin = marginOf(value, limit, unit, sense, reference);
  return { id, label, value, limit, unit, margin, pass: passes(value, limit, sense), source, sense, advisory: true };
}

/** Whether value is within limit: at most it for a "max" limit, at least it for a "min" one. */
const passes = (value: number, limit: number, sense: 'max' | 'min'): boolean =>
  sense === 'max' ? value <= limit : value >= limit;

/** The signed margin of the convention above. */
function marginOf(value: number, limit: number, unit: string, sense: 'max' | 'min', reference?: number): number {
  // A reference at or above the limit (an inlet or a room already hotter than allowed) leaves no
  // rise to share out: the margin is then measured from absolute zero, so its sign follows pass.
  const zero = unit === 'degC' ? (reference !== undefined && reference < limit ? reference : -273.15) : 0;
  const span = limit - zero;
  return sense === 'max' ? (limit - value) / span : (value - limit) / span;
}

/**
 * One line of the calculation sheet: a figure with its formula and the values
 * substituted into it, so a reviewer can redo the arithmetic. Values SI.
 */
export interface SheetLine {
  /** What the figure is, e.g. "Mean pressure P". */
  label: string;
  /** The formula in symbols, e.g. "P = F/(D·L)". */
  formula: string;
  /** The formula with numbers, e.g. "P = 3200 N/(0.040 m · 0.040 m)". */
  substituted: string;
  value: number;
  unit: string;
  /** Source of the formula. */
  source: string;
}

/**
 * The governing check: the limit check (advisory ones excluded) with the smallest margin, the
 * first of equals; undefined when there is none.
 */
export function governingCheck(checks: readonly CheckRecord[]): CheckRecord | undefined {
  let best: CheckRecord | undefined;
  for (const k of checks) if (!k.advisory && (best === undefined || k.margin < best.margin)) best = k;
  return best;
}

/** The smallest margin over the limit checks (advisory ones excluded); Infinity when there is none. */
export function governingMargin(checks: readonly CheckRecord[]): number {
  return governingCheck(checks)?.margin ?? Infinity;
}
