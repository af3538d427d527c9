// bin/shaftwise, the package's command: it starts node from the start-up snapshot only when
// the blob is usable, and runs the normal bundle otherwise. Each case below builds a package
// folder of its own in a temporary directory (the launcher copied, the blob and its record
// copied or changed, everything else linked to this repository's build) and reads which of
// the two the launcher ran from its shell trace (sh -x).
// Also here: the light path of --help and --version, and zod's jitless setting.
import { spawnSync } from 'node:child_process';
import {
  copyFileSync,
  mkdirSync,
  readdirSync,
  mkdtempSync,
  readFileSync,
  rmSync,
  symlinkSync,
  utimesSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROOT } from '../helpers/cli.js';

const SNAP = join(ROOT, 'dist/snapshot');
const env: NodeJS.ProcessEnv = { ...process.env, NO_COLOR: '1' };
delete env.SHAFTWISE_DATA_DIR;
delete env.SHAFTWISE_RULES_DIR;
delete env.SHAFTWISE_NO_SNAPSHOT;

let tmp = '';
beforeAll(() => {
  tmp = mkdtempSync(join(tmpdir(), 'shaftwise-launch-'));
});
afterAll(() => {
  if (tmp) rmSync(tmp, { recursive: true, force: true });
});

/** A package folder: bin/shaftwise copied; dist/snapshot/ made by `snapshot`; the rest linked. */
function pkg(name: string, snapshot: (dir: string, root: string) => void): string {
  const root = join(tmp, name);
  mkdirSync(join(root, 'bin'), { recursive: true });
  mkdirSync(join(root, 'dist/snapshot'), { recursive: true });
  copyFileSync(join(ROOT, 'bin/shaftwise'), join(root, 'bin/shaftwise'));
  for (const f of ['package.json', 'data', 'rules', 'examples']) symlinkSync(join(ROOT, f), join(root, f));
  symlinkSync(join(ROOT, 'dist/bundle'), join(root, 'dist/bundle'));
  snapshot(join(root, 'dist/snapshot'), root);
  return root;
}
/** The snapshot as built, its record rewritten for `root` (each line of shaftwise.meta by `edit`). */
function usable(dir: string, root: string, edit: (lines: string[]) => void = () => {}): void {
  copyFileSync(join(SNAP, 'shaftwise.blob'), join(dir, 'shaftwise.blob'));
  copyFileSync(join(SNAP, 'shaftwise.cjs.sha256'), join(dir, 'shaftwise.cjs.sha256'));
  const lines = readFileSync(join(SNAP, 'shaftwise.meta'), 'utf8').trimEnd().split('\n');
  lines[3] = root;
  edit(lines);
  writeFileSync(join(dir, 'shaftwise.meta'), lines.join('\n') + '\n');
}
/** Run the launcher traced: what it ran ('blob' or 'bundle'), exit code and output. */
function launch(root: string, args: string[], extra: NodeJS.ProcessEnv = {}) {
  const r = spawnSync('sh', ['-x', join(root, 'bin/shaftwise'), ...args], {
    cwd: ROOT,
    encoding: 'utf8',
    env: { ...env, ...extra },
  });
  const execs = r.stderr.split('\n').filter((l) => l.startsWith('+ exec '));
  expect(execs).toHaveLength(1);
  const ran = execs[0]!.includes('--snapshot-blob')
    ? 'blob'
    : execs[0]!.includes('dist/bundle/shaftwise.mjs')
      ? 'bundle'
      : '?';
  return { ran, code: r.status, stdout: r.stdout, exec: execs[0]! };
}
const DEMO = ['advise', 'examples/sawmill-infeed-roller.yaml', '--format', 'json'];
const expected = () =>
  spawnSync(process.execPath, [join(ROOT, 'dist/bundle/shaftwise.mjs'), ...DEMO], { cwd: ROOT, encoding: 'utf8', env })
    .stdout;

