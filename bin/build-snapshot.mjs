// Build the start-up snapshot: `node --snapshot-blob dist/snapshot/shaftwise.blob
// --build-snapshot dist/snapshot/shaftwise.cjs`, then record beside the blob what it was built
// with (shaftwise.meta, one value a line, read by bin/shaftwise): this node binary
// (process.execPath), its version, the hash of the script, the package's folder (the blob
// holds the paths to data/ and rules/ it read) and the V8 flags it was built with (FLAGS).
// Run by `npm run build` and at install (postinstall, with --soft: a failure is reported in
// one line and the install goes on; bin/shaftwise then runs the normal bundle).
// Usage: node bin/build-snapshot.mjs [--soft]
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, realpathSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const soft = process.argv.includes('--soft');
const root = realpathSync(fileURLToPath(new URL('..', import.meta.url)));
const dir = `${root}/dist/snapshot`;
const script = `${dir}/shaftwise.cjs`;
const blob = `${dir}/shaftwise.blob`;
const meta = `${dir}/shaftwise.meta`;

function stop(message) {
  process.stderr.write(`shaftwise: start-up snapshot not built (${message}); the CLI runs without it\n`);
  process.exit(soft ? 0 : 1);
}

// In a clone before its first build (npm ci runs postinstall too) there is nothing to build from.
if (!existsSync(script)) {
  if (soft) process.exit(0);
  stop('dist/snapshot/shaftwise.cjs is missing: run npm run build');
}
// The old blob and its record go first: a failed build leaves none, never a stale one.
rmSync(meta, { force: true });
rmSync(blob, { force: true });
const tmp = `${blob}.${process.pid}.tmp`;
// The shipped data and rules only: a user's folders are read at run time, never frozen in.
const env = { ...process.env, NO_COLOR: '1' };
delete env.SHAFTWISE_DATA_DIR;
delete env.SHAFTWISE_RULES_DIR;
/**
 * V8 flags the blob is built with and run with (a blob loads only under the flags it was built
 * with; shaftwise.meta records them for bin/shaftwise), each measured with bench/startup.mjs and
 * bench/map.mjs on a two-core machine:
 * - the interrupt budget at four times V8's default (67 584 bytes of bytecode run, Node 20): a
 *   CLI run lasts a tenth of a second, and at the default the optimising compiler starts on code
 *   it never gets to use (about 5 ms of `check`, 3 ms of `advise`; nothing of a map);
 * - the young generation capped at 4 MB a semi-space and scavenged on the main thread: a map
 *   makes hundreds of megabytes of short-lived objects, and a capped young generation that may
 *   grow to 4 MB collects them with a quarter of the scavenges of one held at 1 MB (src/cli/
 *   commands/map.ts holds it there without this cap) for a few MB more peak memory; the helper
 *   threads of a parallel scavenge cost more than they save on two cores (a 60 × 60 map 12.3x ->
 *   9.3x bare node, peak RSS 91 -> 94 MB);
 * - the young generation started at 3 MB a semi-space (1 MB by default): a command's first
 *   scavenges come later and fewer (check 1.76x -> 1.70x and 1.77x -> 1.75x in two benches of
 *   25 runs, advise 1.87x -> 1.85x; the map's peak RSS unchanged at 88 MB);
 * - feedback vectors allocated at a function's first call, not after it has run a while: the
 *   code warmed in the snapshot starts collecting type feedback at once (advise 1.93x -> 1.86x,
 *   check 1.77x -> 1.72x over 25 runs; the 60 x 60 map 8.0x -> 8.7x over 5, a trade taken for
 *   the commands run most).
 */
const FLAGS = [
  '--interrupt-budget=270336',
  '--max-semi-space-size=4',
  '--min-semi-space-size=3',
  '--no-parallel-scavenge',
  '--no-lazy-feedback-allocation',
];
const r = spawnSync(process.execPath, [...FLAGS, '--snapshot-blob', tmp, '--build-snapshot', script], {
  cwd: root,
  encoding: 'utf8',
  env,
  stdio: ['ignore', 'ignore', 'pipe'],
});
if (r.status !== 0 || !existsSync(tmp)) {
  rmSync(tmp, { force: true });
  stop(r.error?.message ?? (r.stderr.trim().split('\n').pop() || `exit ${r.status}`));
}
renameSync(tmp, blob);
const hash = readFileSync(`${script}.sha256`, 'utf8').trim();
writeFileSync(meta, [process.execPath, process.version, hash, root, FLAGS.join(' ')].join('\n') + '\n');
