import type { Assumption } from '../../case/types.js';
import type { AssumedFinding, Remark } from '../../core/finding.js';
import { describe, describeAssumption, describeWarning } from './index.js';

/** What a kernel result carries that needs words: its cautions and its assumptions. */
interface Remarked {
  warnings: readonly Remark[];
  assumed: readonly (Assumption | AssumedFinding)[];
}

/** A kernel result as printed in JSON: cautions as sentences, assumptions as field, value, reason. */
export function wordedResult<T extends Remarked>(
  r: T,
): Omit<T, 'warnings' | 'assumed'> & { warnings: string[]; assumed: Assumption[] } {
  return { ...r, warnings: r.warnings.map(describe), assumed: r.assumed.map(describeAssumption) };
}

/** What an advice carries that needs words, besides the kernel results in `checks`. */
interface RemarkedAdvice {
  warnings: readonly Remark[];
  assumed: readonly (Assumption | AssumedFinding)[];
  ranking: readonly { excluded: readonly Remark[] }[];
  toMakeFeasible: readonly Remark[];
  checks: { bushing: Remarked; rolling: Remarked; journal: Remarked };
}

/** An advice as printed in JSON: every finding worded the way the text and the note word it. */
export function wordedAdvice<T extends RemarkedAdvice>(a: T) {
  return {
    ...a,
    ranking: a.ranking.map((r) => ({ ...r, excluded: r.excluded.map(describe) })),
    checks: {
      bushing: wordedResult(a.checks.bushing),
      rolling: wordedResult(a.checks.rolling),
      journal: wordedResult(a.checks.journal),
    },
    assumed: a.assumed.map(describeAssumption),
    toMakeFeasible: a.toMakeFeasible.map(describe),
    warnings: a.warnings.map(describeWarning),
  };
}
