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

function once(a) {
  const t0 = process.hrtime.bigint();
  const r = spawnSync(process.execPath, a, { cwd: root, stdio: 'ignore' });
  if (r.status !== 0) throw new Error(`${a.join(' ')} exited ${r.status}`);
  return Number(process.hrtime.bigint() - t0) / 1e6;
}
const median = (t) => [...t].sort((x, y) => x - y)[Math.floor(t.length / 2)];

// Warm the file cache, then interleave the two so drift in machine load hits both alike.
once(['-e', '0']);
once([main, ...args]);
const tb = [];
const tc = [];
for (let i = 0; i < runs; i++) {
  tb.push(once(['-e', '0']));
  tc.push(once([main, ...args]));
}
const bare = median(tb);
const cmd = median(tc);
const min = (t) => Math.min(...t);
console.log(`node -e 0: ${bare.toFixed(1)} ms median, ${min(tb).toFixed(1)} ms fastest (${runs} runs, interleaved)`);
console.log(`shaftwise ${args.join(' ')}: ${cmd.toFixed(1)} ms median, ${min(tc).toFixed(1)} ms fastest`);
// The fastest runs are the least disturbed by other load on the machine; both ratios are printed.
console.log(`ratio: ${(cmd / bare).toFixed(2)}x (medians), ${(min(tc) / min(tb)).toFixed(2)}x (fastest)`);
