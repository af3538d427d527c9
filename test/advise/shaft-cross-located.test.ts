// A cross-located pair (both supports `locates: one-direction`) holds the shaft one way at each
// support whatever the thrust's direction (it reverses at start, braking or reversal: common
// practice): each support's rolling option among the kinds that hold a shaft axially, the same
// kind at both, and a bushing there with its thrust washer. Invented settings.
import { describe, expect, it } from 'vitest';
import { parseAnyCaseText } from '../../src/case/shaft-load.js';
import { adviseShaft, type ShaftAdvice } from '../../src/advise/shaft.js';
import { CROSS_LOCATED_KINDS } from '../../src/advise/shaft-arrangement.js';
import { describe as wordOf } from '../../src/report/findings/index.js';

async function advised(text: string): Promise<ShaftAdvice> {
  const r = parseAnyCaseText(text, 't.yaml');
  if (r.kind !== 'shaft') throw new Error('expected a shaft case');
  return adviseShaft(r.loaded);
}

/** The kind of the rolling option's choice at each support (else its first candidate's). */
const kinds = (a: ShaftAdvice) =>
  a.supports.map((s) => {
    const r = s.advice.checks.rolling;
    return (r.candidates.find((k) => k.id === r.best) ?? r.candidates[0])?.kind;
  });

/** A feed-mill reducer's intermediate shaft: a helical wheel in, a helical pinion out. */
const reducer = (room: string) => `
title: Feed-mill reducer, intermediate shaft (invented)
shaft:
  speed: 300 rpm
  diameter: 55 mm
  supports:
    - { name: wheel side, at: 0 mm, locates: one-direction }
    - { name: pinion side, at: 240 mm, locates: one-direction }
  loads:
    - { at: 60 mm, gear: { pitchDiameter: 320 mm, torque: -500 N*m, pressureAngle: 20 deg, helixAngle: 12 deg, mesh: 0 deg } }
    - { at: 170 mm, gear: { pitchDiameter: 90 mm, torque: 500 N*m, pressureAngle: 20 deg, helixAngle: 15 deg, mesh: 180 deg } }
load: { shock: moderate }
life: { hours: 30000 h }
space: { maxLength: ${room}, maxOuterDiameter: 130 mm }
lubrication: { supply: oil-bath, oil: ISO VG 220 }
`;

describe('a cross-located pair: the kind at each support', () => {
  it('the reducer shaft: a mirrored tapered roller pair, never a bearing without axial capacity', async () => {
    // On the statics alone the wheel side carries no thrust (the net 2.3 kN goes to the pinion
    // side) and was once given a deep-groove ball and the pinion side a cylindrical roller bearing.
    for (const room of ['40 mm', '50 mm']) {
      const a = await advised(reducer(room));
      expect(kinds(a), room).toEqual(['tapered roller', 'tapered roller']);
      for (const s of a.supports) expect(s.reaction.axial, room).toBeGreaterThan(0);
      const reasons = a.arrangement.reasons.map((r) => r.code);
      expect(reasons).toContain('shaft.cross-located-kind');
      for (const r of a.arrangement.reasons) expect(wordOf(r).length).toBeGreaterThan(0);
    }
  });

  it('with room for it (50 mm) both supports are feasible: a cross-located tapered pair', async () => {
    const a = await advised(reducer('50 mm'));
    for (const s of a.supports) expect(s.advice.recommendation).toBe('rolling');
    expect(a.arrangement.summary.code).toBe('shaft.arrangement-cross-located');
    expect(a.arrangement.summary.values['same']).toBe(true);
    expect(a.arrangement.reasons.map((r) => r.code)).toContain('shaft.induced-axial');
    expect(wordOf(a.arrangement.summary)).toMatch(/^cross-located pair: tapered roller bearing at wheel side/);
  });

  it('in 40 mm of room the pinion side falls short of its life and says what it would take', async () => {
    const a = await advised(reducer('40 mm'));
    const b = a.supports[1].advice;
    expect(b.checks.rolling.best).toBeNull();
    expect(b.toMakeFeasible.some((c) => c.option === 'rolling' && c.field === 'space.maxLength')).toBe(true);
    expect(a.arrangement.summary.code).toBe('shaft.arrangement-incomplete');
  });

  it('a light shaft: a deep-groove ball pair (it holds the shaft both ways; common practice)', async () => {
    const a = await advised(`
title: Seed-tray conveyor, short idler shaft (invented)
shaft:
  speed: 120 rpm
  diameter: 25 mm
  supports:
    - { name: left, at: 0 mm, locates: one-direction }
    - { name: right, at: 160 mm, locates: one-direction }
  loads:
    - { at: 80 mm, force: { y: -600 N, z: 0 N }, axial: 50 N }
life: { hours: 20000 h }
space: { maxLength: 20 mm, maxOuterDiameter: 62 mm }
lubrication: { supply: grease }
`);
    expect(kinds(a)).toEqual(['deep-groove ball', 'deep-groove ball']);
    expect(a.arrangement.reasons.find((r) => r.code === 'shaft.cross-located-kind')!.values['kind']).toBe(
      'deep-groove ball',
    );
    expect(CROSS_LOCATED_KINDS).toContain('deep-groove ball');
  });

  it('a case that names its rolling kind keeps it (no kind reason)', async () => {
    const a = await advised(reducer('50 mm') + 'rolling: { kind: angular-contact ball }\n');
    expect(kinds(a)).toEqual(['angular-contact ball', 'angular-contact ball']);
    expect(a.arrangement.reasons.map((r) => r.code)).not.toContain('shaft.cross-located-kind');
  });
});

describe('a cross-located pair on bushings', () => {
  const HINGE = `
title: Sluice gate hinge pin pair (invented)
shaft:
  oscillation: { angle: 60 deg, frequency: 0.01 Hz }
  diameter: 60 mm
  supports:
    - { name: upper knuckle, at: 0 mm, locates: one-direction }
    - { name: lower knuckle, at: 300 mm, locates: one-direction }
  loads:
    - { at: 150 mm, force: { y: -20 kN, z: 0 N }, axial: 2 kN }
life: { hours: 20000 h, wearAllowance: 0.5 mm }
space: { maxLength: 70 mm, maxOuterDiameter: 90 mm }
lubrication: { supply: grease }
environment: { contamination: dirty }
`;
  it('each bushing has its thrust washer, the one this load case puts no thrust on included', async () => {
    const a = await advised(HINGE);
    const [A, B] = a.supports;
    expect(A.reaction.axial + B.reaction.axial).toBeCloseTo(2000, 6);
    const idle = A.reaction.axial === 0 ? A : B;
    expect(idle.reaction.axial).toBe(0);
    // Advised on at least 1 N (MIN_AXIAL of the bushing check): its washer is sized.
    expect(idle.loaded.case.load.axial).toBeGreaterThanOrEqual(1);
    for (const s of a.supports) {
      expect(s.advice.recommendation).toBe('bushing');
      expect(s.advice.assumed.some((x) => 'code' in x && x.code === 'bushing.thrust-face')).toBe(true);
    }
    const washer = a.arrangement.reasons.filter((r) => r.code === 'shaft.cross-located-washer');
    expect(washer.map((r) => r.values['name'])).toEqual([idle.name]);
    expect(wordOf(washer[0]!)).toMatch(/thrust washer all the same/);
  });
});
