import { finding, uniqueRemarks, type AssumedFinding, type Finding, type Remark } from '../core/finding.js';
import { OPTIONS, type OptionName } from '../core/options.js';
import { Engine, type RuleResult } from 'json-rules-engine';
import type { Assumption, CaseSI } from '../case/types.js';
import type { CheckRecord } from '../core/check.js';
import type { FeasibleChange } from './to-feasible-types.js';
import { checkBushing, type BushingResult } from '../calc/bushing/index.js';
import { checkRolling, journalOil } from '../calc/rolling/index.js';
import type { RollingResult } from '../calc/rolling/types.js';
import { checkJournal, type JournalResult } from '../calc/journal/index.js';
import {
  bushingFigures,
  compareFigures,
  dutyFacts,
  journalFigures,
  rollingFigures,
  type Figures,
  type OptionFigures,
} from './facts.js';
import { loadRules, type LoadedRule } from './load-rules.js';
import { resolvePath } from './path.js';
import { type Condition, type leafSchema } from './rule-schema.js';
import type { z } from 'zod';

export interface Reason {
  rule: string;
  /** Points after the priority weight (negative counts against). */
  points: number;
  because: string;
  /** Points as written in the rule, and the weight applied. */
  basePoints: number;
  weight: number;
  priority?: string;
  file: string;
}

export interface RankedOption {
  option: OptionName;
  rank: number;
  score: number;
  feasible: boolean;
  design: OptionFigures['design'];
  figures: {
    lifeHours: number | null;
    lifeRatio: number | null;
    frictionPower: number | null;
    length: number | null;
    outerDiameter: number | null;
  };
  reasons: Reason[];
  /** Limit checks that fail, for an option excluded by its check. */
  failed: CheckRecord[];
  /** Why the option is excluded (check findings and exclusion rules); empty when feasible. */
  excluded: Remark[];
}

export interface ConditionTrace {
  fact: string;
  path?: string;
  operator: string;
  value: unknown;
  /** The fact value the engine saw (undefined when the condition was not reached). */
  factResult?: unknown;
  result?: boolean;
}

export interface RuleTrace {
  rule: string;
  file: string;
  fired: boolean;
  event: LoadedRule['event'];
  conditions: ConditionTrace[];
}

export interface AdviceResult {
  recommendation: OptionName | null;
  ranking: RankedOption[];
  checks: { bushing: BushingResult; rolling: RollingResult; journal: JournalResult };
  /** The loader's assumptions, then each kernel's (as findings, worded by the report). */
  assumed: (Assumption | AssumedFinding)[];
  /** Cautions of the three checks; a finding's code names its option. */
  warnings: Remark[];
  /** How ties were broken, when there was one. */
  tieBreak: Finding | null;
  /**
   * For each option not feasible, verified single changes to the case file that make it
   * feasible. advise() leaves it empty: it needs the case document, and is filled by
   * withToMakeFeasible (to-feasible.ts) for the CLI, the note and the library.
   */
  toMakeFeasible: FeasibleChange[];
  /** An `advice.no-single-change` finding for each option not feasible that no single change found makes feasible. */
  noSingleChange: Finding[];
  /** Every rule evaluated, fired or not, with the fact values it saw. */
  rules: RuleTrace[];
}

/** The facts the rules read, all computed (what advise's dynamic facts resolve to). */
export interface RuleFacts {
  case: CaseSI;
  duty: ReturnType<typeof dutyFacts>;
  bushing: BushingResult;
  rolling: RollingResult;
  journal: JournalResult;
  figures: Figures;
}

/** What a rules run returns: the rules that fired and those that did not, with their condition trees. */
export interface RuleRun {
  results: RuleResult[];
  failureResults: RuleResult[];
}

/** Options of advise(); without them it runs the three kernels and a fresh json-rules-engine Engine. */
export interface AdviseOptions {
  /**
   * Check results already computed for this very case, used instead of running the kernel
   * (the selection map evaluates its own journal design at each point).
   */
  checks?: Partial<{ bushing: BushingResult; rolling: RollingResult; journal: JournalResult }>;
  /**
   * Evaluate the rules with this instead of a fresh Engine (a sweep reuses one Engine over
   * many points). It must return what Engine.run returns for the same rules and facts.
   */
  runRules?: (facts: RuleFacts) => Promise<RuleRun>;
  /** false: leave `rules` (the per-rule trace for --explain) empty; a sweep has no use for it. */
  traces?: boolean;
  /**
   * Options of the kernels this run computes: `sheet: false` skips the calculation sheets and
   * `pressureProfile: false` the journal's pressure profile (text output and sweeps show neither).
   */
  kernel?: { sheet?: boolean; pressureProfile?: boolean };
}

