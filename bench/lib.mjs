// Whole-process timing shared by the benchmarks. Machines are noisy (bare `node -e 0` ranges
// 70–140 ms here), so the commands of one comparison are run interleaved — one of each per
// round — and compared by their medians, so drift in machine load hits all of them alike.
import { spawnSync } from 'node:child_process';

/**
 * Wall time of one run of `node ...args` (or of `cmd ...args`), ms; `ok` lists the exit codes
 * that count as success.
 */
export function once(args, { cwd, ok = [0], cmd = process.execPath } = {}) {
  const t0 = process.hrtime.bigint();
  const r = spawnSync(cmd, args, { cwd, stdio: 'ignore' });
  if (!ok.includes(r.status)) throw new Error(`${cmd} ${args.join(' ')} exited ${r.status}`);
  return Number(process.hrtime.bigint() - t0) / 1e6;
}

export const median = (t) => [...t].sort((x, y) => x - y)[Math.floor(t.length / 2)];

/**
 * Time each entry of `commands` ({ name, args, ok?, cmd? }) over `runs` interleaved rounds, after one
 * warm-up round (`warmup: false` when the caller has just run each command itself).
 * Returns { name: { median, fastest, all } }.
 */
export function interleaved(commands, runs, cwd, { warmup = true } = {}) {
  if (warmup) for (const c of commands) once(c.args, { cwd, ok: c.ok, cmd: c.cmd });
  const times = commands.map(() => []);
  for (let i = 0; i < runs; i++) commands.forEach((c, k) => times[k].push(once(c.args, { cwd, ok: c.ok, cmd: c.cmd })));
  return Object.fromEntries(
    commands.map((c, k) => [c.name, { median: median(times[k]), fastest: Math.min(...times[k]), all: times[k] }]),
  );
}

/**
 * Peak resident memory of one run of `cmd ...args`, MB: the child's VmHWM (high-water mark) read
 * from /proc/<pid>/status every few milliseconds while it runs, the last reading kept. Works for
 * any process (a start-up snapshot ignores `node -r`); null where /proc is not there (not Linux).
 * The mark only rises, so a reading misses at most what the last few milliseconds added.
 */
export async function peakRss(cmd, args, { cwd, ok = [0] } = {}) {
  const { spawn } = await import('node:child_process');
  const { readFileSync } = await import('node:fs');
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { cwd, stdio: 'ignore' });
    let kb = null;
    const read = () => {
      try {
        const m = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${child.pid}/status`, 'utf8'));
        if (m) kb = Math.max(kb ?? 0, Number(m[1]));
      } catch {
        // The process is gone or /proc is absent: keep the last reading.
      }
    };
    const timer = setInterval(read, 2);
    child.on('error', reject);
    child.on('exit', (code) => {
      clearInterval(timer);
      if (!ok.includes(code)) reject(new Error(`${cmd} ${args.join(' ')} exited ${code}`));
      else resolve(kb === null ? null : kb / 1024);
    });
  });
}
