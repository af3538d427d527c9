// A stand-in for the one line main.ts will carry: a commander program with `ask`
// registered from the built module, and main's handling of a UsageError (message, exit 2).
// argv: node driver.mjs ask [options]. Advice is a fixed marker so tests can see it printed.
import { Command } from 'commander';
import { registerAsk } from '../../../dist/cli/ask/index.js';
import { EXIT } from '../../../dist/cli/errors.js';
import { UsageError } from '../../../dist/core/errors.js';

const program = new Command().name('shaftwise').exitOverride();
registerAsk(program, { advise: async (file) => `ADVICE-MARKER for ${file}` });
try {
  await program.parseAsync(process.argv);
} catch (e) {
  if (e instanceof UsageError) {
    process.stderr.write(`shaftwise: ${e.message}\n`);
    process.exit(EXIT.badInput);
  }
  throw e;
}