/** Fixed order for ties: the simpler and cheaper support first (common practice), the options' own order. */
const TIE_ORDER: readonly OptionName[] = OPTIONS;
const NEUTRAL_PRIORITY = 3;

/** The kernels of one run, each computed on first use and kept (the rules' dynamic facts). */
function lazyChecks(c: CaseSI, opts: AdviseOptions) {
  const cache: Partial<{ bushing: BushingResult; rolling: RollingResult; journal: JournalResult }> = { ...opts.checks };
  const kernel = opts.kernel ?? {};
  const sheet = kernel.sheet === undefined ? {} : { sheet: kernel.sheet };
  const profile = kernel.pressureProfile === undefined ? {} : { pressureProfile: kernel.pressureProfile };
  const bushing = () => (cache.bushing ??= checkBushing(c, sheet));
  const journal = () => (cache.journal ??= checkJournal(c, { ...sheet, ...profile }));
  // One oil per case: with an oil supply and no oil named, the rolling bearing takes the journal's grade.
  const rolling = () => (cache.rolling ??= checkRolling(c, { ...sheet, ...journalOil(c, () => journal().oilGrade) }));
  let figs: Figures | undefined;
  const figures = (): Figures =>
    (figs ??= compareFigures({
      bushing: bushingFigures(bushing(), c),
      rolling: rollingFigures(rolling(), c),
      journal: journalFigures(journal()),
    }));
  return { bushing, rolling, journal, figures };
}

/** Evaluate every rule: with the caller's runner, or a fresh Engine whose kernel facts are computed on demand. */
async function runAllRules(
  c: CaseSI,
  rules: LoadedRule[],
  lazy: ReturnType<typeof lazyChecks>,
  runRules: AdviseOptions['runRules'],
): Promise<RuleRun> {
  const { bushing, rolling, journal, figures } = lazy;
  if (runRules)
    return runRules({
      case: c,
      duty: dutyFacts(c),
      bushing: bushing(),
      rolling: rolling(),
      journal: journal(),
      figures: figures(),
    });
  const engine = new Engine([], { allowUndefinedFacts: true, pathResolver: resolvePath });
  engine.addFact('case', c);
  engine.addFact('duty', dutyFacts(c));
  engine.addFact('bushing', () => bushing(), { cache: true });
  engine.addFact('rolling', () => rolling(), { cache: true });
  engine.addFact('journal', () => journal(), { cache: true });
  engine.addFact('figures', () => figures(), { cache: true });
  rules.forEach((r) =>
    engine.addRule({
      name: r.name,
      conditions: r.conditions as never,
      event: { type: r.event.type, params: { ...r.event } },
    }),
  );
  return engine.run();
}

/** Every rule with whether it fired and the fact values its conditions saw (for --explain). */
function traceRules(rules: LoadedRule[], run: RuleRun, fired: Set<string>): RuleTrace[] {
  const byName = new Map<string, RuleResult>([...run.results, ...run.failureResults].map((r) => [r.name, r]));
  return rules.map((r) => ({
    rule: r.name,
    file: r.file,
    fired: fired.has(r.name),
    event: r.event,
    conditions: flatten(byName.get(r.name)?.conditions as unknown as Condition | undefined),
  }));
}

/**
 * One option's place before ranking: its check's exclusions, then each fired rule for it (in
 * the rules' order) — an exclusion, or points weighted by the priority it names (priority/3,
 * 3 neutral).
 */
