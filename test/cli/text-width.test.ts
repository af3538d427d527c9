// The terminal text of every example (advise, check of each option, map, sensitivity) fits in
// 100 columns, the recommended option's own checks come first, no assumption line is said twice,
// and the sensitivity's inlet-temperature row is stepped in kelvin. Runs the built CLI.
import { execFile } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { ROOT, runCli } from '../helpers/cli.js';

const MAIN = fileURLToPath(new URL('../../dist/bundle/shaftwise.mjs', import.meta.url));
const run = promisify(execFile);
const cli = async (args: string[]) =>
  (await run(process.execPath, [MAIN, ...args], { cwd: ROOT, env: { ...process.env, NO_COLOR: '1' } })).stdout;

const EXAMPLES = [
  ...readdirSync(join(ROOT, 'examples'))
    .filter((f) => f.endsWith('.yaml'))
    .map((f) => `examples/${f}`),
  ...readdirSync(join(ROOT, 'examples/shaft'))
    .filter((f) => f.endsWith('.yaml'))
    .map((f) => `examples/shaft/${f}`),
];
const SINGLE = EXAMPLES.filter((f) => !f.includes('/shaft/'));

/** Lines wider than 100 characters (code points, as a terminal counts them). */
const wide = (text: string) => text.split('\n').filter((l) => [...l].length > 100);

describe('terminal text within 100 columns', () => {
  it('has the examples to check', () => {
    expect(SINGLE.length).toBeGreaterThanOrEqual(3);
    expect(EXAMPLES.length).toBeGreaterThan(SINGLE.length);
  });

  it.each(EXAMPLES)(
    'advise %s, SI and US, with and without --explain',
    async (f) => {
      const outs = await Promise.all(
        [['SI'], ['US'], ['SI', '--explain']].map(([u, ...x]) => cli(['advise', f, '--units', u!, ...x])),
      );
      for (const out of outs) {
        expect(out).toContain('Recommended');
        expect(wide(out)).toEqual([]);
      }
    },
    60_000,
  );

  it.each(SINGLE)(
    'check bushing, rolling and journal on %s, SI and US',
    async (f) => {
      const outs = await Promise.all(
        ['bushing', 'rolling', 'journal'].flatMap((o) => ['SI', 'US'].map((u) => cli(['check', o, f, '--units', u]))),
      );
      for (const out of outs) expect(wide(out)).toEqual([]);
    },
    60_000,
  );

  it.each(EXAMPLES)(
    'map and sensitivity on %s',
    async (f) => {
      const outs = await Promise.all([cli(['map', f]), cli(['sensitivity', f])]);
      expect(outs[0]).toContain('Legend');
      expect(outs[1]).toContain('Governing checks:');
      for (const out of outs) expect(wide(out)).toEqual([]);
    },
    120_000,
  );

  it('map and sensitivity --units US write loads in lbf', async () => {
    const [map, sens] = await Promise.all([
      cli(['map', SINGLE[0]!, '--units', 'US']),
      cli(['sensitivity', SINGLE[0]!, '--units', 'US']),
    ]);
    const flat = (t: string) => t.replace(/\s+/g, ' ');
    // The axis ticks, the case in the legend and the ranges in pound-force.
    expect(map).toMatch(/^ +\d+ lbf \|/m);
    expect(flat(map)).toMatch(/the case \([\d.]+ lbf, [\d.]+ r\/min/);
    expect(flat(map)).toMatch(/Ranges: load [\d.]+ lbf to [\d.]+ lbf/);
    // The load rows of the sensitivity: the case's load and each step's value in lbf.
    expect(flat(sens)).toMatch(/point\), [\d.]+ lbf/);
    expect(sens.match(/ [-+]\d+ % +[\d.]+ lbf /g)?.length).toBe(4);
    expect(wide(map)).toEqual([]);
    expect(wide(sens)).toEqual([]);
  }, 60_000);
});

