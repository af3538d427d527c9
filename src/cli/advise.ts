import { UsageError } from '../core/errors.js';
import { loadAnyCaseFile } from '../case/shaft-load.js';
import { describeWarning } from '../report/findings/index.js';
import { CAUTION, assumptionsBlock, fitWidth, useColour, warningsBlock } from '../report/text.js';
import { adviceJson } from '../report/json.js';
import type { UnitSystem } from '../report/units.js';
import type { OutputOptions } from './check.js';

/** Output formats of `advise`: text and json print; md and html are the design-review note. */
export const ADVISE_FORMATS = ['text', 'json', 'md', 'html'] as const;
export type AdviseFormat = (typeof ADVISE_FORMATS)[number];

export interface AdviseOptions {
  format: AdviseFormat;
  units: UnitSystem;
  explain: boolean;
  /** Write the note (md, html) or the JSON to this file instead of printing it. */
  out?: string;
  /** Replace an existing --out file. */
  force?: boolean;
  /** Clock for the note's date (tests); default SOURCE_DATE_EPOCH, else now. */
  now?: () => Date;
}

/**
 * Advise on a case file: the three checks, the rules, the ranking. Returns the text to print
 * (empty when the note was written to --out). Options are checked before any work is done,
 * so a bad flag never leaves a file behind.
 */
export async function runAdvise(
  file: string,
  opts: (OutputOptions | { format: AdviseFormat; units: UnitSystem }) & Omit<AdviseOptions, 'format' | 'units'>,
): Promise<string> {
  const format = opts.format as AdviseFormat;
  const note = format === 'md' || format === 'html';
  if (format === 'text' && opts.out !== undefined)
    throw new UsageError(`--out: applies to --format json, md or html; got --format ${format}`);
  if (opts.force && opts.out === undefined)
    throw new UsageError('--force: applies only with --out FILE; got --force without --out');
  if (opts.out !== undefined && opts.out.trim() === '')
    throw new UsageError('--out: got an empty file name; expected a file path');
  const any = loadAnyCaseFile(file);
  if (any.kind === 'shaft') {
    const { runAdviseShaft } = await import('./advise-shaft.js');
    return runAdviseShaft(any.loaded, { ...opts, format, caseFile: file });
  }
  const loaded = any.loaded;
  const [{ advise }, { withToMakeFeasible }, { loadRules }] = await Promise.all([
    import('../advise/engine.js'),
    import('../advise/to-feasible.js'),
    import('../advise/load-rules.js'),
  ]);
  const rules = loadRules();
  // The pressure profile (one more Reynolds solve) is drawn in the note and kept in JSON; text has no use for it.
  const advice = await advise(loaded.case, loaded.assumed, rules, {
    kernel: format === 'text' ? { pressureProfile: false } : {},
  });
  // What would make each failing option feasible, verified on the case file as the user wrote it.
  const a = await withToMakeFeasible(advice, loaded, rules);
  if (note) {
    const { renderNote } = await import('../report/note/index.js');
    const { journalSpeedCurves } = await import('../explore/journal-curves.js');
    const text = await renderNote(loaded, a, format, {
      units: opts.units,
      caseFile: file,
      journalCurves: journalSpeedCurves(loaded.case, a.checks.journal),
      ...(opts.now ? { now: opts.now } : {}),
    });
    if (opts.out === undefined) return text.trimEnd();
    const { writeFileSafe } = await import('./write-file.js');
    writeFileSafe(opts.out, text, { force: opts.force === true });
    return '';
  }
  if (format === 'json') {
    const json = JSON.stringify(adviceJson(loaded, a, { explain: opts.explain }), null, 2);
    if (opts.out === undefined) return json;
    const { writeFileSafe } = await import('./write-file.js');
    writeFileSafe(opts.out, json + '\n', { force: opts.force === true });
    return '';
  }
  const { adviceText } = await import('../report/advice-text.js');
  await useColour();
  return fitWidth(
    [
      loaded.case.title,
      adviceText(a, opts.units, opts.explain),
      assumptionsBlock(a.assumed),
      warningsBlock(a.warnings, describeWarning),
      CAUTION,
    ]
      .filter(Boolean)
      .join('\n\n'),
  );
}

/**
 * Write the design-review note of a case file to `outPath` (for the questionnaire's last
 * step, and for scripts). Same rules as `advise --out`: temporary file then rename, an
 * existing file is kept unless `force`; user errors throw UsageError / CaseError (exit 2).
 */
export async function writeNote(
  casePath: string,
  outPath: string,
  format: 'md' | 'html',
  force: boolean,
): Promise<void> {
  if (format !== 'md' && format !== 'html')
    throw new UsageError(`note format: got "${String(format)}"; expected md or html`);
  await runAdvise(casePath, { format, units: 'SI', explain: false, out: outPath, force });
}
