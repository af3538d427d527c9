import type { Command } from 'commander';
import { formatOption, unitsOption } from '../options.js';

/** `shaftwise check <option> <case>`: one option's check. */
export function registerCheck(program: Command): void {
  program
    .command('check')
    .description("run one option's check on a duty case")
    .argument('<option>', 'bushing, rolling or journal')
    .argument('<case>', 'duty case file (YAML or JSON)')
    .addOption(formatOption())
    .addOption(unitsOption())
    .exitOverride()
    .action(async (option: string, file: string, raw: { format?: string; units?: string }) => {
      const { outputOptions, runCheck } = await import('../check.js');
      const out = await runCheck(option, file, outputOptions(raw));
      process.stdout.write(out + '\n');
    });
}
