// A reader that closes the pipe early (`shaftwise advise … | head -c 10`) ends the program
// quietly: exit 0 and nothing on stderr, not an unhandled EPIPE with a stack trace.
import { spawn, spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT } from '../helpers/cli.js';

const MAIN = join(ROOT, 'dist/bundle/shaftwise.mjs');
// The HTML note is some 80 kB, more than a pipe holds (64 kB on Linux), so writing it must meet the closed pipe.
const ARGS = ['advise', 'examples/sawmill-infeed-roller.yaml', '--format', 'html'];

describe('output to a closed pipe', () => {
  it('reader gone before the first byte: exit 0, stderr empty', async () => {
    const child = spawn(process.execPath, [MAIN, ...ARGS], { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] });
    // Close our end at once: nothing reads, so the program's first write fails with EPIPE.
    child.stdout.destroy();
    let stderr = '';
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    const code = await new Promise<number | null>((resolve) => child.on('close', (c) => resolve(c)));
    expect(stderr).toBe('');
    expect(code).toBe(0);
  });

  const hasBash = spawnSync('bash', ['-c', 'command -v head'], { encoding: 'utf8' }).status === 0;
  it.runIf(hasBash)('`| head -c 10` in a shell (pipefail): exit 0, ten bytes, stderr empty', () => {
    const q = (s: string) => `'${s.replace(/'/g, `'\\''`)}'`;
    const cmd = `set -o pipefail; ${[process.execPath, MAIN, ...ARGS].map(q).join(' ')} | head -c 10`;
    const r = spawnSync('bash', ['-c', cmd], { cwd: ROOT, encoding: 'utf8' });
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    expect(r.stdout).toBe('<!DOCTYPE ');
  });
});
