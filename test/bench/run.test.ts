// The benchmark runner's plan (bench/run.mjs --dry-run), not its timings: speed is measured by
// running the benchmarks, never asserted by a test. This checks that the plan names every
// benchmark in bench/, so a new one is not left out of `npm run bench`.
import { spawnSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT } from '../helpers/cli.js';

const BENCHMARKS = readdirSync(join(ROOT, 'bench')).filter(
  (f) => f.endsWith('.mjs') && f !== 'lib.mjs' && f !== 'run.mjs',
);

const plan = (args: string[]) =>
  spawnSync(process.execPath, ['bench/run.mjs', '--dry-run', ...args], { cwd: ROOT, encoding: 'utf8' });

describe('bench/run.mjs --dry-run', () => {
  it('finds the benchmarks', () => {
    expect(BENCHMARKS.length).toBeGreaterThanOrEqual(4);
  });

  for (const mode of [[], ['--quick']]) {
    it(`plans every benchmark in bench/ (${mode.join(' ') || 'full'})`, () => {
      const r = plan(mode);
      expect(r.status, r.stderr).toBe(0);
      expect(r.stderr).toBe('');
      for (const f of BENCHMARKS) expect(r.stdout).toContain(`node bench/${f}`);
    });
  }

  it('refuses an option it does not know, naming it', () => {
    const r = plan(['--runs', '3']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/got --runs 3; expected --quick/);
  });
});
