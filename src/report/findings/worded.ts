import type { Assumption } from '../../case/types.js';
import type { AssumedFinding, Finding, Remark } from '../../core/finding.js';
import { describe, describeAssumption, describeWarning } from './index.js';

const isFinding = (v: unknown): v is Finding =>
  typeof v === 'object' &&
  v !== null &&
  typeof (v as Finding).code === 'string' &&
  typeof (v as Finding).values === 'object' &&
  Object.keys(v).every((k) => k === 'code' || k === 'values' || k === 'field');

/** A value as printed in JSON: its findings become sentences, its assumed findings field, value, reason. */
export type Worded<T> = T extends AssumedFinding
  ? Assumption
  : T extends Finding
    ? string
    : T extends readonly (infer U)[]
      ? Worded<U>[]
      : T extends object
        ? { [K in keyof T]: Worded<T[K]> }
        : T;

/**
 * A result as printed in JSON: every finding in it worded the way the text and the note word
 * it (an assumed finding as field, value, reason; any other as its sentence), everything else
 * as it is, keys in their order.
 */
export function worded<T>(value: T): Worded<T>;
export function worded(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(worded);
  if (isFinding(value)) return 'field' in value ? describeAssumption(value as AssumedFinding) : describe(value);
  if (typeof value !== 'object' || value === null) return value;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(value)) out[k] = worded(v);
  return out;
}

/** An advice as printed in JSON: as worded(), with each caution naming its option. */
export function wordedAdvice<T extends { warnings: readonly Remark[] }>(a: T): Worded<T> {
  return worded({ ...a, warnings: a.warnings.map(describeWarning) }) as Worded<T>;
}
