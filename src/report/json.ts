import type { AdviceResult, RuleTrace } from '../advise/engine.js';
import type { LoadedCase } from '../case/load.js';
import { caseFileOf, type CaseFileInBase } from '../case/base-units.js';
import { worded, wordedAdvice, type Worded } from './findings/worded.js';
import { describeWarning } from './findings/index.js';
import type { ShaftAdviceView } from './shaft-text.js';

/** Options of adviceJson. */
export interface AdviceJsonOptions {
  /** Keep `rules`, the per-rule trace with the fact values each condition saw (`--explain`). */
  explain?: boolean;
}

/**
 * The advice as JSON data, every finding worded as text and the note word it: every key of the advice result but the rule trace, the case
 * under `case` as a case file in SI base units (`units: base`, so that it loads back to the same
 * SI case), and `rules` only when explaining. JSON has no Infinity or NaN: a number the
 * calculation found infinite (a margin over no limit check, say) is null here, and a key whose
 * value was undefined is absent.
 */
export type AdviceJson = Worded<Omit<AdviceResult, 'rules'>> & { case: CaseFileInBase; rules?: Worded<RuleTrace[]> };

/**
 * The advice as `advise --format json` prints it. Returned after the JSON round trip (so an
 * infinite figure is null and an undefined key is gone), so that the CLI, which prints
 * `JSON.stringify(obj, null, 2)`, and the library's advise() give the very same object, and a
 * caller never meets a value JSON cannot hold.
 */
export function adviceJson(
  loaded: Pick<LoadedCase, 'case'>,
  advice: AdviceResult,
  opts: AdviceJsonOptions = {},
): AdviceJson {
  const { rules, ...rest } = wordedAdvice(advice);
  const echo = caseFileOf(loaded.case);
  const shown: AdviceJson = opts.explain ? { ...rest, case: echo, rules } : { ...rest, case: echo };
  return JSON.parse(JSON.stringify(shown)) as AdviceJson;
}

/**
 * A whole shaft's advice as `advise --format json` prints it (the contract of a shaft case):
 * `shaft` (maxDeflection m, maxMoment N·m, diagram: x m, shearY and shearZ N, moment N·m,
 * deflection m, and each plane's moment and deflection), `supports` (name, at m, diameter m,
 * reaction y, z, radial, axial N, slope rad, and `advice`: the single-support advice exactly as
 * adviceJson prints it, its own case echoed), `arrangement` (locating, summary, reasons, worded),
 * `assumed`, `warnings` (worded), then the shaft case as written under `case`. SI throughout.
 */
export function shaftAdviceJson(
  given: unknown,
  cases: Pick<LoadedCase, 'case'>[],
  a: ShaftAdviceView,
  opts: AdviceJsonOptions = {},
): Record<string, unknown> {
  const shown = {
    shaft: { maxDeflection: a.shaft.maxDeflection, maxMoment: a.shaft.maxMoment, diagram: a.shaft.diagram },
    supports: a.supports.map((s, i) => ({
      name: s.name,
      at: s.at,
      diameter: s.diameter,
      reaction: s.reaction,
      slope: s.slope,
      advice: adviceJson(cases[i]!, s.advice, opts),
    })),
    arrangement: worded(a.arrangement),
    assumed: worded(a.assumed),
    warnings: a.warnings.map(describeWarning),
    case: given,
  };
  return JSON.parse(JSON.stringify(shown)) as Record<string, unknown>;
}
