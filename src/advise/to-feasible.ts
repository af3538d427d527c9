import { Engine } from 'json-rules-engine';
import { validateCase } from '../case/load.js';
import type { Assumption, CaseSI } from '../case/types.js';
import { CaseError } from '../core/errors.js';
import { journalOil } from '../calc/rolling/index.js';
import { finding, type Finding } from '../core/finding.js';
import { governingMargin } from '../core/check.js';
import { OPTIONS, type OptionName } from '../core/options.js';
import { advise, type AdviceResult, type AdviseOptions, type RuleFacts, type RuleRun } from './engine.js';
import { loadRules, type LoadedRule } from './load-rules.js';
import { resolvePath } from './path.js';
import { leversFor, withPath, type Lever } from './to-feasible-levers.js';
import type { FeasibleChange } from './to-feasible-types.js';

export type { FeasibleChange } from './to-feasible-types.js';

/** Re-runs allowed per failing option (searches and verifications together). */
export const MAX_RUNS_PER_OPTION = 40;

/** The case as the user wrote it, with what the loader made of it. */
export interface CaseDocument {
  /** The parsed case file (YAML or JSON object), units as written. */
  given: unknown;
  /** The loader's assumptions (defaults applied), for the `from` of a field left out. */
  assumed: readonly Assumption[];
}

/** A rules runner with one Engine, the rules added once (only exclusions decide feasibility). */
function runnerOf(rules: readonly LoadedRule[]): (facts: RuleFacts) => Promise<RuleRun> {
  if (!rules.length) return () => Promise.resolve({ results: [], failureResults: [] });
  const engine = new Engine([], { allowUndefinedFacts: true, pathResolver: resolvePath });
  for (const r of rules)
    engine.addRule({
      name: r.name,
      conditions: r.conditions as never,
      event: { type: r.event.type, params: { ...r.event } },
    });
  return async (facts) => {
    const r = await engine.run({ ...facts });
    return { results: r.results, failureResults: r.failureResults };
  };
}

const QUIET: AdviseOptions['kernel'] = { sheet: false, pressureProfile: false };

/**
 * For every option the advice found not feasible, the smallest change to one case input that
 * makes it feasible, each verified by re-running the whole advice on the changed case file.
 *
 * Method: each candidate value is set in a deep copy of the case document (the YAML object as
 * written), the copy is validated as a case file is (so defaults that follow from the change
 * apply as when a user edits the file) and advised. The search runs only the failing option's
 * kernel and the rules that can exclude it (the other options' results kept from the advice);
 * the value it finds is then verified with every kernel run afresh on the changed case and
 * every exclusion rule, and kept only if the option is feasible there. A continuous input is
 * bisected over its grid (see to-feasible-levers.ts), a discrete one tried in order; at most
 * MAX_RUNS_PER_OPTION runs per option. An option with no verified change gets the finding
 * `advice.no-single-change`. When no option is feasible, the nearest (largest governing
 * margin of its failed checks) comes first.
 *
 * A document that does not validate as it stands (a case built by hand) gets no suggestions.
 */
