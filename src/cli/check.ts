import { OPTIONS, type OptionName } from '../core/options.js';
import { UsageError } from '../core/errors.js';
import type { LoadedCase } from '../case/load.js';
import { loadAnyCaseFile } from '../case/shaft-load.js';
import { caseFileOf } from '../case/base-units.js';
import type { UnitSystem } from '../report/units.js';
import type { Assumption } from '../case/types.js';
import type { AssumedFinding, Remark } from '../core/finding.js';
import { worded } from '../report/findings/worded.js';
import { CAUTION, assumptionsBlock, fitWidth, useColour, warningsBlock } from '../report/text.js';

export type Format = 'text' | 'json';
export interface OutputOptions {
  format: Format;
  units: UnitSystem;
}

/** One check per option, named as the option. */
export const CHECKS = OPTIONS;
export type CheckName = OptionName;

/** Parse --format / --units values into the options object, or a UsageError naming the flag. */
export function outputOptions(
  raw: { format?: string; units?: string },
  formats: readonly string[] = ['text', 'json'],
): OutputOptions {
  const format = raw.format ?? 'text';
  if (!formats.includes(format))
    throw new UsageError(`--format: got "${format}"; expected one of: ${formats.join(', ')}`);
  const u = (raw.units ?? 'SI').toUpperCase();
  if (u !== 'SI' && u !== 'US') throw new UsageError(`--units: got "${raw.units}"; expected SI or US`);
  return { format: format as Format, units: u };
}

/** Run one check on a case file and return the text to print. Kernels load lazily. */
export async function runCheck(name: string, file: string, opts: OutputOptions): Promise<string> {
  if (!(CHECKS as readonly string[]).includes(name)) {
    throw new UsageError(`check: got "${name}"; expected one of: ${CHECKS.join(', ')}`);
  }
  const any = loadAnyCaseFile(file);
  if (any.kind === 'shaft')
    throw new UsageError(
      `check: "${file}" is a shaft case (shaft.supports and shaft.loads); check takes a single-support case: advise the shaft (each support's checks are in its advice)`,
    );
  const loaded = any.loaded;
  if (opts.format === 'text') await useColour();
  const { json, text } = await computeCheck(name as CheckName, loaded, opts);
  return opts.format === 'json' ? JSON.stringify(json, null, 2) : text;
}

async function computeCheck(
  name: CheckName,
  loaded: LoadedCase,
  opts: OutputOptions,
): Promise<{ json: unknown; text: string }> {
  const c = loaded.case;
  const wrap = (
    r: { option: string; assumed: readonly (Assumption | AssumedFinding)[]; warnings: readonly Remark[] },
    body: string,
  ) => {
    const { option, assumed, ...rest } = worded(r) as typeof r & { assumed: Assumption[] };
    const json = { option, case: caseFileOf(c), assumed: [...loaded.assumed, ...assumed], ...rest };
    const text = fitWidth(
      [`${c.title}`, body, assumptionsBlock(json.assumed), warningsBlock(r.warnings), CAUTION]
        .filter(Boolean)
        .join('\n\n'),
    );
    return { json, text };
  };
  switch (name) {
    case 'bushing': {
      const { checkBushing } = await import('../calc/bushing/index.js');
      const { bushingText } = await import('../report/bushing-text.js');
      const r = checkBushing(c);
      return wrap(r, bushingText(r, opts.units));
    }
    case 'rolling': {
      const { checkRolling } = await import('../calc/rolling/index.js');
      const { rollingText } = await import('../report/rolling-text.js');
      const r = checkRolling(c);
      return wrap(r, rollingText(r, opts.units));
    }
    case 'journal': {
      const { checkJournal } = await import('../calc/journal/index.js');
      const { journalText } = await import('../report/journal-text.js');
      const r = checkJournal(c);
      return wrap(r, journalText(r, opts.units));
    }
  }
}
