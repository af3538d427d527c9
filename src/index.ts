/**
 * shaftwise as a library: read a duty case, advise on it, check one option, write the note.
 *
 * ```ts
 * import { parseCase, advise } from 'shaftwise';
 * const c = parseCase(yamlOrJsonText); // the validated SI case; throws CaseError listing every problem
 * const result = await advise(c);      // what `shaftwise advise FILE --format json` prints
 * ```
 *
 * A case read by parseCase() or loadCase() carries what the loader assumed (defaults applied,
 * conversions made) and the text as written; both are kept beside the case object, not in it,
 * and the CLI's JSON prints the object as a case file in SI base units (`case`, which loads
 * back to the same object). advise() and renderNote() use
 * them, and so give exactly what the CLI prints. A case object built any other way (by hand,
 * or a copy) is advised with no loader assumptions, and the note shows its SI numbers as given.
 * Changing a case object after parsing it leaves the kept assumptions as they were, and a case
 * built by hand is not validated: give text to parseCase() to have every field checked.
 *
 * Only the names exported here are public; nothing else in dist/ is part of the interface.
 */
import type { AdviceJson } from './report/json.js';
import type { UnitSystem } from './report/units.js';
import { loadCaseFile, parseCaseText, type LoadedCase } from './case/load.js';
import type { CaseSI } from './case/types.js';
import { caseFileOf } from './case/base-units.js';
import { UsageError } from './core/errors.js';
import { checkBushing as bushingKernel, type BushingResult } from './calc/bushing/index.js';
import { checkRolling as rollingKernel, type RollingResult } from './calc/rolling/index.js';
import { checkJournal as journalKernel, type JournalResult } from './calc/journal/index.js';
import { worded, type Worded } from './report/findings/worded.js';

export { CaseError, DataError, UsageError, type Problem } from './core/errors.js';
export type { CaseSI, Assumption } from './case/types.js';
export type { CheckRecord, SheetLine } from './core/check.js';
export type { Finding, FindingValue, AssumedFinding } from './core/finding.js';
export type { OptionName } from './core/options.js';
export type { AdviceResult, RankedOption, Reason, RuleTrace, ConditionTrace } from './advise/engine.js';
export type { AdviceJson } from './report/json.js';
export type { Worded } from './report/findings/worded.js';
export type { BushingResult, BushingMaterialResult } from './calc/bushing/index.js';
export type { RollingResult, RollingCandidate } from './calc/rolling/index.js';
export type { JournalResult } from './calc/journal/index.js';
export type { UnitSystem } from './report/units.js';

/** A kernel's result as JSON data, its findings worded: what `checks.<option>` holds in the advice. */
const asJson = <T>(result: T): Worded<T> => JSON.parse(JSON.stringify(worded(result))) as Worded<T>;

/*
 * The three kernels, SI in and SI out: each sizes its option to the case's space and runs the
 * checks that govern it (no rules, no ranking). Pure: the same case gives the same result, and
 * that result deep-equals `checks.bushing` (`.rolling`, `.journal`) of advise() for the case,
 * findings worded as sentences, an infinite figure as null.
 */

/** The boundary-lubricated plain bushing: every shipped material sized to the space and checked. */
export function checkBushing(c: CaseSI): Worded<BushingResult> {
  return asJson(bushingKernel(c));
}

/** The rolling-element bearing: catalogue candidates that fit, rating life (ISO 281) and static safety (ISO 76). */
export function checkRolling(c: CaseSI): Worded<RollingResult> {
  return asJson(rollingKernel(c));
}

/** The oil-film journal bearing: finite-difference Reynolds solution, Petroff friction, flow and thermal balance. */
export function checkJournal(c: CaseSI): Worded<JournalResult> {
  return asJson(journalKernel(c));
}

/** What the loader said about each case it made: its assumptions, the text as written, its name. */
const loaderNotes = new WeakMap<CaseSI, { assumed: LoadedCase['assumed']; given: unknown; caseFile?: string }>();

function remember(loaded: LoadedCase, caseFile?: string): CaseSI {
  loaderNotes.set(loaded.case, { assumed: loaded.assumed, given: loaded.given, ...(caseFile ? { caseFile } : {}) });
  return loaded.case;
}

