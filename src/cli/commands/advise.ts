import type { Command } from 'commander';
import { formatOption, unitsOption } from '../options.js';

/** `shaftwise advise <case>`: the main job; --format md|html writes the design-review note. */
export function registerAdvise(program: Command): void {
  program
    .command('advise')
    .description(
      'rank the three options for a duty case, with reasons (the main job); --format md or html gives the design-review note',
    )
    .argument('<case>', 'duty case file (YAML or JSON)')
    .addOption(formatOption(['text', 'json', 'md', 'html']))
    .addOption(unitsOption())
    .option('--explain', 'every rule evaluated with the values it saw, and the calculation sheet (text and json)')
    .option(
      '--out <file>',
      'write the note (md, html) or the JSON to this file instead of printing it; an existing file is kept',
    )
    .option('--force', 'with --out: replace an existing file', false)
    .exitOverride()
    .action(
      async (
        file: string,
        raw: { format?: string; units?: string; explain?: boolean; out?: string; force?: boolean },
      ) => {
        const { outputOptions } = await import('../check.js');
        const { runAdvise, ADVISE_FORMATS } = await import('../advise.js');
        const base = outputOptions(raw, ADVISE_FORMATS);
        const opts = {
          ...base,
          explain: raw.explain === true,
          force: raw.force === true,
          ...(raw.out !== undefined ? { out: raw.out } : {}),
        };
        const out = await runAdvise(file, opts);
        if (out) process.stdout.write(out + '\n');
      },
    );
}
