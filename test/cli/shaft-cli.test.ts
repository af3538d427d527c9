// The built CLI on a whole-shaft case: advise in text, JSON (issue 15's contract keys) and the
// note; batch with a row per support; bad input (map and sensitivity: test/cli/shaft-map.test.ts).
// Contract tests of the output's structure, not physics. Invented setting: the jackshaft of a
// sawdust extraction fan, a spur gear between the supports and the belt pulley overhung.
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { ROOT, runCli, STACK } from '../helpers/cli.js';

const dir = mkdtempSync(join(tmpdir(), 'shaftwise-shaft-cli-'));

const shaftCase = (supportB = '500 mm') =>
  [
    'title: Sawdust fan jackshaft',
    'shaft:',
    '  speed: 1200 rpm',
    '  diameter: 40 mm',
    '  supports:',
    '    - { name: motor side, at: 0 mm, locates: true }',
    `    - { name: outboard, at: ${supportB} }`,
    '  loads:',
    '    - { at: 200 mm, gear: { pitchDiameter: 160 mm, torque: 120 N*m, pressureAngle: 20 deg, helixAngle: 0 deg, mesh: 0 deg } }',
    '    - { at: -120 mm, belt: { pitchDiameter: 200 mm, torque: -120 N*m, pullFactor: 2.5, direction: 180 deg } }',
    '    - { at: 350 mm, weight: { mass: 12 kg } }',
    'life: { hours: 30000 h }',
    'space: { maxLength: 40 mm, maxOuterDiameter: 90 mm }',
    'lubrication: { supply: grease }',
    'environment: { contamination: dirty }',
    '',
  ].join('\n');

const FAN = join(dir, 'fan.yaml');
writeFileSync(FAN, shaftCase());
const SAME_PLACE = join(dir, 'same-place.yaml');
writeFileSync(SAME_PLACE, shaftCase('0 mm'));

describe('advise on a shaft case', () => {
  it('prints the shaft, the loads, the sketch, the reactions, each support and the arrangement', () => {
    const r = runCli(['advise', FAN]);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const out = r.stdout;
    const order = [
      'Shaft\n=====',
      'Loads on the shaft',
      'Sketch',
      'Reactions',
      'Support A: motor side',
      'Support B: outboard',
      'Arrangement',
    ];
    const at = order.map((s) => out.indexOf(s));
    for (const i of at) expect(i).toBeGreaterThanOrEqual(0);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
    expect(out).toMatch(/largest bending moment [\d.]+ N·m, largest deflection [\d.]+ µm/);
    // The shaft's own lines (before the first support's advice) fit 100 columns.
    for (const line of out.slice(0, out.indexOf('Support A:')).split('\n'))
      expect([...line].length).toBeLessThanOrEqual(100);
  });

  it('--units us shows the shaft in US customary units', () => {
    const r = runCli(['advise', FAN, '--units', 'us']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/support A "motor side" at 0 in/);
    expect(r.stdout).toMatch(/\d lbf/);
  });

  it('--format json prints the contract of issue 15 in SI, with the case as written', () => {
    // Two whole single-support advices and the diagram: above runCli's 1 MB output buffer.
    const r = spawnSync(
      process.execPath,
      [join(ROOT, 'dist/bundle/shaftwise.mjs'), 'advise', FAN, '--format', 'json'],
      {
        encoding: 'utf8',
        maxBuffer: 64 * 1024 * 1024,
      },
    );
    expect(r.status).toBe(0);
    const j = JSON.parse(r.stdout) as {
      shaft: Record<string, unknown> & { diagram: Record<string, number>[] };
      supports: (Record<string, unknown> & { reaction: Record<string, number>; advice: Record<string, unknown> })[];
      arrangement: Record<string, unknown>;
      case: { title: string };
    };
    expect(Object.keys(j)).toEqual(['shaft', 'supports', 'arrangement', 'assumed', 'warnings', 'case']);
    expect(Object.keys(j.shaft)).toEqual(['maxDeflection', 'maxMoment', 'diagram']);
    for (const k of ['x', 'shearY', 'shearZ', 'moment', 'deflection']) expect(j.shaft.diagram[0]).toHaveProperty(k);
    expect(j.supports.map((s) => s['name'])).toEqual(['motor side', 'outboard']);
    for (const s of j.supports) {
      expect(Object.keys(s)).toEqual(['name', 'at', 'diameter', 'reaction', 'slope', 'advice']);
      expect(Object.keys(s.reaction)).toEqual(['y', 'z', 'radial', 'axial']);
      expect(s.advice).toHaveProperty('ranking');
    }
    // SI: positions in m, the seat diameter 40 mm as 0.04.
    expect(j.supports[1]!['at']).toBe(0.5);
    expect(j.supports[0]!['diameter']).toBeCloseTo(0.04, 12);
    expect(Object.keys(j.arrangement)).toEqual(['locating', 'summary', 'reasons']);
    expect(typeof j.arrangement['summary']).toBe('string');
    expect(j.case.title).toBe('Sawdust fan jackshaft');
  });

  it('--format html writes the note with the sketch, the moment and deflection charts and each support', () => {
    const out = join(dir, 'fan.html');
    const r = runCli(['advise', FAN, '--format', 'html', '--out', out], { env: { SOURCE_DATE_EPOCH: '1709640000' } });
    expect(r.code).toBe(0);
    const html = readFileSync(out, 'utf8');
    for (const id of ['chart-shaft-sketch', 'chart-shaft-moment', 'chart-shaft-deflection'])
      expect(html).toContain(`id="${id}"`);
    expect(html).toContain('Reactions, bending and slopes');
    expect(html).toContain('A (motor side): Summary and recommendation');
    expect(html).toContain('B (outboard): Summary and recommendation');
    const ids = [...html.matchAll(/ id="([^"]+)"/g)].map((m) => m[1]);
    expect(new Set(ids).size).toBe(ids.length);
  });

  it('refuses two supports at one position with the loader message, exit 2, no trace', () => {
    const r = runCli(['advise', SAME_PLACE]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/shaft\.supports/);
    expect(r.stderr).not.toMatch(STACK);
    expect(r.stdout).toBe('');
  });
});

describe('batch with a shaft case', () => {
  it('gives one row per support, titled with the support name, beside a single case', () => {
    const folder = join(dir, 'batch');
    mkdirSync(folder);
    writeFileSync(join(folder, 'a-fan.yaml'), shaftCase());
    writeFileSync(join(folder, 'b-single.yaml'), readFileSync('examples/batch/04-fan-jackshaft.yaml', 'utf8'));
    const csvPath = join(dir, 'summary.csv');
    const r = runCli(['batch', folder, '--out', csvPath]);
    expect(r.code).toBe(0);
    const rows = readFileSync(csvPath, 'utf8').trimEnd().split('\r\n');
    expect(rows).toHaveLength(1 + 3);
    expect(rows[1]).toMatch(/^a-fan\.yaml,Sawdust fan jackshaft: motor side,(pass|fail),/);
    expect(rows[2]).toMatch(/^a-fan\.yaml,Sawdust fan jackshaft: outboard,(pass|fail),/);
    expect(rows[3]).toMatch(/^b-single\.yaml,Motor-hall ventilation fan jackshaft,/);
  });
});
