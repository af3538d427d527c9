import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const MAIN = fileURLToPath(new URL('../../dist/bundle/shaftwise.mjs', import.meta.url));

/** Run the built CLI (npm test builds first) and return exit code and output. */
export function runCli(args: string[], opts: { env?: Record<string, string>; input?: string; cwd?: string } = {}) {
  const r = spawnSync(process.execPath, [MAIN, ...args], {
    cwd: opts.cwd ?? ROOT,
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1', ...opts.env },
    input: opts.input ?? '',
  });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

/** A stack trace line, which a user-facing error must never show. */
export const STACK = /^\s+at .+\(?.*:\d+:\d+\)?$/m;
