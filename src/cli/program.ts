import { CaseError, DataError, UsageError } from '../core/errors.js';
import { readFileSync } from 'node:fs';
import { Command, CommanderError } from 'commander';

import { EXIT } from './errors.js';
import { registerCheck } from './commands/check.js';
import { registerAdvise } from './commands/advise.js';
import { registerAsk } from './ask/index.js';
import { registerMap } from './commands/map.js';
import { registerSensitivity } from './commands/sensitivity.js';
import { registerBatch } from './commands/batch.js';

/** Every error ends here: user errors exit 2 with one message per problem; defects exit 70. */
function fail(e: unknown, debug: boolean): never {
  if (e instanceof CaseError) {
    process.stderr.write(`shaftwise: ${e.source}: ${e.problems.length} problem${e.problems.length > 1 ? 's' : ''}\n`);
    for (const p of e.problems) process.stderr.write(`  ${p.field}: ${p.message}\n`);
    process.exit(EXIT.badInput);
  }
  if (e instanceof UsageError || e instanceof DataError) {
    process.stderr.write(`shaftwise: ${e.message}\n`);
    process.exit(EXIT.badInput);
  }
  if (e instanceof CommanderError) {
    process.exit(
      e.code === 'commander.helpDisplayed' || e.code === 'commander.version' || e.code === 'commander.help'
        ? EXIT.ok
        : EXIT.badInput,
    );
  }
  process.stderr.write(
    `shaftwise: internal defect (${(e as Error)?.message ?? String(e)}). This is a bug, not your input: please report it with the case file and the command` +
      (debug ? '' : '; run again with --debug for the full trace') +
      '.\n',
  );
  if (debug) process.stderr.write(`${(e as Error)?.stack ?? ''}\n`);
  process.exit(EXIT.defect);
}

/**
 * The command-line program. It imports only commander and the commands' registrations (each
 * command loads its work when it runs), so `--help` and `--version` load no schema and no
 * YAML parser. `packageJson` is the package's package.json (read once, for the version).
 */
export function buildProgram(packageJson: URL): Command {
  const pkg = JSON.parse(readFileSync(packageJson, 'utf8')) as { version: string };
  const program = new Command()
    .name('shaftwise')
    .description(
      'Choose how a shaft is supported: plain bushing, rolling bearing or oil-film journal bearing.\nConcept-stage estimates: confirm with supplier data and testing.',
    )
    .version(pkg.version, '-V, --version', 'print the version')
    .option('--debug', 'print the full trace of an internal defect')
    .exitOverride()
    .showHelpAfterError('(run shaftwise --help for usage)')
    // Commander's own messages ("error: unknown option …") in the style of every other message: "shaftwise: …".
    .configureOutput({
      writeErr: (s) => process.stderr.write(s),
      outputError: (s, write) => write(s.replace(/^error: /, 'shaftwise: ')),
    });

  registerCheck(program);
  registerAdvise(program);
  registerMap(program);
  registerSensitivity(program);
  registerBatch(program);
  registerAsk(program, {
    advise: async (file) =>
      (await import('./advise.js')).runAdvise(file, { format: 'text', units: 'SI', explain: false }),
    // At the end of the questionnaire: the HTML note beside the case file, over an existing one only with --force.
    offerNote: async (file, out, force) => {
      const { writeNote } = await import('./advise.js');
      await writeNote(file, out, 'html', force);
      process.stdout.write(`Design-review note written to ${out}\n`);
    },
  });
  return program;
}

/**
 * Run the program on `argv` (node's form: program, script, then the arguments). The one place
 * for errors and exit codes. `program`: one built beforehand by buildProgram (the start-up
 * snapshot builds it while building); it parses one command line, so a process runs it once.
 */
export async function runProgram(argv: string[], packageJson: URL, program?: Command): Promise<void> {
  const debug = argv.includes('--debug');
  // A reader that stops early (`shaftwise advise … | head`) closes the pipe: the rest of the output
  // has nowhere to go, and that is the reader's choice, not a failure. Without a listener Node
  // would throw the EPIPE as an unhandled 'error' event, with a stack trace.
  process.stdout.on('error', (e: NodeJS.ErrnoException) => {
    if (e.code === 'EPIPE') process.exit(EXIT.ok);
    fail(e, debug);
  });
  try {
    await (program ?? buildProgram(packageJson)).parseAsync(argv);
  } catch (e) {
    fail(e, debug);
  }
}
