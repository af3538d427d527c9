// The built CLI: `check bushing` output contract and bad input (exit 2, one message per problem, no trace).
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, runCli, STACK } from '../helpers/cli.js';

const DEMO = 'examples/sawmill-infeed-roller.yaml';
const dir = mkdtempSync(join(tmpdir(), 'shaftwise-cli-'));
function caseFile(name: string, text: string): string {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
}

describe('shaftwise check bushing', () => {
  it('prints the JSON contract', () => {
    const r = runCli(['check', 'bushing', DEMO, '--format', 'json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.option).toBe('bushing');
    expect(j.case.shaft.diameter).toBeCloseTo(0.04, 12);
    expect(Array.isArray(j.assumed)).toBe(true);
    expect(Array.isArray(j.warnings)).toBe(true);
    expect('best' in j).toBe(true);
    expect(j.materials.length).toBeGreaterThanOrEqual(10);
    for (const m of j.materials) {
      for (const k of [
        'id',
        'name',
        'length',
        'pressure',
        'peakPressure',
        'velocity',
        'pv',
        'factors',
        'wearFactor',
        'wearDepth',
        'lifeHours',
        'lifeBand',
        'minLength',
        'temperature',
        'feasible',
        'checks',
      ]) {
        expect(m, k).toHaveProperty(k);
      }
      expect(Object.keys(m.factors).sort()).toEqual(['environment', 'motion']);
      expect(Object.keys(m.lifeBand).sort()).toEqual(['long', 'short', 'typical']);
      for (const c of m.checks) {
        expect(Object.keys(c)).toEqual(
          expect.arrayContaining(['id', 'label', 'value', 'limit', 'unit', 'margin', 'pass', 'source']),
        );
      }
    }
  });

  it('prints a table a person can read without colour, with units and the caution', () => {
    const r = runCli(['check', 'bushing', DEMO]);
    expect(r.code).toBe(0);
    // eslint-disable-next-line no-control-regex -- ANSI escape codes start with ESC
    expect(r.stdout).not.toMatch(/\u001b\[/);
    expect(r.stdout).toMatch(/FAIL|ok {2}/);
    expect(r.stdout).toMatch(/MPa·m\/s/);
    expect(r.stdout).toMatch(/Concept-stage estimate/);
    const us = runCli(['check', 'bushing', DEMO, '--units', 'US']);
    expect(us.stdout).toMatch(/psi·ft\/min/);
  });

  it('answers --help and --version', () => {
    const v = runCli(['--version']);
    expect(v.code).toBe(0);
    expect(v.stdout.trim()).toMatch(/^\d+\.\d+\.\d+$/);
    const h = runCli(['--help']);
    expect(h.code).toBe(0);
    expect(h.stdout).toMatch(/check/);
  });

  const bad: [string, string[] | string, RegExp][] = [
    ['missing file', ['check', 'bushing', join(ROOT, 'no-such-case.yaml')], /cannot be read \(no such file\)/],
    ['not YAML', 'title: [unclosed\n', /is not valid YAML or JSON/],
    [
      'wrong unit kind',
      'title: t\nshaft: {diameter: 40 kg, speed: 100 rpm}\nload: {radial: 1 kN}\nlife: {hours: 100 h}\nspace: {maxLength: 40 mm, maxOuterDiameter: 60 mm}\n',
      /shaft\.diameter: "40 kg" is a mass; expected a length/,
    ],
    [
      'negative load',
      'title: t\nshaft: {diameter: 40 mm, speed: 100 rpm}\nload: {radial: -1 kN}\nlife: {hours: 100 h}\nspace: {maxLength: 40 mm, maxOuterDiameter: 60 mm}\n',
      /load\.radial: got "-1 kN"; expected a value greater than zero/,
    ],
    [
      'unknown key',
      'title: t\nshaft: {diameter: 40 mm, speed: 100 rpm}\nload: {radial: 1 kN}\nlife: {hours: 100 h}\nspace: {maxLength: 40 mm, maxOuterDiameter: 60 mm}\ncolour: blue\n',
      /unknown key "colour"/,
    ],
    ['unknown option', ['check', 'bushing', DEMO, '--formt', 'json'], /unknown option '--formt'/],
    [
      'bad format value',
      ['check', 'bushing', DEMO, '--format', 'xml'],
      /--format: got "xml"; expected one of: text, json/,
    ],
    ['unknown check', ['check', 'gearbox', DEMO], /check: got "gearbox"; expected one of: bushing, rolling, journal/],
  ];
  for (const [name, input, message] of bad) {
    it(`bad input: ${name} → exit 2, message, no trace`, () => {
      const args = Array.isArray(input)
        ? input
        : ['check', 'bushing', caseFile(`${name.replace(/ /g, '-')}.yaml`, input)];
      const r = runCli(args);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(message);
      expect(r.stderr).not.toMatch(STACK);
      expect(r.stdout).toBe('');
    });
  }
});
