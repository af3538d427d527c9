// Whole-process start-up cost of a command against bare `node -e 0`, as a ratio of medians.
// Usage: node bench/startup.mjs [runs] -- <shaftwise args...>
// Machines are noisy: the ratio, not the milliseconds, is the figure to compare.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const argv = process.argv.slice(2);
const sep = argv.indexOf('--');
const runs = Number(sep > 0 ? argv[0] : 15) || 15;
const args = sep >= 0 ? argv.slice(sep + 1) : ['check', 'bushing', 'examples/sawmill-infeed-roller.yaml'];
const main = fileURLToPath(new URL('../dist/bundle/shaftwise.mjs', import.meta.url));
const root = fileURLToPath(new URL('..', import.meta.url));

function time(cmd, a) {
  const t = [];
  for (let i = 0; i < runs; i++) {
    const t0 = process.hrtime.bigint();
    const r = spawnSync(cmd, a, { cwd: root, stdio: 'ignore' });
    if (r.status !== 0) throw new Error(`${a.join(' ')} exited ${r.status}`);
    t.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  t.sort((x, y) => x - y);
  return t[Math.floor(t.length / 2)];
}

time(process.execPath, ['-e', '0']); // warm the file cache
const bare = time(process.execPath, ['-e', '0']);
const cmd = time(process.execPath, [main, ...args]);
console.log(`node -e 0: ${bare.toFixed(1)} ms (median of ${runs})`);
console.log(`shaftwise ${args.join(' ')}: ${cmd.toFixed(1)} ms`);
console.log(`ratio: ${(cmd / bare).toFixed(2)}x`);