describe('bin/shaftwise', () => {
  it('runs the snapshot when it is usable, with the bundle’s output', () => {
    const root = pkg('usable', usable);
    const r = launch(root, DEMO);
    expect(r.ran).toBe('blob');
    expect(r.code).toBe(0);
    expect(r.stdout).toBe(expected());
  });

  it("runs node with the V8 flags the blob was built with (the record's fifth line)", () => {
    const flags = readFileSync(join(SNAP, 'shaftwise.meta'), 'utf8').split('\n')[4]!;
    expect(flags).toMatch(/^--[a-z-]+=\d+/);
    const r = launch(pkg('flags', usable), DEMO);
    expect(r.ran).toBe('blob');
    expect(r.exec).toContain(` ${flags} --snapshot-blob `);
    expect(r.stdout).toBe(expected());
  });

  it('runs from a link to it (as node_modules/.bin/shaftwise is)', () => {
    const root = pkg('linked', usable);
    mkdirSync(join(tmp, 'linked-bin'));
    symlinkSync(join(root, 'bin/shaftwise'), join(tmp, 'linked-bin/shaftwise'));
    const r = spawnSync('sh', ['-x', join(tmp, 'linked-bin/shaftwise'), 'check', '--help'], {
      cwd: ROOT,
      encoding: 'utf8',
      env,
    });
    expect(r.stderr).toContain('--snapshot-blob');
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/^Usage: shaftwise check/);
  });

  for (const flag of ['--help', '--version'])
    it(`runs the bundle's light path for ${flag} alone, even with a usable snapshot`, () => {
      const r = launch(pkg(`light${flag}`, usable), [flag]);
      expect(r.ran).toBe('bundle');
      expect(r.code).toBe(0);
    });

  const fallbacks: [string, (dir: string, root: string) => void, NodeJS.ProcessEnv?][] = [
    ['no blob', () => {}],
    [
      'a blob without its record',
      (dir, root) => {
        usable(dir, root);
        rmSync(join(dir, 'shaftwise.meta'));
      },
    ],
    ['a blob built by another node binary', (dir, root) => usable(dir, root, (l) => (l[0] = 'another-node-binary'))],
    [
      'a blob older than the node binary (node replaced since)',
      (dir, root) => {
        usable(dir, root);
        utimesSync(join(dir, 'shaftwise.blob'), new Date(0), new Date(0));
      },
    ],
    ['a blob built from another script', (dir, root) => usable(dir, root, (l) => (l[2] = '0'.repeat(64)))],
    ['a blob built in another package folder', (dir, root) => usable(dir, root, (l) => (l[3] = `${root}-moved`))],
    [
      'a package.json written after the blob (the blob holds the program with the version it read)',
      (dir, root) => {
        usable(dir, root);
        rmSync(join(root, 'package.json'));
        copyFileSync(join(ROOT, 'package.json'), join(root, 'package.json'));
        const later = new Date(Date.now() + 60_000);
        utimesSync(join(root, 'package.json'), later, later);
      },
    ],
    ...(['rules', 'data'] as const).map((folder): [string, (dir: string, root: string) => void] => [
      `a file in ${folder}/ written after the blob (the blob holds the ${folder === 'rules' ? 'rules' : 'tables'} it read)`,
      (dir, root) => {
        usable(dir, root);
        rmSync(join(root, folder));
        mkdirSync(join(root, folder));
        for (const f of readdirSync(join(ROOT, folder))) copyFileSync(join(ROOT, folder, f), join(root, folder, f));
        const later = new Date(Date.now() + 60_000);
        const first = readdirSync(join(root, folder)).find((f) => f.endsWith('.json'))!;
        utimesSync(join(root, folder, first), later, later);
      },
    ]),
    ['SHAFTWISE_DATA_DIR set', usable, { SHAFTWISE_DATA_DIR: join(ROOT, 'data') }],
    ['SHAFTWISE_RULES_DIR set', usable, { SHAFTWISE_RULES_DIR: join(ROOT, 'rules') }],
  ];
  fallbacks.forEach(([what, make, extra], i) =>
    it(`falls back to the bundle on ${what}, with the same output`, () => {
      const root = pkg(`fallback-${i}`, make);
      const r = launch(root, DEMO, extra);
      expect(r.ran).toBe('bundle');
      expect(r.code).toBe(0);
      expect(r.stdout).toBe(expected());
    }),
  );
});

