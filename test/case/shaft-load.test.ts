// The shaft case (issue 15's contract keys): loading into SI, what it assumes, and either kind of case
// through one loader. Figures are the issue's own example, unit conversions exact by definition.
import { describe, expect, it } from 'vitest';
import { parseCaseText } from '../../src/case/load.js';
import { isShaftCase, parseAnyCaseText, STEEL_MODULUS, type LoadedShaftCase } from '../../src/case/shaft-load.js';
import { parseQuantity } from '../../src/case/quantity.js';

/** The issue's example, keys and figures as written there (title our own). */
const ISSUE_EXAMPLE = `
title: Contract example of issue 15
shaft:
  speed: 60 rpm
  diameter: 60 mm                  # where no segment says otherwise
  modulus: 210 GPa
  segments:
    - { from: 0 mm, to: 90 mm, diameter: 55 mm }
  supports:
    - { name: drive side, at: 0 mm, locates: true }
    - { name: free side, at: 900 mm, diameter: 55 mm }
  loads:
    - { at: 450 mm, force: { y: -12 kN, z: 0 N }, axial: 0.4 kN }
    - { at: 1000 mm, gear: { pitchDiameter: 300 mm, torque: 2.4 kN*m, pressureAngle: 20 deg, helixAngle: 0 deg, mesh: 0 deg } }
    - { at: -150 mm, belt: { pitchDiameter: 250 mm, torque: 400 N*m, pullFactor: 2.5, direction: 180 deg } }
    - { at: 300 mm, weight: { mass: 85 kg } }
life: { hours: 40000 h }
space: { maxLength: 70 mm, maxOuterDiameter: 140 mm }
lubrication: { supply: grease }
environment: { contamination: dirty }
`;

function shaftOf(text: string): LoadedShaftCase {
  const r = parseAnyCaseText(text, 't.yaml');
  if (r.kind !== 'shaft') throw new Error('expected a shaft case');
  return r.loaded;
}

const DEG = Math.PI / 180;

