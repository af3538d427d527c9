#!/usr/bin/env node
// The CLI's entry. `--help` and `--version` alone take the light path: the program's
// registrations only, no schema, no YAML parser. Any other command first turns zod's compiled
// fast path off (src/cli/jitless.ts), before a module that builds a schema is evaluated.
const args = process.argv.slice(2);
const LIGHT = new Set(['--help', '-h', '--version', '-V']);
if (!(args.length === 1 && LIGHT.has(args[0]!))) await import('./jitless.js');
const { runProgram } = await import('./program.js');
await runProgram(process.argv, new URL('../../package.json', import.meta.url));
