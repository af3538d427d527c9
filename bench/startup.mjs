// Whole-process start-up cost of a command against bare `node -e 0`, as a ratio of medians:
// the command as the package's `shaftwise` runs it (bin/shaftwise, from the start-up snapshot
// when dist/snapshot/ holds a usable one) and through the normal bundle (node
// dist/bundle/shaftwise.mjs, what the launcher falls back to).
// Usage: node bench/startup.mjs [runs] -- <shaftwise args...>
// Machines are noisy: the ratio, not the milliseconds, is the figure to compare.
import { interleaved } from './lib.mjs';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const argv = process.argv.slice(2);
const sep = argv.indexOf('--');
const runs = Number(sep > 0 ? argv[0] : 15) || 15;
const args = sep >= 0 ? argv.slice(sep + 1) : ['check', 'bushing', 'examples/sawmill-infeed-roller.yaml'];
const main = fileURLToPath(new URL('../dist/bundle/shaftwise.mjs', import.meta.url));
const launcher = fileURLToPath(new URL('../bin/shaftwise', import.meta.url));
const root = fileURLToPath(new URL('..', import.meta.url));
const blob = existsSync(new URL('../dist/snapshot/shaftwise.blob', import.meta.url));

const t = interleaved(
  [
    { name: 'bare', args: ['-e', '0'] },
    { name: 'bundle', args: [main, ...args] },
    { name: 'launcher', cmd: launcher, args },
  ],
  runs,
  root,
);
const bare = t.bare;
console.log(
  `node -e 0: ${bare.median.toFixed(1)} ms median, ${bare.fastest.toFixed(1)} ms fastest (${runs} runs, interleaved)`,
);
for (const [name, what] of [
  ['launcher', `shaftwise ${args.join(' ')} (bin/shaftwise, ${blob ? 'snapshot' : 'no snapshot built'})`],
  ['bundle', `node dist/bundle/shaftwise.mjs ${args.join(' ')}`],
]) {
  const c = t[name];
  console.log(`${what}: ${c.median.toFixed(1)} ms median, ${c.fastest.toFixed(1)} ms fastest`);
  // The fastest runs are the least disturbed by other load on the machine; both ratios are printed.
  console.log(
    `${name} ratio: ${(c.median / bare.median).toFixed(2)}x (medians), ${(c.fastest / bare.fastest).toFixed(2)}x (fastest)`,
  );
}
