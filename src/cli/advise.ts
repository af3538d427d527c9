import { loadCaseFile } from '../case/load.js';
import { CAUTION, assumptionsBlock, warningsBlock } from '../report/text.js';
import type { OutputOptions } from './check.js';

/** Advise on a case file: the three checks, the rules, the ranking. Returns the text to print. */
export async function runAdvise(file: string, opts: OutputOptions & { explain: boolean }): Promise<string> {
  const loaded = loadCaseFile(file);
  const { advise } = await import('../advise/engine.js');
  const a = await advise(loaded.case, loaded.assumed);
  if (opts.format === 'json') {
    const { rules, ...rest } = a;
    return JSON.stringify(opts.explain ? { ...rest, case: loaded.case, rules } : { ...rest, case: loaded.case }, null, 2);
  }
  const { adviceText } = await import('../report/advice-text.js');
  return [loaded.case.title, adviceText(a, opts.units, opts.explain), assumptionsBlock(a.assumed), warningsBlock(a.warnings), CAUTION].filter(Boolean).join('\n\n');
}
