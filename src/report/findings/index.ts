import type { Assumption } from '../../case/types.js';
import type { AssumedFinding, Remark } from '../../core/finding.js';
import type { AssumptionWording, Wording } from './types.js';
import { adviceWording } from './advice.js';
import { bushingWording } from './bushing.js';
import { journalWording } from './journal.js';
import { rollingWording } from './rolling.js';
import { shaftWording } from './shaft.js';

/** Every finding code and its words, one table per kernel. */
const WORDING: Record<string, Wording> = {
  ...adviceWording((f) => describe(f)).findings,
  ...bushingWording.findings,
  ...rollingWording.findings,
  ...journalWording.findings,
  ...shaftWording.findings,
};
const ASSUMPTION_WORDING: Record<string, AssumptionWording> = {
  ...bushingWording.assumptions,
  ...rollingWording.assumptions,
  ...journalWording.assumptions,
};

/** The sentence for a remark. An unknown finding code is a defect: it throws rather than print nothing. */
export function describe(f: Remark): string {
  if (typeof f === 'string') return f;
  const w = WORDING[f.code];
  if (!w) throw new Error(`no wording for finding ${f.code}`);
  return w(f.values);
}

/**
 * A caution in an advice, which names its option: a finding is shown as "<option>: <sentence>",
 * the option read from its code ("rolling.kappa-low" → rolling); a written sentence as it is.
 */
export function describeWarning(w: Remark): string {
  return typeof w === 'string' ? w : `${w.code.slice(0, w.code.indexOf('.'))}: ${describe(w)}`;
}

/** An assumption as shown (field, value, reason), from an assumed finding or a written one. */
export function describeAssumption(a: AssumedFinding | Assumption): Assumption {
  if (!('code' in a)) return a;
  const w = ASSUMPTION_WORDING[a.code];
  if (!w) throw new Error(`no wording for assumption ${a.code}`);
  return { field: a.field, ...w(a.values) };
}

/** Every code that has words (the tests check that each code a kernel emits is here). */
export function knownCodes(): string[] {
  return [...Object.keys(WORDING), ...Object.keys(ASSUMPTION_WORDING)];
}
