// A whole shaft advised end to end (issue 15): the cider mill example of examples/shaft (an
// invented setting), a stiffer variant, and a cross-located tapered roller pair.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseAnyCaseText, type LoadedShaftCase } from '../../src/case/shaft-load.js';
import { adviseShaft, type ShaftAdvice } from '../../src/advise/shaft.js';
import { opposedPairAxialLoads } from '../../src/calc/rolling/tapered-pair.js';
import { describe as wordOf } from '../../src/report/findings/index.js';

const ROOT = join(import.meta.dirname, '../..');
const EXAMPLE = readFileSync(join(ROOT, 'examples/shaft/cider-mill-crusher-shaft.yaml'), 'utf8');
const DEG = Math.PI / 180;
const ARCMIN = DEG / 60;

function shaftOf(text: string): LoadedShaftCase {
  const r = parseAnyCaseText(text, 't.yaml');
  if (r.kind !== 'shaft') throw new Error('expected a shaft case');
  return r.loaded;
}

const cache = new Map<string, Promise<ShaftAdvice>>();
const advised = (text: string) => cache.get(text) ?? cache.set(text, adviseShaft(shaftOf(text))).get(text)!;

describe('adviseShaft: the cider mill crusher shaft (examples/shaft)', () => {
  it('gives the reactions of hand statics', async () => {
    // Supports A at x = 0, B at x = 0.4 m; y up, z across; forces on the shaft.
    //  belt at −0.1 m: F = k·2T/d = 2·2·150/0.2 = 3000 N towards 180° → fy = −3000 N
    //  helical pinion at 0.3 m, mesh point towards +z (90°): Ft = 2T/d = 3000 N, along −t with
    //    t = (0, −1, 0) → fy = +3000 N; Fr = Ft·tan 20°/cos 15° = 1130.4 N towards the axis
    //    → fz = −1130.4 N; Fa = Ft·tan 15° = 803.8 N along +x at the pitch radius 0.05 m
    //    → couple my = Fa·0.05 = 40.19 N·m
    //  flywheel at 0.2 m: fy = −30·9.80665 = −294.2 N
    //  (helical gear forces: Juvinall & Marshek, Fundamentals of Machine Component Design, 6th
    //  ed. 2017, ch. 16, from memory; statics of a rigid beam on two supports.)
    //  x–y: R_By = −Σ x·fy / 0.4 = −(300 + 900 − 58.84)/0.4 = −2852.9 N; R_Ay = −Σfy − R_By = 3147.1 N
    //  x–z: R_Bz = (−Σ x·fz + Σ my)/0.4 = (339.1 + 40.19)/0.4 = 948.3 N; R_Az = 1130.4 − 948.3 = 182.1 N
    //  axial: the pulley side locates and carries 803.8 N
    const ft = (2 * 150) / 0.1;
    const fr = (ft * Math.tan(20 * DEG)) / Math.cos(15 * DEG);
    const fa = ft * Math.tan(15 * DEG);
    const w = 30 * 9.80665;
    const By = -(-0.1 * -3000 + 0.3 * ft + 0.2 * -w) / 0.4;
    const Ay = -(-3000 + ft - w) - By;
    const Bz = (-(0.3 * -fr) + fa * 0.05) / 0.4;
    const Az = fr - Bz;
    expect([Ay, By, Az, Bz].map((x) => Math.round(x * 10) / 10)).toEqual([3147.1, -2852.9, 182.1, 948.3]);
    const a = await advised(EXAMPLE);
    const [A, B] = a.supports;
    expect(A.reaction.y).toBeCloseTo(Ay, 6);
    expect(A.reaction.z).toBeCloseTo(Az, 6);
    expect(B.reaction.y).toBeCloseTo(By, 6);
    expect(B.reaction.z).toBeCloseTo(Bz, 6);
    expect(A.reaction.radial).toBeCloseTo(Math.hypot(Ay, Az), 6);
    expect(A.reaction.axial).toBeCloseTo(fa, 6);
    expect(B.reaction.axial).toBe(0);
    // Each support's case carries its reaction and axial load.
    expect(A.loaded.case.load.radial).toBeCloseTo(Math.hypot(Ay, Az), 6);
    expect(A.loaded.case.load.axial).toBeCloseTo(fa, 6);
    expect(B.loaded.case.load.radial).toBeCloseTo(Math.hypot(By, Bz), 6);
  });

  it("carries each support's slope into its case as shaft.misalignment", async () => {
    const a = await advised(EXAMPLE);
    for (const s of a.supports) {
      expect(s.slope).toBeGreaterThan(0);
      expect(s.loaded.case.shaft.misalignment).toBeCloseTo(s.slope, 12);
      expect(s.document['shaft']).toMatchObject({ misalignment: expect.stringMatching(/ rad$/) });
    }
  });

  it('a slope beyond a few arc min rules out the deep-groove ball and cylindrical roller bearings, not the spherical roller', async () => {
    // The 40 mm shaft slopes by more than 5 arc min at both supports (permissible misalignment,
    // data/rolling-kinds.json, common practice: deep-groove ball 5', cylindrical roller 3',
    // spherical roller 90').
    const a = await advised(EXAMPLE);
    for (const s of a.supports) {
      expect(s.slope).toBeGreaterThan(5 * ARCMIN);
      const r = s.advice.checks.rolling;
      const byKind = (kind: string) => r.candidates.filter((k) => k.kind === kind);
      for (const kind of ['deep-groove ball', 'cylindrical roller'])
        for (const k of byKind(kind)) {
          expect(k.feasible).toBe(false);
          expect(k.checks.find((x) => x.id === 'misalignment')!.pass).toBe(false);
        }
      expect(byKind('spherical roller').every((k) => k.checks.find((x) => x.id === 'misalignment')!.pass)).toBe(true);
      expect(s.advice.recommendation).toBe('rolling');
      expect(r.candidates.find((k) => k.id === r.best)!.kind).toBe('spherical roller');
    }
    expect(a.arrangement.reasons.filter((r) => r.code === 'shaft.self-aligning')).toHaveLength(2);
  });

  it('names the locating and the floating support', async () => {
    const a = await advised(EXAMPLE);
    expect(a.arrangement.locating).toBe('pulley side');
    expect(a.arrangement.summary.code).toBe('shaft.arrangement-locating-floating');
    const codes = a.arrangement.reasons.map((r) => r.code);
    expect(codes).toContain('shaft.locating-takes-thrust');
    expect(codes).toContain('shaft.floats-in-housing');
    expect(wordOf(a.arrangement.summary)).toMatch(/^locating: spherical roller bearing at pulley side; floating: /);
    for (const r of a.arrangement.reasons) expect(wordOf(r).length).toBeGreaterThan(0);
  });

  it('a stiffer shaft (55 mm) stays within a deep-groove ball bearing at the locating side', async () => {
    const text = EXAMPLE.replace('diameter: 40 mm', 'diameter: 55 mm').replace(
      'maxOuterDiameter: 90 mm',
      'maxOuterDiameter: 110 mm',
    );
    const a = await advised(text);
    const [A] = a.supports;
    // Stiffness grows with d⁴: (55/40)⁴ = 3.57, so the slope falls below 5 arc min.
    expect(A.slope).toBeLessThan(5 * ARCMIN);
    const r = A.advice.checks.rolling;
    expect(A.advice.recommendation).toBe('rolling');
    expect(r.candidates.find((k) => k.id === r.best)!.kind).toBe('deep-groove ball');
    expect(a.arrangement.summary.code).toBe('shaft.arrangement-locating-floating');
  });

  it('holds the JSON contract keys', async () => {
    const a = await advised(EXAMPLE);
    expect(Object.keys(a).sort()).toEqual(['arrangement', 'assumed', 'shaft', 'supports', 'warnings']);
    expect(Object.keys(a.shaft).sort()).toEqual(['diagram', 'maxDeflection', 'maxMoment']);
    for (const k of ['x', 'shearY', 'shearZ', 'moment', 'deflection']) expect(a.shaft.diagram[0]).toHaveProperty(k);
    for (const s of a.supports) {
      for (const k of ['name', 'at', 'diameter', 'reaction', 'slope', 'advice']) expect(s).toHaveProperty(k);
      expect(Object.keys(s.reaction).sort()).toEqual(['axial', 'radial', 'y', 'z']);
    }
    expect(Object.keys(a.arrangement).sort()).toEqual(['locating', 'reasons', 'summary']);
  });
});