describe('start-up order (the normal bundle)', () => {
  const MAIN = join(ROOT, 'dist/bundle/shaftwise.mjs');
  // Records every module file node loads (module.register's resolve hook) into a file.
  function loaded(args: string[]): string[] {
    const log = join(tmp, `loaded-${args.join('_').replace(/\W/g, '')}.txt`);
    const hooks = `import { appendFileSync } from 'node:fs'; export async function resolve(s, c, next) { const r = await next(s, c); appendFileSync(${JSON.stringify(log)}, r.url + '\\n'); return r; }`;
    const register = `import { register } from 'node:module'; register('data:text/javascript,' + encodeURIComponent(${JSON.stringify(hooks)}));`;
    const r = spawnSync(
      process.execPath,
      ['--import', `data:text/javascript,${encodeURIComponent(register)}`, MAIN, ...args],
      { cwd: ROOT, encoding: 'utf8', env },
    );
    expect(r.status, r.stderr).toBe(0);
    return readFileSync(log, 'utf8')
      .trim()
      .split('\n')
      .filter((u) => u.startsWith('file:') && u.includes('/dist/bundle/'));
  }
  const text = (urls: string[]) => urls.map((u) => readFileSync(new URL(u), 'utf8')).join('\n');

  for (const flag of ['--help', '--version'])
    it(`${flag} loads no schema library and no YAML parser`, () => {
      const urls = loaded([flag]);
      expect(urls.length).toBeGreaterThan(1);
      const code = text(urls);
      expect(code).not.toMatch(/\$ZodType|ZodObject/);
      expect(code).not.toMatch(/parseDocument|YAMLMap/);
    });

  it('a command does load them (so the check above can fail)', () => {
    const code = text(loaded(['check', 'bushing', 'examples/sawmill-infeed-roller.yaml']));
    expect(code).toMatch(/\$ZodType|ZodObject/);
    expect(code).toMatch(/parseDocument|YAMLMap/);
  });

  // zod builds an object schema's compiled parser with the Function constructor unless jitless
  // was set before the schema was built: a run that never calls it had the setting in time.
  const COUNT = `let n = 0; const F = globalThis.Function; globalThis.Function = new Proxy(F, { construct(t, a) { n++; return Reflect.construct(t, a); }, apply(t, s, a) { n++; return Reflect.apply(t, s, a); } }); process.on('exit', () => process.stderr.write('Function calls: ' + n + '\\n'));`;
  const calls = (file: string, args: string[]) => {
    const r = spawnSync(
      process.execPath,
      ['--import', `data:text/javascript,${encodeURIComponent(COUNT)}`, file, ...args],
      { cwd: ROOT, encoding: 'utf8', env },
    );
    return Number(/Function calls: (\d+)/.exec(r.stderr)?.[1]);
  };

  it("zod's compiled parser is never built: jitless is set before the first schema", () => {
    expect(calls(MAIN, ['advise', 'examples/sawmill-infeed-roller.yaml', '--format', 'json'])).toBe(0);
    expect(calls(MAIN, ['check', 'rolling', 'examples/packaging-worm-drive.yaml'])).toBe(0);
    // The snapshot's script, run as a plain script: the order its modules are evaluated in when the snapshot is built.
    const script = join(ROOT, 'dist/snapshot/shaftwise.cjs');
    expect(calls(script, ['advise', 'examples/packaging-worm-drive.yaml', '--format', 'json'])).toBe(0);
  });

  it('the count does see a schema built before the setting', () => {
    const late = join(ROOT, 'test/cli', `.jit-late-${process.pid}.mjs`);
    writeFileSync(
      late,
      "import { z } from 'zod'; const s = z.object({ a: z.number() }); z.config({ jitless: true }); s.parse({ a: 1 });\n",
    );
    try {
      expect(calls(late, [])).toBeGreaterThan(0);
    } finally {
      rmSync(late, { force: true });
    }
  });
});