/** The loaded case behind `c`: the loader's notes when it made `c`, else none (the case as its own given, a case file in base units). */
function loadedOf(c: CaseSI): LoadedCase & { caseFile?: string } {
  const notes = loaderNotes.get(c);
  return notes ? { case: c, ...notes } : { case: c, assumed: [], given: caseFileOf(c) };
}

/**
 * Validate case text, YAML or JSON, with units as written ("40 mm", "1500 rpm"), and return the
 * case in SI numbers. `source` names the text in error messages (and in the note as its file).
 * Throws CaseError with one problem per field wrong, each naming the field, the value and what
 * was expected.
 */
export function parseCase(text: string, source?: string): CaseSI {
  return remember(parseCaseText(text, source), source);
}

/** Read and validate a case file (YAML or JSON); see parseCase. Throws CaseError. */
export function loadCase(path: string): CaseSI {
  return remember(loadCaseFile(path), path);
}

/** Options of advise(). */
export interface AdviseOptions {
  /** Include `rules`: every rule evaluated, with the values its conditions saw (`--explain`). */
  explain?: boolean;
}

/**
 * Advise on a case: the three checks, every rule in the shipped rules/ folder (or the one named
 * by SHAFTWISE_RULES_DIR, as for the CLI), feasibility, scores and the ranking. Returns exactly
 * what `shaftwise advise FILE --format json [--explain]` prints for the same case, as JSON
 * data (an infinite figure is null). Throws DataError when a rule or data file does not validate.
 */
export async function advise(c: CaseSI, opts: AdviseOptions = {}): Promise<AdviceJson> {
  const loaded = loadedOf(c);
  const [{ advise: run }, { withToMakeFeasible }, { adviceJson }] = await Promise.all([
    import('./advise/engine.js'),
    import('./advise/to-feasible.js'),
    import('./report/json.js'),
  ]);
  // As the CLI's json path: the engine runs every kernel itself, pressure profile included.
  const result = await withToMakeFeasible(await run(loaded.case, loaded.assumed), loaded);
  return adviceJson(loaded, result, { explain: opts.explain === true });
}

/** Options of renderNote(). */
export interface RenderNoteOptions {
  /** Units shown in the note (default SI). */
  units?: UnitSystem;
  /** The note's date; default SOURCE_DATE_EPOCH (seconds) when set, else the system clock. */
  now?: Date | (() => Date);
  /** The case file named in the note; default the path given to loadCase, or parseCase's source. */
  caseFile?: string;
}

/**
 * The design-review note of a case, Markdown or self-contained HTML, as `shaftwise advise FILE
 * --format md|html` prints it (one final newline). Advises on the case first, as advise() does.
 */
export async function renderNote(c: CaseSI, format: 'md' | 'html', opts: RenderNoteOptions = {}): Promise<string> {
  if (format !== 'md' && format !== 'html')
    throw new UsageError(`renderNote format: got "${String(format)}"; expected md or html`);
  if (opts.units !== undefined && opts.units !== 'SI' && opts.units !== 'US')
    throw new UsageError(`renderNote units: got "${String(opts.units)}"; expected SI or US`);
  const loaded = loadedOf(c);
  const [{ advise: run }, { withToMakeFeasible }, note, { journalSpeedCurves }] = await Promise.all([
    import('./advise/engine.js'),
    import('./advise/to-feasible.js'),
    import('./report/note/index.js'),
    import('./explore/journal-curves.js'),
  ]);
  const result = await withToMakeFeasible(await run(loaded.case, loaded.assumed), loaded);
  const { now } = opts;
  const caseFile = opts.caseFile ?? loaded.caseFile;
  const text = await note.renderNote(loaded, result, format, {
    units: opts.units ?? 'SI',
    journalCurves: journalSpeedCurves(loaded.case, result.checks.journal),
    ...(caseFile !== undefined ? { caseFile } : {}),
    ...(now !== undefined ? { now: typeof now === 'function' ? now : () => now } : {}),
  });
  return text.trimEnd() + '\n';
}