describe('advise text: layout', () => {
  it.each(SINGLE)(
    '%s: the recommended option and its own check table come first',
    async (f) => {
      const out = await cli(['advise', f]);
      const rec = /^Recommended: (\w+)/m.exec(out)?.[1];
      expect(rec).toBeDefined();
      const blocks = out.split(/\n(?=\d\. )/);
      // The first option block is the recommended one and holds a check table with every check passing.
      const first = blocks[1]!;
      expect(first.toLowerCase()).toMatch(new RegExp(`^1\\. ${rec}`));
      const rows = first.split('\n').filter((l) => /^ {2}(ok|FAIL|note) /.test(l));
      expect(rows.length).toBeGreaterThan(2);
      expect(rows.filter((l) => l.startsWith('  FAIL'))).toEqual([]);
      // Its table comes before any other option's failing checks.
      expect(out.indexOf(rows[0]!)).toBeLessThan(
        out.search(/^ {2}FAIL /m) === -1 ? Infinity : out.search(/^ {2}FAIL /m),
      );
      // Every check row cites a source by number, and each number is in the list after the ranking.
      const cited = new Set([...out.matchAll(/ \[(\d+)\]$/gm)].map((m) => m[1]));
      expect(cited.size).toBeGreaterThan(0);
      const list = out.slice(out.indexOf('\nSources:\n'));
      for (const n of cited) expect(list).toContain(`  [${n}] `);
    },
    60_000,
  );

  it.each(EXAMPLES)(
    '%s: no assumption line twice, one way of writing speed',
    async (f) => {
      const out = await cli(['advise', f]);
      const assumed = out.slice(out.indexOf('\nAssumed:\n'), out.indexOf('\nWarnings:\n'));
      // One entry per line start "  - field = value" (continuation lines are indented further).
      const entries = assumed
        .split('\n')
        .filter((l) => l.startsWith('  - '))
        .map((l) => l.replace(/\s*\([^)]*\)?/g, '').split(':')[0]);
      expect(entries.length).toBeGreaterThan(2);
      expect(new Set(entries).size).toBe(entries.length);
      expect(out).not.toMatch(/\brpm\b/);
    },
    60_000,
  );
});

describe('sensitivity: the inlet temperature in kelvin', () => {
  it('its rows step −10, −4, +4, +10 K from the case value, and the JSON agrees', async () => {
    const f = SINGLE[0]!;
    const [text, json] = await Promise.all([cli(['sensitivity', f]), cli(['sensitivity', f, '--format', 'json'])]);
    const r = JSON.parse(json) as {
      parameters: {
        id: string;
        base: number;
        changeUnit: string;
        variations: { change: number; value: number }[];
      }[];
    };
    const p = r.parameters.find((x) => x.id === 'inletTemperature')!;
    expect(p.changeUnit).toBe('K');
    expect(p.variations.map((v) => v.change)).toEqual([-10, -4, 4, 10]);
    for (const v of p.variations) expect(v.value).toBeCloseTo(p.base + v.change, 9);
    const rows = text.split('\n').filter((l) => /^\s+(Oil inlet|\s{10,}[-+]\d+ K)/.test(l));
    const ks = text.match(/ [-+]\d+ K {2,}\S+ °C/g) ?? [];
    expect(ks.map((s) => s.trim().split(/\s+/)[0])).toEqual(['-10', '-4', '+4', '+10']);
    // Each value is the case's temperature plus the step, in °C.
    for (const s of ks) {
      const [dk, , t] = s.trim().split(/\s+/);
      expect(Number(t)).toBeCloseTo(p.base + Number(dk), 6);
    }
    expect(rows.length).toBeGreaterThan(0);
    expect(text).not.toMatch(/per cent of its value in °C/);
  }, 60_000);
});

describe('advise --format json --out', () => {
  const dir = mkdtempSync(join(tmpdir(), 'shaftwise-json-out-'));
  const demo = SINGLE[0]!;
  it('writes the JSON to the file and prints nothing', () => {
    const out = join(dir, 'advice.json');
    const r = runCli(['advise', demo, '--format', 'json', '--out', out]);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe('');
    const j = JSON.parse(readFileSync(out, 'utf8')) as { recommendation?: unknown };
    expect(j).toHaveProperty('recommendation');
  });
  it('keeps an existing file unless --force: exit 2 naming the file', () => {
    const out = join(dir, 'kept.json');
    writeFileSync(out, 'mine\n');
    const r = runCli(['advise', demo, '--format', 'json', '--out', out]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(out);
    expect(readFileSync(out, 'utf8')).toBe('mine\n');
    const f = runCli(['advise', demo, '--format', 'json', '--out', out, '--force']);
    expect(f.code).toBe(0);
    expect(readFileSync(out, 'utf8')).not.toBe('mine\n');
  });
});

describe('one style for error messages', () => {
  it.each([
    [['advise', SINGLE[0]!, '--colour'], /^shaftwise: unknown option '--colour'/],
    [['advise'], /^shaftwise: missing required argument 'case'/],
    [['advise', SINGLE[0]!, '--units', 'metric'], /^shaftwise: --units: got "metric"; expected SI or US/],
    [['map', SINGLE[0]!, '--units', 'metric'], /^shaftwise: --units: got "metric"; expected SI or US/],
  ])('%j: exit 2, "shaftwise: " and the message', (args, msg) => {
    const r = runCli(args);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(msg);
    expect(r.stderr).not.toMatch(/^error:/m);
  });
});