export async function toMakeFeasible(
  doc: CaseDocument,
  advice: AdviceResult,
  rules: readonly LoadedRule[] = loadRules(),
): Promise<{ toMakeFeasible: FeasibleChange[]; noSingleChange: Finding[] }> {
  const failing = advice.ranking.filter((r) => !r.feasible);
  if (!failing.length) return { toMakeFeasible: [], noSingleChange: [] };
  let base: CaseSI;
  try {
    base = validateCase(structuredClone(doc.given)).case;
  } catch (e) {
    if (e instanceof CaseError) return { toMakeFeasible: [], noSingleChange: [] };
    throw e;
  }
  const exclusions = rules.filter((r) => r.event.type === 'exclude');
  const verifyRun = runnerOf(exclusions);
  const changes = new Map<OptionName, FeasibleChange[]>();
  const none: Finding[] = [];
  for (const r of failing) {
    const option = r.option;
    const searchRun = runnerOf(exclusions.filter((x) => x.event.option === option));
    const others = Object.fromEntries(OPTIONS.filter((o) => o !== option).map((o) => [o, advice.checks[o]]));
    // A rolling bearing that takes the journal's oil grade (an oil supply, no oil named) must see
    // the journal of the changed case, not the original one: leave the journal to be recomputed.
    const othersFor = (c: CaseSI) =>
      option === 'rolling' && journalOil(c, () => 0).sharedGrade ? { ...others, journal: undefined } : others;
    let runs = 0;
    // The option's own result on a changed document, from its search run: the kernels are pure,
    // so the full run reuses it and computes the other options afresh.
    const own = new Map<string, AdviceResult['checks'][OptionName]>();
    const searched = new Map<string, boolean>();
    const feasibleIn = async (text: unknown, full: boolean): Promise<boolean> => {
      const key = JSON.stringify(text);
      if (!full && searched.has(key)) return searched.get(key)!;
      runs++;
      let c: CaseSI;
      try {
        c = validateCase(text).case;
      } catch (e) {
        if (e instanceof CaseError) return false;
        throw e;
      }
      // A kernel that throws on a changed case (outside its model) cannot verify that change.
      const a = await advise(c, [], full ? exclusions : exclusions.filter((x) => x.event.option === option), {
        checks: full ? (own.has(key) ? { [option]: own.get(key) } : {}) : othersFor(c),
        kernel: QUIET,
        traces: false,
        runRules: full ? verifyRun : searchRun,
      }).catch(() => null);
      if (a && !full) own.set(key, a.checks[option]);
      const ok = a?.ranking.find((x) => x.option === option)!.feasible === true;
      if (!full) searched.set(key, ok);
      return ok;
    };
    const found: FeasibleChange[] = [];
    // Rolling: which checks each bearing considered fails (an input can help only where it moves all of one's).
    const candidates =
      option === 'rolling'
        ? advice.checks.rolling.candidates.map((k) => k.checks.filter((x) => !x.pass && !x.advisory).map((x) => x.id))
        : undefined;
    for (const lever of leversFor(option, doc.given, base, doc.assumed, r.failed, candidates)) {
      if (runs >= MAX_RUNS_PER_OPTION) break;
      const to = await search(lever, doc.given, feasibleIn, () => MAX_RUNS_PER_OPTION - runs);
      if (to !== null) found.push({ option, field: lever.field, from: lever.from, to, verified: true });
    }
    if (found.length) changes.set(option, found);
    else none.push(finding('advice.no-single-change', { option }));
  }
  const order = [...changes.keys()];
  if (advice.recommendation === null) {
    const margin = (o: OptionName) => {
      const m = governingMargin(advice.ranking.find((x) => x.option === o)!.failed);
      return Number.isFinite(m) ? m : 0;
    };
    order.sort((a, b) => margin(b) - margin(a) || OPTIONS.indexOf(a) - OPTIONS.indexOf(b));
  }
  return { toMakeFeasible: order.flatMap((o) => changes.get(o)!), noSingleChange: none };
}

/**
 * The smallest verified value of one lever, or null. Monotone: the far end first (if the
 * option fails there, no value of this input makes it feasible), then bisection for the first
 * value that passes the search, then that value (and, if it fails the full run, the next two)
 * verified. Discrete: the probe first (if the option fails with it, none), then each value in
 * turn, the first that passes both (the probe's own search run is not repeated: same document).
 */
async function search(
  lever: Lever,
  doc: unknown,
  feasibleIn: (text: unknown, full: boolean) => Promise<boolean>,
  left: () => number,
): Promise<string | null> {
  const at = (i: number, full: boolean) => feasibleIn(withPath(doc, lever.field, lever.steps[i]), full);
  const n = lever.steps.length;
  if (!lever.monotone) {
    if (lever.probe !== undefined && !(await feasibleIn(withPath(doc, lever.field, lever.probe), false))) return null;
    for (let i = 0; i < n && left() > 0; i++)
      if ((await at(i, false)) && left() > 0 && (await at(i, true))) return lever.steps[i]!;
    return null;
  }
  if (!(await at(n - 1, false))) return null;
  let lo = -1; // fails (the present value)
  let hi = n - 1; // passes
  while (hi - lo > 1 && left() > 1) {
    const mid = (lo + hi) >> 1;
    if (await at(mid, false)) hi = mid;
    else lo = mid;
  }
  for (let i = hi; i < Math.min(n, hi + 3) && left() > 0; i++) if (await at(i, true)) return lever.steps[i]!;
  return null;
}

/** The advice with its `toMakeFeasible` and `noSingleChange` filled from the case document. */
export async function withToMakeFeasible(
  advice: AdviceResult,
  doc: CaseDocument,
  rules: readonly LoadedRule[] = loadRules(),
): Promise<AdviceResult> {
  return { ...advice, ...(await toMakeFeasible(doc, advice, rules)) };
}