/** An invented cross-located shaft: a short conveyor head shaft on tapered roller bearings, a spur-free chain drive. */
const TAPERED = `
title: Short chain-driven roller shaft (invented)
shaft:
  speed: 200 rpm
  diameter: 50 mm
  supports:
    - { name: near side, at: 0 mm, locates: one-direction }
    - { name: far side, at: 250 mm, locates: one-direction }
  loads:
    - { at: 80 mm, force: { y: -9 kN, z: 0 N }, axial: 1.5 kN }
    - { at: 320 mm, chain: { pitchDiameter: 200 mm, torque: 300 N*m, pullFactor: 1.1, direction: 90 deg } }
life: { hours: 30000 h }
space: { maxLength: 40 mm, maxOuterDiameter: 110 mm }
lubrication: { supply: grease }
environment: { contamination: normal }
rolling: { kind: tapered roller }
`;

describe('adviseShaft: a cross-located tapered roller pair', () => {
  it('takes the axial loads from the opposed-pair rule with both bearings’ induced forces', async () => {
    const a = await advised(TAPERED);
    const [A, B] = a.supports;
    const kA = A.advice.checks.rolling.candidates.find((k) => k.id === A.advice.checks.rolling.best)!;
    const kB = B.advice.checks.rolling.candidates.find((k) => k.id === B.advice.checks.rolling.best)!;
    expect(kA.kind).toBe('tapered roller');
    expect(kB.kind).toBe('tapered roller');
    // External axial force 1.5 kN along +x, towards the far side (B). Y = 0.4·cot α (ISO 281,
    // from memory); Fi = 0.5·Fr/Y; the rule of tapered-pair.ts.
    const r = opposedPairAxialLoads({
      FrA: A.reaction.radial,
      FrB: B.reaction.radial,
      YA: 0.4 / Math.tan(kA.contactAngle * DEG),
      YB: 0.4 / Math.tan(kB.contactAngle * DEG),
      Ka: 1500,
    });
    // Equal when the choice settles; when the loads swing the choice between two series, each
    // support is advised on the largest of the passes, never less than the rule for its bearing.
    expect(A.reaction.axial).toBeGreaterThanOrEqual(r.FaA - 1e-6);
    expect(B.reaction.axial).toBeGreaterThanOrEqual(r.FaB - 1e-6);
    expect(B.reaction.axial - A.reaction.axial).toBeCloseTo(1500, 6);
    // Both carry axial load: each bearing's induced force is held by the other.
    expect(A.reaction.axial).toBeGreaterThan(0);
    expect(A.loaded.case.load.axial).toBeCloseTo(A.reaction.axial, 6);
    expect(a.arrangement.summary.code).toBe('shaft.arrangement-cross-located');
    expect(a.arrangement.locating).toBe('near side and far side');
    expect(a.arrangement.reasons.map((x) => x.code)).toContain('shaft.induced-axial');
    expect(wordOf(a.arrangement.summary)).toMatch(
      /^cross-located pair: tapered roller bearing at near side and at far side/,
    );
  });
});
