// The whole-shaft map and sensitivity (not physics: the checks are tested in test/calc, the
// statics and beam in test/calc/shaft). Invented setting: the countershaft of a seed-cleaning
// sieve, a V-belt pulley overhung, a spur pinion between the supports and a flywheel.
import { describe, expect, it } from 'vitest';
import { parseAnyCaseText, type LoadedShaftCase } from '../../src/case/shaft-load.js';
import type { ShaftLoadSI } from '../../src/case/shaft-types.js';
import { adviseShaft } from '../../src/advise/shaft.js';
import { computeShaftMap, MAX_SLOPE, parseLoadScale, scaleSupportCase } from '../../src/explore/shaft-map.js';
import { computeShaftSensitivity } from '../../src/explore/shaft-sensitivity.js';
import { referencePoint } from '../../src/explore/scale.js';
import { shaftMapHtml, shaftMapSvg, shaftMapText } from '../../src/report/explore/shaft-map.js';
import { shaftSensitivityText } from '../../src/report/explore/shaft-sensitivity.js';
import { UsageError } from '../../src/core/errors.js';

const text = [
  'title: Seed sieve countershaft',
  'shaft:',
  '  speed: 480 rpm',
  '  diameter: 35 mm',
  '  supports:',
  '    - { name: pulley end, at: 0 mm, locates: true }',
  '    - { name: far end, at: 450 mm }',
  '  loads:',
  '    - { at: -90 mm, belt: { pitchDiameter: 180 mm, torque: 90 N*m, pullFactor: 2, direction: 180 deg } }',
  '    - { at: 320 mm, gear: { pitchDiameter: 90 mm, torque: 90 N*m, pressureAngle: 20 deg, helixAngle: 12 deg, mesh: 90 deg } }',
  '    - { at: 180 mm, weight: { mass: 25 kg } }',
  'life: { hours: 20000 h }',
  'space: { maxLength: 40 mm, maxOuterDiameter: 90 mm }',
  'lubrication: { supply: grease }',
  'environment: { contamination: dirty }',
  '',
].join('\n');

function load(): LoadedShaftCase {
  const r = parseAnyCaseText(text, 'sieve.yaml');
  if (r.kind !== 'shaft') throw new Error('expected a shaft case');
  return r.loaded;
}

/** Every load on the shaft × k: forces, torques and masses. */
function scaled(l: LoadedShaftCase, k: number): LoadedShaftCase {
  const one = (x: ShaftLoadSI): ShaftLoadSI =>
    'force' in x
      ? { ...x, force: { y: x.force.y * k, z: x.force.z * k }, axial: x.axial * k }
      : 'gear' in x
        ? { ...x, gear: { ...x.gear, torque: x.gear.torque * k } }
        : 'belt' in x
          ? { ...x, belt: { ...x.belt, torque: x.belt.torque * k } }
          : 'chain' in x
            ? { ...x, chain: { ...x.chain, torque: x.chain.torque * k } }
            : { ...x, weight: { mass: x.weight.mass * k } };
  return { ...l, shaft: { ...l.shaft, loads: l.shaft.loads.map(one) } };
}

