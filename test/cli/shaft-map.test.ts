// The built CLI: map and sensitivity on a whole-shaft case (one map / one table per support),
// their options, exit codes; check still refuses a shaft case. Contract tests of the output,
// not physics (test/explore/shaft-map.test.ts checks the maps against the whole-shaft advice).
// Invented setting: the drive shaft of a cider mill's crusher (examples/shaft).
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli, STACK } from '../helpers/cli.js';

const SHAFT = 'examples/shaft/cider-mill-crusher-shaft.yaml';
const SINGLE = 'examples/irrigation-pump-lineshaft.yaml';
const dir = mkdtempSync(join(tmpdir(), 'shaftwise-shaft-map-'));

describe('map on a shaft case', () => {
  it('prints one map per support, the load axis as k, exit 0', () => {
    const r = runCli(['map', SHAFT, '--grid', '7']);
    expect(r.stderr).not.toMatch(STACK);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('Selection maps of a whole shaft: Cider mill, crusher drive shaft');
    const a = r.stdout.indexOf('Support A: pulley side');
    const b = r.stdout.indexOf('Support B: pinion side');
    expect(a).toBeGreaterThan(0);
    expect(b).toBeGreaterThan(a);
    expect(
      r.stdout.match(/load scale k of every load on the shaft \(up; k = 1: [\d.]+ k?N at this support\)/g),
    ).toHaveLength(2);
    expect(r.stdout.match(/Ranges: load scale 0\.25× to 4×/g)).toHaveLength(2);
  });

  it('--scale sets the range of k; --out writes SVG and HTML with both supports', () => {
    const r = runCli(['map', SHAFT, '--grid', '3', '--scale', '0.5..2']);
    expect(r.code).toBe(0);
    expect(r.stdout.match(/Ranges: load scale 0\.5× to 2×/g)).toHaveLength(2);
    const svg = join(dir, 'm.svg');
    const html = join(dir, 'm.html');
    expect(runCli(['map', SHAFT, '--grid', '3', '--out', svg]).code).toBe(0);
    expect(runCli(['map', SHAFT, '--grid', '3', '--out', html]).code).toBe(0);
    const s = readFileSync(svg, 'utf8');
    expect(s.match(/<svg x="0"/g)).toHaveLength(2);
    expect(s).toContain('pinion side');
    const h = readFileSync(html, 'utf8');
    expect(h).toContain('Support A: pulley side');
    expect(h).toContain('Support B: pinion side');
  });

  it('bad options: one message naming the option, exit 2', () => {
    for (const [args, said] of [
      [['map', SHAFT, '--scale', '4..1'], '--scale: got "4..1"'],
      [['map', SHAFT, '--load', '1kN..2kN'], '--load: got "1kN..2kN" for a shaft case'],
      [['map', SINGLE, '--scale', '0.5..2'], '--scale is for a shaft case'],
    ] as const) {
      const r = runCli([...args]);
      expect(r.code, args.join(' ')).toBe(2);
      expect(r.stderr).toContain(said);
      expect(r.stderr).not.toMatch(STACK);
      expect(r.stdout).toBe('');
    }
  });
});

describe('sensitivity on a shaft case', () => {
  it("text: a table per support, saying the inputs are the support's, exit 0", () => {
    const r = runCli(['sensitivity', SHAFT]);
    expect(r.stderr).not.toMatch(STACK);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain("Support A: pulley side (the support's own inputs)");
    expect(r.stdout).toContain("Support B: pinion side (the support's own inputs)");
    expect(r.stdout).toContain('Sensitivity: Cider mill, crusher drive shaft: pulley side');
    // Words wrap at 100 columns: read the text with its line breaks as spaces.
    expect(r.stdout.replace(/\s+/g, ' ')).toMatch(/slope \(shaft\.misalignment\) is held/);
  });

  it('json: per support its name, position and sensitivity; html: one page', () => {
    const r = runCli(['sensitivity', SHAFT, '--format', 'json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout) as {
      supports: { name: string; at: number; sensitivity: { parameters: unknown[] } }[];
    };
    expect(j.supports.map((s) => s.name)).toEqual(['pulley side', 'pinion side']);
    expect(j.supports[1]!.at).toBeCloseTo(0.4, 12);
    expect(j.supports[0]!.sensitivity.parameters.length).toBeGreaterThan(3);
    const h = runCli(['sensitivity', SHAFT, '--format', 'html']);
    expect(h.code).toBe(0);
    const ids = [...h.stdout.matchAll(/ id="([^"]+)"/g)].map((x) => x[1]);
    expect(ids.length).toBeGreaterThan(0);
    expect(new Set(ids).size).toBe(ids.length);
  });
});

describe('check on a shaft case', () => {
  it('still refuses it by name and points to advise, exit 2', () => {
    const r = runCli(['check', 'rolling', SHAFT]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('shaft');
    expect(r.stderr).toContain('advise');
    expect(r.stderr).not.toMatch(STACK);
  });
});