describe('the shaft case', () => {
  it("loads the issue's example into SI", () => {
    const { shaft, common, assumed } = shaftOf(ISSUE_EXAMPLE);
    expect(shaft.speed).toBeCloseTo(1, 12); // 60 rpm = 1 rev/s
    expect(shaft.diameter).toBeCloseTo(0.06, 12);
    expect(shaft.modulus).toBeCloseTo(210e9, 0);
    expect(shaft.segments).toEqual([{ from: 0, to: expect.closeTo(0.09, 12), diameter: expect.closeTo(0.055, 12) }]);
    const [a, b] = shaft.supports;
    expect(a).toMatchObject({ name: 'drive side', at: 0, locates: 'both' });
    expect(a.diameter).toBeCloseTo(0.055, 12); // from the segment 0–90 mm
    expect(b).toMatchObject({ name: 'free side', locates: 'none' });
    expect(b.at).toBeCloseTo(0.9, 12);
    expect(b.diameter).toBeCloseTo(0.055, 12);
    const [f, g, belt, w] = shaft.loads;
    expect(f).toEqual({ at: expect.closeTo(0.45, 12), force: { y: -12000, z: 0 }, axial: expect.closeTo(400, 9) });
    expect(g).toEqual({
      at: expect.closeTo(1, 12),
      gear: {
        pitchDiameter: expect.closeTo(0.3, 12),
        torque: expect.closeTo(2400, 9),
        pressureAngle: expect.closeTo(20 * DEG, 12),
        helixAngle: 0,
        mesh: 0,
      },
    });
    expect(belt).toEqual({
      at: expect.closeTo(-0.15, 12),
      belt: {
        pitchDiameter: expect.closeTo(0.25, 12),
        torque: 400,
        pullFactor: 2.5,
        direction: expect.closeTo(Math.PI, 12),
      },
    });
    expect(w).toEqual({ at: expect.closeTo(0.3, 12), weight: { mass: 85 } });
    expect(shaft.shock).toBe('none');
    expect(shaft.duty).toBeUndefined();
    expect(Object.keys(common).sort()).toEqual(['environment', 'life', 'lubrication', 'space', 'title']);
    expect(common.space).toEqual({ maxLength: '70 mm', maxOuterDiameter: '140 mm' });
    const fields = assumed.map((x) => x.field);
    expect(fields).toContain('shaft.supports[0].diameter');
    expect(fields).not.toContain('shaft.supports[1].diameter'); // the free side gives its own
    expect(fields).not.toContain('shaft.modulus');
  });

  it('assumes a steel modulus, a 20 deg spur gear and no shock when the case says nothing, and says so', () => {
    const text = ISSUE_EXAMPLE.replace('  modulus: 210 GPa\n', '').replace(
      'pressureAngle: 20 deg, helixAngle: 0 deg, ',
      '',
    );
    const { shaft, assumed } = shaftOf(text);
    expect(shaft.modulus).toBe(STEEL_MODULUS);
    expect(shaft.loads[1]).toMatchObject({ gear: { pressureAngle: expect.closeTo(20 * DEG, 12), helixAngle: 0 } });
    const fields = assumed.map((x) => x.field);
    for (const f of [
      'shaft.modulus',
      'shaft.loads[1].gear.pressureAngle',
      'shaft.loads[1].gear.helixAngle',
      'load.shock',
    ])
      expect(fields).toContain(f);
    expect(assumed.find((x) => x.field === 'shaft.modulus')!.reason).toMatch(/from memory/);
  });

  it('reads US units and the new kinds (mass, torque, modulus) by their definitions', () => {
    // NIST SP 811 (2008), Appendix B: 1 lb = 0.45359237 kg, 1 lbf = 4.4482216152605 N, 1 ft = 0.3048 m.
    expect(parseQuantity('190 lb', 'mass')).toBeCloseTo(190 * 0.45359237, 9);
    expect(parseQuantity('1800 lbf*ft', 'torque')).toBeCloseTo(1800 * 4.4482216152605 * 0.3048, 6);
    expect(parseQuantity('2.4 kN·m', 'torque')).toBeCloseTo(2400, 9);
    expect(parseQuantity('30e6 psi', 'modulus')).toBeCloseTo(30e6 * 6894.757293168, 0);
    expect(() => parseQuantity(85, 'mass', 'refused')).toThrow('85 has no unit; write 85 kg or 187.393 lb');
    expect(() => parseQuantity('2 m', 'torque')).toThrow(/expected a torque/);
  });

  it('orders segments by position and takes each seat diameter from the segment under the support', () => {
    const { shaft, assumed } = shaftOf(`
title: Stepped test shaft
shaft:
  speed: 300 rpm
  segments:
    - { from: 120 mm, to: 400 mm, diameter: 40 mm }
    - { from: 0 mm, to: 120 mm, diameter: 35 mm }
  supports:
    - { name: left, at: 20 mm, locates: one-direction }
    - { name: right, at: 380 mm, locates: one-direction, space: { maxLength: 25 mm, maxOuterDiameter: 90 mm } }
  loads:
    - { at: 200 mm, force: { z: 3 kN } }
life: { hours: 20000 h }
space: { maxLength: 30 mm, maxOuterDiameter: 80 mm }
`);
    expect(shaft.segments.map((s) => s.from)).toEqual([0, expect.closeTo(0.12, 12)]);
    expect(shaft.supports[0].diameter).toBeCloseTo(0.035, 12);
    expect(shaft.supports[1].diameter).toBeCloseTo(0.04, 12);
    expect(shaft.supports.map((s) => s.locates)).toEqual(['one-direction', 'one-direction']);
    expect(shaft.supports[0].space).toBeUndefined();
    expect(shaft.supports[1].space!.maxOuterDiameter).toBeCloseTo(0.09, 12);
    expect(shaft.loads[0]).toEqual({ at: expect.closeTo(0.2, 12), force: { y: 0, z: 3000 }, axial: 0 });
    expect(assumed.find((a) => a.field === 'shaft.supports[1].diameter')!.reason).toMatch(
      /segment from 120 mm to 400 mm/,
    );
  });

  it('duty points carry their own loads and speed; a point without loads takes the shaft loads', () => {
    const { shaft } = shaftOf(`
title: Two-speed test shaft
shaft:
  diameter: 30 mm
  supports:
    - { name: A, at: 0 mm, locates: true }
    - { name: B, at: 250 mm }
  loads:
    - { at: 125 mm, force: { y: -2 kN } }
duty:
  - { share: 0.25, speed: 900 rpm, loads: [ { at: 125 mm, force: { y: -4 kN } }, { at: 300 mm, chain: { pitchDiameter: 120 mm, torque: 90 N*m, pullFactor: 1.2, direction: 90 deg } } ] }
  - { share: 0.75, speed: 450 rpm }
life: { hours: 10000 h }
space: { maxLength: 20 mm, maxOuterDiameter: 60 mm }
`);
    expect(shaft.duty).toHaveLength(2);
    expect(shaft.duty![0]!.speed).toBeCloseTo(15, 12);
    expect(shaft.duty![0]!.loads).toHaveLength(2);
    expect(shaft.duty![0]!.loads[1]).toMatchObject({
      chain: { pullFactor: 1.2, direction: expect.closeTo(Math.PI / 2, 12) },
    });
    expect(shaft.duty![1]!.loads).toEqual(shaft.loads);
    expect(shaft.speed).toBeUndefined();
  });

  it('with units: base reads bare numbers in SI', () => {
    const { shaft, assumed } = shaftOf(`
units: base
title: Program-written test shaft
shaft:
  speed: 10
  diameter: 0.04
  modulus: 2.0e11
  supports: [ { name: A, at: 0, locates: true }, { name: B, at: 0.3 } ]
  loads: [ { at: 0.1, weight: { mass: 12 } }, { at: 0.2, gear: { pitchDiameter: 0.1, torque: 50, mesh: 1.5 } } ]
life: { hours: 5000 }
space: { maxLength: 0.03, maxOuterDiameter: 0.1 }
`);
    expect(shaft.speed).toBe(10);
    expect(shaft.modulus).toBe(2e11);
    expect(shaft.loads[1]).toMatchObject({ gear: { torque: 50, mesh: 1.5 } });
    expect(assumed.map((a) => a.field)).toContain('units');
  });

  it('a single-support case loads unchanged through the loader of either kind', () => {
    const single = `
title: Packaging line, film unwind spindle
shaft: { diameter: 1.25 in, speed: 600 rpm }
load: { radial: 450 lbf }
life: { hours: 30000 h }
space: { maxLength: 2 in, maxOuterDiameter: 2.5 in }
`;
    const r = parseAnyCaseText(single, 'one.yaml');
    expect(r.kind).toBe('single');
    expect(r.loaded).toEqual(parseCaseText(single, 'one.yaml'));
  });

  it('tells a shaft case by shaft.supports or shaft.loads', () => {
    expect(isShaftCase({ shaft: { supports: [] } })).toBe(true);
    expect(isShaftCase({ shaft: { loads: [] } })).toBe(true);
    expect(isShaftCase({ shaft: { diameter: '40 mm' } })).toBe(false);
    expect(isShaftCase({ shaft: [] })).toBe(false);
    expect(isShaftCase(null)).toBe(false);
  });
});
