import type { LoadedShaftCase } from '../case/shaft-load.js';
import { describeWarning } from '../report/findings/index.js';
import { CAUTION, assumptionsBlock, fitWidth, useColour, warningsBlock } from '../report/text.js';
import type { UnitSystem } from '../report/units.js';

/**
 * `advise` on a whole shaft: the shaft advice (statics, beam, each support advised, the
 * arrangement), printed as text or JSON, or written as the design-review note with the shaft's
 * sections first. Options were checked by runAdvise before any work.
 */
export async function runAdviseShaft(
  loaded: LoadedShaftCase,
  opts: {
    /** As runAdvise's formats (kept here so the two files do not import each other). */
    format: 'text' | 'json' | 'md' | 'html';
    units: UnitSystem;
    explain: boolean;
    out?: string;
    force?: boolean;
    now?: () => Date;
    caseFile: string;
  },
): Promise<string> {
  const [{ adviseShaft }, { loadRules }, { resolveLoads }] = await Promise.all([
    import('../advise/shaft.js'),
    import('../advise/load-rules.js'),
    import('../calc/shaft/index.js'),
  ]);
  const rules = loadRules();
  const a = await adviseShaft(loaded, rules);
  const cases = a.supports.map((s) => s.loaded);
  const resolved = resolveLoads(loaded.shaft.loads);
  const title = typeof loaded.common['title'] === 'string' ? loaded.common['title'] : '(untitled shaft)';
  const format = opts.format;
  if (format === 'md' || format === 'html') {
    const [{ buildShaftNote }, { journalSpeedCurves }] = await Promise.all([
      import('../report/note/shaft.js'),
      import('../explore/journal-curves.js'),
    ]);
    const model = buildShaftNote(
      {
        title,
        shaft: loaded.shaft,
        resolved,
        advice: a,
        cases,
        journalCurves: a.supports.map((s) => journalSpeedCurves(s.loaded.case, s.advice.checks.journal)),
      },
      { units: opts.units, caseFile: opts.caseFile, ...(opts.now ? { now: opts.now } : {}) },
    );
    const text =
      format === 'md'
        ? (await import('../report/note/markdown.js')).renderMarkdown(model)
        : (await import('../report/note/html.js')).renderHtml(model);
    if (opts.out === undefined) return text.trimEnd();
    const { writeFileSafe } = await import('./write-file.js');
    writeFileSafe(opts.out, text, { force: opts.force === true });
    return '';
  }
  if (format === 'json') {
    const { shaftAdviceJson } = await import('../report/json.js');
    const json = JSON.stringify(shaftAdviceJson(loaded.given, cases, a, { explain: opts.explain }), null, 2);
    if (opts.out === undefined) return json;
    const { writeFileSafe } = await import('./write-file.js');
    writeFileSafe(opts.out, json + '\n', { force: opts.force === true });
    return '';
  }
  const { shaftAdviceText } = await import('../report/shaft-text.js');
  await useColour();
  return fitWidth(
    [
      title,
      shaftAdviceText(loaded.shaft, resolved, a, opts.units, opts.explain),
      assumptionsBlock(a.assumed),
      warningsBlock(a.warnings, describeWarning),
      CAUTION,
    ]
      .filter(Boolean)
      .join('\n\n'),
  );
}
