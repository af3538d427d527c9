// The package as a user gets it: `npm pack`, the tarball installed into an empty project, then
// used from there, never from this repository: the library from an .mjs file (the same advice
// as the repository's CLI), its types from TypeScript (a correct file compiles, a wrong one is
// refused), and the installed `shaftwise` command.
//
// Packed with --ignore-scripts: `npm test` has just built dist/, and prepack's rebuild would
// replace dist/bundle/ under the CLI tests running beside this one.
// Installed with `npm ci --offline` from a lockfile made of this repository's own: the
// tarball, then every runtime entry of package-lock.json, so nothing needs the network and
// the versions are the ones tested here. A dependency the tarball declares but the lockfile
// lacks (or the reverse) makes npm ci refuse the install.
import { spawnSync, type SpawnSyncOptions } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as lib from '../../src/index.js';
import { ROOT, runCli } from '../helpers/cli.js';

const EXAMPLES = readdirSync(join(ROOT, 'examples'))
  .filter((f) => f.endsWith('.yaml'))
  .sort();
const repoPkg = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8'));
const TSC = join(ROOT, 'node_modules/typescript/bin/tsc');
// The installed package must find its own data and rules, not a folder named by the caller.
const env: NodeJS.ProcessEnv = { ...process.env, NO_COLOR: '1' };
delete env.SHAFTWISE_DATA_DIR;
delete env.SHAFTWISE_RULES_DIR;

let tmp = '';
let app = '';
let packed: { filename: string; integrity: string; files: { path: string }[] };

function run(cmd: string, args: string[], opts: SpawnSyncOptions = {}) {
  // The JSON of every example together runs past spawnSync's 1 MB default buffer.
  const r = spawnSync(cmd, args, { cwd: app, encoding: 'utf8', env, maxBuffer: 64 * 1024 * 1024, ...opts });
  return { code: r.status, stdout: String(r.stdout), stderr: String(r.stderr), error: r.error };
}

beforeAll(() => {
  tmp = mkdtempSync(join(tmpdir(), 'shaftwise-pack-'));
  const dest = join(tmp, 'dest');
  app = join(tmp, 'app');
  mkdirSync(dest);
  mkdirSync(app);

  const p = run('npm', ['pack', '--json', '--ignore-scripts', '--pack-destination', dest], { cwd: ROOT });
  if (p.code !== 0) throw new Error(`npm pack failed: ${p.error ?? p.stderr}`);
  [packed] = JSON.parse(p.stdout);

  const spec = `file:../dest/${packed.filename}`;
  const pkg = {
    name: 'pack-check',
    version: '0.0.0',
    private: true,
    type: 'module',
    dependencies: { shaftwise: spec },
  };
  const repoLock = JSON.parse(readFileSync(join(ROOT, 'package-lock.json'), 'utf8'));
  const packages: Record<string, unknown> = {
    '': { name: pkg.name, version: pkg.version, dependencies: pkg.dependencies },
    'node_modules/shaftwise': {
      version: repoPkg.version,
      resolved: spec,
      integrity: packed.integrity,
      license: repoPkg.license,
      dependencies: repoPkg.dependencies,
      bin: repoPkg.bin,
      engines: repoPkg.engines,
      // npm ci runs a package's install scripts only when its lockfile entry says it has one.
      ...(repoPkg.scripts.postinstall ? { hasInstallScript: true } : {}),
    },
  };
  for (const [path, entry] of Object.entries(repoLock.packages as Record<string, { dev?: true; devOptional?: true }>))
    if (path && !entry.dev && !entry.devOptional) packages[path] = entry;
  writeFileSync(join(app, 'package.json'), JSON.stringify(pkg, null, 2));
  writeFileSync(
    join(app, 'package-lock.json'),
    JSON.stringify({ name: pkg.name, version: pkg.version, lockfileVersion: 3, requires: true, packages }, null, 2),
  );
  const i = run('npm', ['ci', '--offline', '--no-audit', '--no-fund']);
  if (i.code !== 0) throw new Error(`npm ci of the tarball failed: ${i.error ?? i.stderr}`);
}, 180_000);

afterAll(() => {
  if (tmp) rmSync(tmp, { recursive: true, force: true });
});

