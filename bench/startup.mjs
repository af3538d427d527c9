// Whole-process start-up cost of a command against bare `node -e 0`, as a ratio of medians.
// Usage: node bench/startup.mjs [runs] -- <shaftwise args...>
// Machines are noisy: the ratio, not the milliseconds, is the figure to compare.
import { interleaved } from './lib.mjs';
import { fileURLToPath } from 'node:url';

const argv = process.argv.slice(2);
const sep = argv.indexOf('--');
const runs = Number(sep > 0 ? argv[0] : 15) || 15;
const args = sep >= 0 ? argv.slice(sep + 1) : ['check', 'bushing', 'examples/sawmill-infeed-roller.yaml'];
const main = fileURLToPath(new URL('../dist/bundle/shaftwise.mjs', import.meta.url));
const root = fileURLToPath(new URL('..', import.meta.url));

const t = interleaved(
  [
    { name: 'bare', args: ['-e', '0'] },
    { name: 'cmd', args: [main, ...args] },
  ],
  runs,
  root,
);
const bare = t.bare.median;
const cmd = t.cmd.median;
console.log(
  `node -e 0: ${bare.toFixed(1)} ms median, ${t.bare.fastest.toFixed(1)} ms fastest (${runs} runs, interleaved)`,
);
console.log(`shaftwise ${args.join(' ')}: ${cmd.toFixed(1)} ms median, ${t.cmd.fastest.toFixed(1)} ms fastest`);
// The fastest runs are the least disturbed by other load on the machine; both ratios are printed.
console.log(`ratio: ${(cmd / bare).toFixed(2)}x (medians), ${(t.cmd.fastest / t.bare.fastest).toFixed(2)}x (fastest)`);