describe('map of a whole shaft', async () => {
  const input = load();
  const sa = await adviseShaft(input);
  const grid = 5; // odd: the middle row is k = 1, the middle column the case's speed
  const m = await computeShaftMap(input, { grid }, sa);

  it('scaling every load on the shaft by k scales a support case by k, slope included (the map premise)', async () => {
    const k = 2.5;
    const sk = await adviseShaft(scaled(input, k));
    for (const i of [0, 1] as const) {
      const c1 = sa.supports[i].loaded.case;
      const byMap = scaleSupportCase(c1, k, 1);
      const byShaft = sk.supports[i].loaded.case;
      expect(byMap.load.radial).toBeCloseTo(byShaft.load.radial, 6);
      expect(byMap.load.axial).toBeCloseTo(byShaft.load.axial, 6);
      expect(byMap.shaft.misalignment!).toBeCloseTo(byShaft.shaft.misalignment!, 12);
      expect(byShaft.shaft.misalignment!).toBeGreaterThan(0);
    }
    // The pinion's thrust goes to the locating support alone.
    expect(sa.supports[0].loaded.case.load.axial).toBeGreaterThan(0);
  });

  it('holds the slope at 5° (the ceiling of shaft.misalignment) beyond it', () => {
    const c = sa.supports[0].loaded.case;
    const big = MAX_SLOPE / c.shaft.misalignment! + 1;
    expect(scaleSupportCase(c, big, 1).shaft.misalignment).toBe(MAX_SLOPE);
    expect(scaleSupportCase(c, 0.5, 3).shaft.speed).toBeCloseTo(c.shaft.speed! * 3, 12);
  });

  it('one map per support, named, its load axis the scale k from 0.25 to 4 of the support reaction', () => {
    expect(m.supports.map((s) => s.name)).toEqual(['pulley end', 'far end']);
    m.supports.forEach((s, i) => {
      const ref = sa.supports[i]!.loaded.case.load.radial;
      expect(s.radial).toBe(ref);
      expect(s.map.loadScale!.reference).toBe(ref);
      expect(s.map.loads[0]! / ref).toBeCloseTo(0.25, 12);
      expect(s.map.loads[grid - 1]! / ref).toBeCloseTo(4, 12);
      expect(s.map.loads[(grid - 1) / 2]! / ref).toBeCloseTo(1, 12);
      expect(s.map.title).toContain(s.name);
    });
  });

  it('the cell at k = 1 and the case speed agrees with the whole-shaft advice at each support', () => {
    const mid = (grid - 1) / 2;
    m.supports.forEach((s, i) => {
      const a = sa.supports[i]!.advice;
      expect(s.map.speeds[mid]! / input.shaft.speed!).toBeCloseTo(1, 12);
      const cell = s.map.cells[mid]![mid]!;
      expect(cell.winner).toBe(a.recommendation);
      expect(cell.feasible).toEqual(
        ['bushing', 'rolling', 'journal'].map((o) => a.ranking.find((r) => r.option === o)!.feasible),
      );
      expect(s.map.atCase.recommendation).toBe(a.recommendation);
      expect(s.recommendation).toBe(a.recommendation);
    });
  });

  it('a heavier shaft is never easier: where rolling fails at k it fails at every larger k (same speed)', () => {
    for (const s of m.supports)
      for (let j = 0; j < grid; j++) {
        const col = s.map.cells.map((row) => row[j]!.feasible[1]);
        const firstFail = col.indexOf(false);
        if (firstFail >= 0) expect(col.slice(firstFail).every((f) => !f)).toBe(true);
      }
  });

  it('text, SVG and HTML name each support and show the axis as k', () => {
    const t = shaftMapText(m);
    expect(t).toContain('Support A: pulley end');
    expect(t).toContain('Support B: far end');
    expect(t).toMatch(/ 1× \|/);
    expect(t).toMatch(/load scale 0\.25× to 4×/);
    const svg = shaftMapSvg(m);
    expect(svg.match(/<svg x="0" y="\d+"/g)).toHaveLength(2);
    expect(svg.match(/<defs>/g)).toHaveLength(1);
    expect(svg).toContain('>1×</text>');
    const html = shaftMapHtml(m);
    const ids = [...html.matchAll(/ id="([^"]+)"/g)].map((x) => x[1]);
    expect(new Set(ids).size).toBe(ids.length);
    expect(html).toContain('Support B: far end');
  });

  it('parses --scale and refuses what is not a range of factors', () => {
    expect(parseLoadScale('0.5..3')).toEqual([0.5, 3]);
    for (const bad of ['3..0.5', '0..2', '1 kN..2 kN', '2', '-1..2'])
      expect(() => parseLoadScale(bad), bad).toThrow(UsageError);
  });
});

describe('sensitivity of a whole shaft', async () => {
  const input = load();
  const sa = await adviseShaft(input);
  const r = await computeShaftSensitivity(input, {}, sa);

  it("per support, on the support's own case", () => {
    expect(r.supports.map((s) => s.name)).toEqual(['pulley end', 'far end']);
    r.supports.forEach((s, i) => {
      const c = sa.supports[i]!.loaded.case;
      expect(s.sensitivity.title).toBe(c.title);
      expect(s.sensitivity.recommendation).toBe(sa.supports[i]!.advice.recommendation);
      expect(s.sensitivity.parameters.find((p) => p.id === 'load')!.base).toBe(referencePoint(c).load);
    });
    const t = shaftSensitivityText(r);
    expect(t).toContain("Support A: pulley end (the support's own inputs)");
    expect(t).toContain("Support B: far end (the support's own inputs)");
    expect(t).toMatch(/inputs varied are each support's own/);
  });
});
