import type { Command } from 'commander';
import { formatOption, unitsOption } from '../options.js';

/** `shaftwise advise <case>`: the main job. */
export function registerAdvise(program: Command): void {
  program
    .command('advise')
    .description('rank the three options for a duty case, with reasons (the main job)')
    .argument('<case>', 'duty case file (YAML or JSON)')
    .addOption(formatOption())
    .addOption(unitsOption())
    .option('--explain', 'every rule evaluated with the values it saw, and the calculation sheet')
    .exitOverride()
    .action(async (file: string, raw: { format?: string; units?: string; explain?: boolean }) => {
      const { outputOptions } = await import('../check.js');
      const { runAdvise } = await import('../advise.js');
      const out = await runAdvise(file, { ...outputOptions(raw), explain: raw.explain === true });
      process.stdout.write(out + '\n');
    });
}
