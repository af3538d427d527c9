// The start-up snapshot changes nothing a user sees: every command's output and exit code
// through bin/shaftwise started from the snapshot equal those of the normal bundle, on every
// example (the cases advised while the snapshot was built) and on cases it never saw
// (examples/batch/, a case written here, bad input). npm test builds the snapshot first.
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROOT } from '../helpers/cli.js';

const LAUNCHER = join(ROOT, 'bin/shaftwise');
const BUNDLE = join(ROOT, 'dist/bundle/shaftwise.mjs');
const BLOB = join(ROOT, 'dist/snapshot/shaftwise.blob');

const env: NodeJS.ProcessEnv = { ...process.env, NO_COLOR: '1', SOURCE_DATE_EPOCH: '0' };
delete env.SHAFTWISE_DATA_DIR;
delete env.SHAFTWISE_RULES_DIR;
delete env.SHAFTWISE_NO_SNAPSHOT;

interface Run {
  code: number | null;
  stdout: string;
  stderr: string;
}
function run(cmd: string, args: string[]): Promise<Run> {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { cwd: ROOT, env, stdio: ['ignore', 'pipe', 'pipe'] });
    // Decoded once at the end: a character's UTF-8 bytes may be split between two chunks.
    const out: Buffer[] = [];
    const err: Buffer[] = [];
    child.stdout.on('data', (d: Buffer) => out.push(d));
    child.stderr.on('data', (d: Buffer) => err.push(d));
    child.on('error', reject);
    child.on('close', (code) =>
      resolve({ code, stdout: Buffer.concat(out).toString('utf8'), stderr: Buffer.concat(err).toString('utf8') }),
    );
  });
}
/** The same arguments through the snapshot (the launcher, traced) and through the bundle. */
async function both(args: string[]): Promise<{ snap: Run; plain: Run; usedBlob: boolean }> {
  const [traced, plain] = await Promise.all([
    run('sh', ['-x', LAUNCHER, ...args]),
    run(process.execPath, [BUNDLE, ...args]),
  ]);
  // sh -x writes its trace to stderr, each command after "+ ": the program's own stderr is the rest.
  const lines = traced.stderr.split('\n');
  const usedBlob = lines.some((l) => /^\+ exec .* --snapshot-blob /.test(l));
  const stderr = lines.filter((l) => !l.startsWith('+')).join('\n');
  return { snap: { ...traced, stderr }, plain, usedBlob };
}

const yamls = (dir: string) =>
  readdirSync(join(ROOT, dir))
    .filter((f) => f.endsWith('.yaml'))
    .sort()
    .map((f) => `${dir}/${f}`);
const WARMED = [...yamls('examples'), ...yamls('examples/shaft')];

/** Advise in each printed format, and each check (map and sensitivity below). */
function commands(file: string): string[][] {
  return [
    ['advise', file],
    ['advise', file, '--format', 'json'],
    ['advise', file, '--format', 'md'],
    ...['bushing', 'rolling', 'journal'].map((o) => ['check', o, file]),
  ];
}

/** Each command through both, two pairs at a time; each pair's snapshot run used the blob. */
async function expectSame(list: string[][], blob = true): Promise<void> {
  const queue = [...list];
  const worker = async () => {
    for (let args = queue.shift(); args; args = queue.shift()) {
      const r = await both(args);
      if (blob) expect(r.usedBlob, args.join(' ')).toBe(true);
      expect(r.snap, args.join(' ')).toEqual(r.plain);
    }
  };
  await Promise.all([worker(), worker()]);
}

let tmp = '';
// A case the snapshot never advised: the demo's duty changed (heavier, faster, a longer life).
let unseen = '';
beforeAll(() => {
  tmp = mkdtempSync(join(tmpdir(), 'shaftwise-snap-'));
  unseen = join(tmp, 'unseen.yaml');
  const demo = readFileSync(join(ROOT, 'examples/sawmill-infeed-roller.yaml'), 'utf8');
  writeFileSync(unseen, demo.replace(/^title:.*$/m, 'title: Conveyor take-up idler (written by the snapshot test)'));
});
afterAll(() => {
  if (tmp) rmSync(tmp, { recursive: true, force: true });
});

describe('the start-up snapshot', () => {
  it('is built (npm run build) and used by the launcher', async () => {
    expect(existsSync(BLOB), 'npm run build makes dist/snapshot/shaftwise.blob').toBe(true);
    const r = await both(['advise', '--help']);
    expect(r.usedBlob).toBe(true);
    expect(r.snap).toEqual(r.plain);
  });

  it("gives the bundle's output on every example (the cases advised while building)", async () => {
    await expectSame(WARMED.flatMap(commands));
  }, 180_000);

  it("gives the bundle's output on cases never advised while building: examples/batch/, one written here", async () => {
    await expectSame([
      ...yamls('examples/batch').flatMap((f) => [
        ['advise', f],
        ['advise', f, '--format', 'json'],
      ]),
      ...commands(unseen),
    ]);
  }, 180_000);

  it("gives the bundle's output in html, US units with --explain, --help, bad input and bad usage", async () => {
    writeFileSync(join(tmp, 'bad.yaml'), 'title: 7\nshaft: { diameter: forty }\n');
    await expectSame([
      ['advise', 'examples/sawmill-infeed-roller.yaml', '--format', 'html'],
      ['advise', 'examples/shaft/cider-mill-crusher-shaft.yaml', '--format', 'html'],
      ['advise', 'examples/packaging-worm-drive.yaml', '--units', 'US', '--explain'],
      ['check', 'journal', 'examples/irrigation-pump-lineshaft.yaml', '--format', 'json'],
      ['advise', '--help'],
      ['--debug', '--help'],
      [],
      ['frobnicate'],
      ['advise', join(tmp, 'missing.yaml')],
      ['advise', join(tmp, 'bad.yaml')],
      ['check', 'gearbox', 'examples/sawmill-infeed-roller.yaml'],
      ['advise', 'examples/sawmill-infeed-roller.yaml', '--format', 'pdf'],
    ]);
  }, 120_000);

  it("gives the bundle's output for map, sensitivity and batch", async () => {
    const out = (k: string) => join(tmp, k);
    await expectSame([
      ['map', 'examples/sawmill-infeed-roller.yaml', '--grid', '6'],
      // The example whose 12 × 12 map warmed the snapshot: that grid again, and another.
      ['map', 'examples/irrigation-pump-lineshaft.yaml', '--grid', '12'],
      ['map', 'examples/irrigation-pump-lineshaft.yaml', '--grid', '17', '--full'],
      ['map', 'examples/shaft/cider-mill-crusher-shaft.yaml', '--grid', '4'],
      ['sensitivity', 'examples/packaging-worm-drive.yaml'],
      ['sensitivity', 'examples/shaft/cider-mill-crusher-shaft.yaml', '--format', 'json'],
    ]);
    // batch writes a file: each run its own, then the two files compared.
    const [a, b] = await Promise.all([
      run('sh', [LAUNCHER, 'batch', 'examples/batch', '--out', out('snap.csv')]),
      run(process.execPath, [BUNDLE, 'batch', 'examples/batch', '--out', out('plain.csv')]),
    ]);
    expect(a.code).toBe(b.code);
    expect(a.stdout.replace('snap.csv', 'X')).toBe(b.stdout.replace('plain.csv', 'X'));
    expect(readFileSync(out('snap.csv'), 'utf8')).toBe(readFileSync(out('plain.csv'), 'utf8'));
  }, 240_000);
});
