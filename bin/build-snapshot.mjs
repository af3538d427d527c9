// Build the start-up snapshot: `node --snapshot-blob dist/snapshot/shaftwise.blob
// --build-snapshot dist/snapshot/shaftwise.cjs`, then record beside the blob what it was built
// with (shaftwise.meta, one value a line, read by bin/shaftwise): this node binary
// (process.execPath), its version, the hash of the script, and the package's folder (the blob
// holds the paths to data/ and rules/ it read).
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
const r = spawnSync(process.execPath, ['--snapshot-blob', tmp, '--build-snapshot', script], {
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
writeFileSync(meta, [process.execPath, process.version, hash, root].join('\n') + '\n');