describe('the tarball', () => {
  it('holds the built entry points, the data, rules and examples, and no sources or tests', () => {
    const files = packed.files.map((f) => f.path);
    for (const f of [repoPkg.main, repoPkg.types, repoPkg.bin.shaftwise, 'README.md', 'package.json'])
      expect(files).toContain(f.replace(/^\.\//, ''));
    for (const f of EXAMPLES) expect(files).toContain(`examples/${f}`);
    for (const dir of ['data/', 'rules/']) expect(files.some((f) => f.startsWith(dir))).toBe(true);
    // The start-up snapshot's script ships; its blob is built at install (postinstall), never packed.
    for (const f of ['bin/build-snapshot.mjs', 'dist/snapshot/shaftwise.cjs', 'dist/snapshot/shaftwise.cjs.sha256'])
      expect(files).toContain(f);
    expect(files.filter((f) => /\.blob|shaftwise\.meta$/.test(f))).toEqual([]);
    const sources = (f: string) => /^(src|test|bench|scripts)\//.test(f) || (f.endsWith('.ts') && !f.endsWith('.d.ts'));
    expect(files.filter(sources)).toEqual([]);
  });
});

// The library, imported by name from an installed package.
const USE_MJS = `
import { readFileSync } from 'node:fs';
import * as all from 'shaftwise';
import { parseCase, advise, checkBushing, checkRolling, checkJournal, loadCase, renderNote, CaseError } from 'shaftwise';

const out = { exports: Object.keys(all).sort(), cases: {} };
for (const name of process.argv.slice(2)) {
  const file = 'node_modules/shaftwise/examples/' + name;
  const c = parseCase(readFileSync(file, 'utf8'), file);
  const advice = await advise(c);
  const checks = { bushing: checkBushing(c), rolling: checkRolling(c), journal: checkJournal(c) };
  const note = await renderNote(loadCase(file), 'md', { caseFile: 'examples/' + name, now: new Date(0) });
  out.cases[name] = { advice, checks, note };
}
try {
  parseCase('title: 7', 'bad.yaml');
} catch (e) {
  out.caseError = e instanceof CaseError ? e.problems.length : String(e);
}
console.log(JSON.stringify(out));
`;

describe('the installed library, from an .mjs file', () => {
  let out: {
    exports: string[];
    cases: Record<string, { advice: { checks: unknown }; checks: unknown; note: string }>;
    caseError?: unknown;
  };

  beforeAll(() => {
    writeFileSync(join(app, 'use.mjs'), USE_MJS);
    const r = run(process.execPath, ['use.mjs', ...EXAMPLES]);
    if (r.code !== 0) throw new Error(`use.mjs failed: ${r.stderr}`);
    out = JSON.parse(r.stdout);
  }, 60_000);

  it('exports exactly the names of src/index.ts', () => {
    expect(out.exports).toEqual(Object.keys(lib).sort());
  });

  for (const name of EXAMPLES) {
    it(`advise(parseCase(text)) on ${name} is what the repository's CLI prints as JSON`, () => {
      const r = runCli(['advise', `examples/${name}`, '--format', 'json']);
      expect(r.code, r.stderr).toBe(0);
      const got = out.cases[name]!;
      expect(got.advice).toEqual(JSON.parse(r.stdout));
      expect(got.checks).toEqual(got.advice.checks);
    });

    it(`renderNote(loadCase(file), 'md') on ${name} is the CLI's note`, () => {
      const r = runCli(['advise', `examples/${name}`, '--format', 'md'], { env: { SOURCE_DATE_EPOCH: '0' } });
      expect(r.code, r.stderr).toBe(0);
      expect(out.cases[name]!.note).toBe(r.stdout);
    });
  }

  it('a bad case throws the exported CaseError, with its problems', () => {
    expect(out.caseError).toBeTypeOf('number');
    expect(out.caseError).toBeGreaterThan(0);
  });
});

// The types, compiled with this repository's TypeScript against the installed package only.
const TSCONFIG = {
  compilerOptions: {
    target: 'ES2022',
    module: 'nodenext',
    moduleResolution: 'nodenext',
    strict: true,
    noEmit: true,
    types: [],
  },
};
const GOOD_TS = `
import { advise, checkBushing, checkJournal, checkRolling, loadCase, parseCase, renderNote } from 'shaftwise';
import { CaseError, DataError, UsageError } from 'shaftwise';
import type { AdviceJson, CaseSI, OptionName, Problem, UnitSystem } from 'shaftwise';

export async function summary(text: string, units: UnitSystem): Promise<string> {
  let c: CaseSI;
  try {
    c = parseCase(text, 'inline.yaml');
  } catch (e) {
    if (e instanceof CaseError) {
      const problems: Problem[] = e.problems;
      return problems.map((p) => p.field + ': ' + p.message).join('\\n');
    }
    if (e instanceof DataError || e instanceof UsageError) return e.message;
    throw e;
  }
  const diameter: number = c.shaft.diameter;
  const advice: AdviceJson = await advise(c, { explain: true });
  const best: OptionName | null = advice.recommendation;
  const ranks: number[] = advice.ranking.map((r) => r.rank);
  const feasible: boolean = advice.ranking.every((r) => r.feasible);
  const checked = [checkBushing(c), checkRolling(c), checkJournal(c)].length;
  const note: string = await renderNote(loadCase('case.yaml'), 'html', { units, now: () => new Date(0) });
  return [diameter, best, ranks.join(','), feasible, checked, note.length].join(' ');
}
`;
// Each line a mistake the types must catch; the codes are TypeScript's.
const BAD_TS = [
  "import { advise, parseCase, renderNote } from 'shaftwise';",
  'parseCase(42);',
  "const c = parseCase('title: x');",
  'export const d: string = c.shaft.diameter;',
  'export const e = c.shaft.bore;',
  "await advise(c, { explain: 'yes' });",
  "await renderNote(c, 'pdf');",
];
const BAD_ERRORS = [
  [2, 'TS2345'],
  [4, 'TS2322'],
  [5, 'TS2339'],
  [6, 'TS2322'],
  [7, 'TS2345'],
] as const;

describe('the installed types, from TypeScript (module nodenext, strict)', () => {
  beforeAll(() => {
    writeFileSync(join(app, 'good.ts'), GOOD_TS);
    writeFileSync(join(app, 'bad.ts'), BAD_TS.join('\n') + '\n');
    writeFileSync(join(app, 'tsconfig.json'), JSON.stringify({ ...TSCONFIG, files: ['good.ts'] }, null, 2));
    writeFileSync(join(app, 'tsconfig.bad.json'), JSON.stringify({ ...TSCONFIG, files: ['bad.ts'] }, null, 2));
  });

  it('a file using the names and types compiles clean', () => {
    const r = run(process.execPath, [TSC, '-p', 'tsconfig.json']);
    expect(r.stdout + r.stderr).toBe('');
    expect(r.code).toBe(0);
  }, 60_000);

  it('a file misusing them is refused, each mistake on its own line (so the types are not any)', () => {
    const r = run(process.execPath, [TSC, '-p', 'tsconfig.bad.json']);
    expect(r.code).not.toBe(0);
    const errors = [...r.stdout.matchAll(/^bad\.ts\((\d+),\d+\): error (TS\d+)/gm)].map((m) => [Number(m[1]), m[2]]);
    expect(errors).toEqual(BAD_ERRORS);
  }, 60_000);
});

describe('the installed shaftwise command', () => {
  const bin = () => join(app, 'node_modules/.bin/shaftwise');

  it('--help exits 0 and lists the commands', () => {
    const r = run(bin(), ['--help']);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/\badvise\b/);
  });

  it('starts from the snapshot that postinstall built', () => {
    const r = run('sh', ['-x', bin(), 'advise', '--help']);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/^Usage: shaftwise advise/);
    expect(r.stderr).toMatch(
      /^\+ exec .* --snapshot-blob \S*node_modules\/shaftwise\/dist\/snapshot\/shaftwise\.blob/m,
    );
  });

  it('advise on a shipped example prints what the repository CLI prints', () => {
    const name = EXAMPLES[0]!;
    const r = run(bin(), ['advise', `node_modules/shaftwise/examples/${name}`, '--format', 'json']);
    expect(r.code, r.stderr).toBe(0);
    const repo = runCli(['advise', `examples/${name}`, '--format', 'json']);
    expect(repo.code, repo.stderr).toBe(0);
    expect(JSON.parse(r.stdout)).toEqual(JSON.parse(repo.stdout));
  });
});
