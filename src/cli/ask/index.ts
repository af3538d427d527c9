import type { Command } from 'commander';
import type { AskDeps, AskHooks, AskOptions } from './types.js';

export type { AskDeps, AskHooks, AskOptions } from './types.js';

/**
 * Add `shaftwise ask [--save FILE] [--resume FILE] [--force]`, the questionnaire that writes a
 * case file answer by answer. Only types are imported here: the questions, the case
 * schema and the prompt library load when the command runs, so the other commands'
 * start-up does not grow. `hooks` replace the terminal in tests.
 *
 * Exit codes: 0 done; 2 bad input (UsageError or CaseError, thrown to main's handler:
 * an existing --save file, an unreadable --resume file, no terminal); 130 after Ctrl-C
 * (set as process.exitCode, the answers so far saved and the resume command printed).
 */
export function registerAsk(program: Command, deps: AskDeps, hooks?: AskHooks): void {
  program
    .command('ask')
    .description(
      'answer questions about the duty, one at a time; the answers become a case file, then the advice is printed',
    )
    .option(
      '--save <file>',
      'case file to write as you answer (must not exist; default: ./shaftwise-case.yaml, numbered if taken)',
    )
    .option('--resume <file>', 'continue a case file an earlier ask was writing, from its first unanswered question')
    .option('--force', 'at the end: replace an existing design-review note beside the case file', false)
    .exitOverride()
    .action(async (opts: AskOptions) => {
      const { runAsk, EXIT_INTERRUPTED } = await import('./run.js');
      const r = await runAsk(opts, deps, hooks);
      if (r.status === 'interrupted') process.exitCode = EXIT_INTERRUPTED;
    });
}
