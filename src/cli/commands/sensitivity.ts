import type { Command } from 'commander';
import { formatOption, unitsOption } from '../options.js';
import type { UnitSystem } from '../../report/units.js';
import type { LoadedCase } from '../../case/load.js';

/** `shaftwise sensitivity <case>`: which inputs move the margins, and where the advice flips. */
export function registerSensitivity(program: Command): void {
  program
    .command('sensitivity')
    .description(
      'change load, speed, life target, inlet temperature, journal clearance and bushing wear factor by ±10 % and ±25 %; show the margins that move and where the recommendation flips',
    )
    .argument('<case>', 'duty case file (YAML or JSON)')
    .addOption(formatOption(['text', 'json', 'html']))
    .option('--out <file>', 'write to this file instead of standard output')
    .option('--force', 'replace an existing --out file')
    .addOption(unitsOption())
    .exitOverride()
    .action(async (file: string, raw: { format?: string; out?: string; force?: boolean; units?: string }) => {
      const { UsageError } = await import('../../core/errors.js');
      const format = raw.format ?? 'text';
      if (!['text', 'json', 'html'].includes(format))
        throw new UsageError(`--format: got "${format}"; expected one of: text, json, html`);
      const { outputOptions } = await import('../check.js');
      const { units } = outputOptions({ units: raw.units });
      const { loadAnyCaseFile } = await import('../../case/shaft-load.js');
      const any = loadAnyCaseFile(file);
      let text: string;
      if (any.kind === 'shaft') {
        const { computeShaftSensitivity } = await import('../../explore/shaft-sensitivity.js');
        const r = await computeShaftSensitivity(any.loaded);
        const rep = await import('../../report/explore/shaft-sensitivity.js');
        text =
          format === 'json'
            ? rep.shaftSensitivityJson(r)
            : format === 'html'
              ? rep.shaftSensitivityHtml(r)
              : rep.shaftSensitivityText(r, units);
      } else {
        text = await singleSupport(any.loaded, format, units);
      }
      if (raw.out === undefined) {
        process.stdout.write(text.endsWith('\n') ? text : text + '\n');
        return;
      }
      const { writeFileSafe } = await import('../write-file.js');
      writeFileSafe(raw.out, text.endsWith('\n') ? text : text + '\n', { force: raw.force === true, option: '--out' });
      process.stdout.write(`wrote ${raw.out}\n`);
    });
}

/** The sensitivity of a single-support case in the format asked for. */
async function singleSupport(loaded: LoadedCase, format: string, units: UnitSystem): Promise<string> {
  const { computeSensitivity } = await import('../../explore/sensitivity.js');
  const r = await computeSensitivity(loaded.case, loaded.assumed);
  const rep = await import('../../report/explore/sensitivity-report.js');
  return format === 'json'
    ? rep.sensitivityJson(r)
    : format === 'html'
      ? rep.sensitivityHtml(r, units)
      : rep.sensitivityText(r, units);
}