function scoreOption(option: OptionName, f: OptionFigures, fired: readonly LoadedRule[], c: CaseSI): RankedOption {
  const reasons: Reason[] = [];
  const excluded: Remark[] = [];
  if (!f.feasible) excluded.push(...(f.why.length ? f.why : ['its check found no feasible design']));
  for (const r of fired) {
    if (r.event.option !== option) continue;
    if (r.event.type === 'exclude') {
      excluded.push(r.because);
      reasons.push({ rule: r.name, points: 0, basePoints: 0, weight: 1, because: r.because, file: r.file });
      continue;
    }
    const weight = r.event.priority ? c.priorities[r.event.priority] / NEUTRAL_PRIORITY : 1;
    const reason: Reason = {
      rule: r.name,
      points: round2(r.event.points * weight),
      basePoints: r.event.points,
      weight: round2(weight),
      because: r.because,
      file: r.file,
    };
    if (r.event.priority) reason.priority = r.event.priority;
    reasons.push(reason);
  }
  return {
    option,
    rank: 0,
    score: round2(reasons.reduce((s, x) => s + x.points, 0)),
    feasible: excluded.length === 0,
    design: f.design,
    figures: {
      lifeHours: f.lifeHours,
      lifeRatio: f.lifeRatio,
      frictionPower: f.frictionPower,
      length: f.length,
      outerDiameter: f.outerDiameter,
    },
    reasons,
    failed: f.failed,
    excluded: uniqueRemarks(excluded),
  };
}

/** Feasible first, then by score, ties in the fixed order; ranks numbered from 1. */
function rank(options: RankedOption[]): RankedOption[] {
  const ranking = [...options].sort(
    (a, b) =>
      Number(b.feasible) - Number(a.feasible) ||
      b.score - a.score ||
      TIE_ORDER.indexOf(a.option) - TIE_ORDER.indexOf(b.option),
  );
  ranking.forEach((r, i) => (r.rank = i + 1));
  return ranking;
}

/**
 * Advise on a case: run the three checks as dynamic facts (computed on first use, cached for
 * the run), evaluate every rule in rules/, gate feasibility on the checks, score and rank.
 * Deterministic: the same case gives the same result, byte for byte.
 */
export async function advise(
  c: CaseSI,
  caseAssumed: Assumption[],
  rules: LoadedRule[] = loadRules(),
  opts: AdviseOptions = {},
): Promise<AdviceResult> {
  const lazy = lazyChecks(c, opts);
  const run = await runAllRules(c, rules, lazy, opts.runRules);
  const fired = new Set(run.results.map((r) => r.name));
  const traces = opts.traces === false ? [] : traceRules(rules, run, fired);
  const fig = lazy.figures();
  const checks = { bushing: lazy.bushing(), rolling: lazy.rolling(), journal: lazy.journal() };
  // The rules that fired, in the rules' order (each option's reasons keep that order).
  const firedRules = rules.filter((r) => fired.has(r.name));
  const ranking = rank(OPTIONS.map((option) => scoreOption(option, fig[option], firedRules, c)));
  const top = ranking[0]!;
  const tied = ranking.filter((r) => r.feasible === top.feasible && r.score === top.score);
  const tieBreak =
    tied.length > 1 ? finding('advice.tie-broken', { options: tied.map((r) => r.option), score: top.score }) : null;
  const recommendation = top.feasible ? top.option : null;
  const warnings = uniqueRemarks([
    ...checks.bushing.warnings.map((w) => (typeof w === 'string' ? `bushing: ${w}` : w)),
    ...checks.rolling.warnings.map((w) => (typeof w === 'string' ? `rolling: ${w}` : w)),
    ...checks.journal.warnings.map((w) => (typeof w === 'string' ? `journal: ${w}` : w)),
  ]);
  return {
    recommendation,
    ranking,
    checks,
    assumed: [...caseAssumed, ...checks.bushing.assumed, ...checks.rolling.assumed, ...checks.journal.assumed],
    warnings,
    tieBreak,
    toMakeFeasible: [],
    noSingleChange: [],
    rules: traces,
  };
}

/** The leaf conditions of a rule result, in order, with the fact values the engine saw. */
function flatten(cond: Condition | undefined): ConditionTrace[] {
  if (!cond) return [];
  if ('all' in cond) return cond.all.flatMap(flatten);
  if ('any' in cond) return cond.any.flatMap(flatten);
  if ('not' in cond) return flatten(cond.not);
  const seen = cond as z.infer<typeof leafSchema> & { factResult?: unknown; result?: boolean };
  const t: ConditionTrace = { fact: seen.fact, operator: seen.operator, value: seen.value };
  if (seen.path !== undefined) t.path = seen.path;
  if (seen.factResult !== undefined) t.factResult = seen.factResult;
  if (seen.result !== undefined) t.result = seen.result;
  return [t];
}

const round2 = (x: number) => Math.round(x * 100) / 100;
