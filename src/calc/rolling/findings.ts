import { remarkKey, type AssumedFinding, type Finding } from '../../core/finding.js';

/**
 * What one rolling check found besides its figures, as data: the assumptions it made and its
 * cautions, each a code with its values (SI numbers, ids, names), worded by the report
 * (src/report/findings/rolling.ts). The steps of a check add to one collector in the order
 * they run, so the order of the lists is the order of the steps. A caution found twice is
 * kept once: two cautions are the same when their code and values are, or, where a step says
 * so, when they agree at the precision they are shown at (the same Fa/C0 to four places from
 * two operating points, say), which is how they have always been told apart.
 */
export interface Notes {
  readonly assumed: AssumedFinding[];
  readonly warnings: Finding[];
  assume(a: AssumedFinding): void;
  /** Add a caution; `sameAs` names it for telling repeats apart (default: its code and values). */
  warn(w: Finding, sameAs?: string): void;
  /**
   * Whether warn(w, sameAs) with a caution of this code would keep it (none of that code and
   * name is kept yet): a step asks before building a caution that most candidates repeat.
   */
  wants(code: string, sameAs: string): boolean;
}

/** An empty collector for one check. */
export function newNotes(): Notes {
  const assumed: AssumedFinding[] = [];
  const warnings: Finding[] = [];
  // Named cautions: the names kept per code. Others: the cautions kept per code, compared by
  // their default key only with those of the same code (the key holds the code).
  const named = new Map<string, Set<string>>();
  const byCode = new Map<string, Finding[]>();
  return {
    assumed,
    warnings,
    assume: (a) => void assumed.push(a),
    warn: (w, sameAs) => {
      if (sameAs !== undefined) {
        let names = named.get(w.code);
        if (!names) named.set(w.code, (names = new Set()));
        if (names.has(sameAs)) return;
        names.add(sameAs);
      } else {
        const same = byCode.get(w.code);
        if (!same) byCode.set(w.code, [w]);
        else {
          const key = keyOf(w);
          if (same.some((x) => keyOf(x) === key)) return;
          same.push(w);
        }
      }
      warnings.push(w);
    },
    wants: (code, sameAs) => named.get(code)?.has(sameAs) !== true,
  };
}

/**
 * The default key of a caution, kept per finding: a sweep's memo hands the same findings
 * (a list of every bearing left out for its size, say) to every point's collector. Findings
 * are data, never changed once made.
 */
const keys = new WeakMap<Finding, string>();
function keyOf(w: Finding): string {
  let key = keys.get(w);
  if (key === undefined) keys.set(w, (key = remarkKey(w)));
  return key;
}
