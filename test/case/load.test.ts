import { CaseError } from '../../src/core/errors.js';
// Case-file validation: schema errors name the field, the value and what was expected (contract keys).
import { describe, expect, it } from 'vitest';
import { parseCaseText, validateCase } from '../../src/case/load.js';

const good = `
title: Packaging line, film unwind spindle
shaft: { diameter: 1.25 in, speed: 600 rpm }
load: { radial: 450 lbf }
life: { hours: 30000 h }
space: { maxLength: 2 in, maxOuterDiameter: 2.5 in }
`;

function problems(text: string): string[] {
  try {
    parseCaseText(text, 't.yaml');
  } catch (e) {
    if (e instanceof CaseError) return e.problems.map((p) => `${p.field}: ${p.message}`);
    throw e;
  }
  return [];
}

describe('case loading', () => {
  it('reads US units into SI and lists every default as an assumption', () => {
    const { case: c, assumed } = parseCaseText(good);
    expect(c.shaft.diameter).toBeCloseTo(0.03175, 12);
    expect(c.shaft.speed).toBeCloseTo(10, 12);
    expect(c.load.radial / (450 * 4.4482216152605)).toBeCloseTo(1, 6); // js-quantities: lbf to 7 figures
    expect(c.space.maxOuterDiameter).toBeCloseTo(0.0635, 12);
    const fields = assumed.map((a) => a.field);
    for (const f of [
      'load.axial',
      'load.shock',
      'life.wearAllowance',
      'lubrication.supply',
      'environment.contamination',
      'priorities.cost',
    ]) {
      expect(fields).toContain(f);
    }
    expect(c.load.axial).toBe(0);
    expect(c.lubrication.supply).toBe('none');
  });

  it('gives the same SI case whether written in SI or US units', () => {
    const si = parseCaseText(
      good
        .replace('1.25 in', '31.75 mm')
        .replace('450 lbf', `${450 * 4.4482216152605} N`)
        .replace('2 in', '50.8 mm')
        .replace('2.5 in', '63.5 mm'),
    ).case;
    const us = parseCaseText(good).case;
    expect(si.shaft.diameter).toBeCloseTo(us.shaft.diameter, 12);
    expect(si.load.radial / us.load.radial).toBeCloseTo(1, 6);
    expect(si.space.maxLength).toBeCloseTo(us.space.maxLength, 12);
  });

  it('reports every problem in the file, each naming its field', () => {
    const p = problems(`
title: bad
shaft: { diameter: 40 kg, speed: -5 rpm, colour: red }
load: { radial: 0 N, shock: big }
life: { hours: .nan }
space: { maxLength: 60 mm }
extra: 1
`);
    expect(p).toEqual(
      expect.arrayContaining([
        expect.stringMatching(/^shaft\.diameter: "40 kg" is a mass; expected a length/),
        expect.stringMatching(/^shaft\.speed: got "-5 rpm"; expected a value greater than zero/),
        expect.stringMatching(/^shaft: unknown key "colour"/),
        expect.stringMatching(/^load\.radial: got "0 N"; expected a value greater than zero/),
        expect.stringMatching(/^load\.shock: got "big"; expected one of: none, light, moderate, heavy/),
        expect.stringMatching(/^life\.hours: got NaN; expected a finite number/),
        expect.stringMatching(/^space\.maxOuterDiameter: missing/),
        expect.stringMatching(/^\(file\): unknown key "extra"/),
      ]),
    );
    expect(p).toHaveLength(8);
  });

  it('checks rules across fields: shares adding to 1, one motion, known oil grade and material', () => {
    const p = problems(`
title: cross
shaft: { diameter: 40 mm, speed: 100 rpm, oscillation: { angle: 30 deg, frequency: 1 Hz } }
duty:
  - { share: 0.5, radial: 1 kN }
  - { share: 0.3, radial: 2 kN }
life: { hours: 1000 h }
space: { maxLength: 40 mm, maxOuterDiameter: 60 mm }
lubrication: { supply: oil-bath, oil: ISO VG 69 }
bushing: { material: unobtainium }
`);
    expect(p.join('\n')).toMatch(/shaft: gives both speed and oscillation/);
    expect(p.join('\n')).toMatch(/duty: shares add up to 0\.8; expected them to add up to 1/);
    expect(p.join('\n')).toMatch(/lubrication\.oil: got ISO VG 69; expected one of the grades/);
    expect(p.join('\n')).toMatch(/bushing\.material: got "unobtainium"/);
  });

  it('rejects text that is not YAML/JSON, binary data and a top level that is not a mapping', () => {
    expect(problems('title: [unclosed')[0]).toMatch(/^\(file\): is not valid YAML or JSON/);
    expect(problems('ab\u0000cd')[0]).toMatch(/binary data/);
    expect(problems('- a\n- b')[0]).toMatch(/holds a list; expected a mapping/);
    expect(problems('')[0]).toMatch(/holds nothing/);
  });

  it('refuses a YAML alias bomb instead of expanding it', () => {
    const bomb = [
      'a: &a [x,x,x,x,x,x,x,x,x]',
      ...Array.from(
        { length: 8 },
        (_, i) => `${'bcdefghi'[i]}: &${'bcdefghi'[i]} [${Array(9).fill(`*${'abcdefgh'[i]}`).join(',')}]`,
      ),
    ].join('\n');
    expect(problems(bomb)[0]).toMatch(/^\(file\): is not valid YAML or JSON/);
  });

  it('accepts an inline bushing material with units', () => {
    const { case: c } = validateCase({
      title: 'inline',
      shaft: { diameter: '20 mm', speed: '60 rpm' },
      load: { radial: '500 N' },
      life: { hours: '2000 h' },
      space: { maxLength: '30 mm', maxOuterDiameter: '40 mm' },
      bushing: {
        material: {
          id: 'shop-bronze',
          name: 'Shop bronze',
          maxPressure: '10 MPa',
          maxVelocity: '1 m/s',
          maxPV: '1 MPa*m/s',
          wearFactor: '1e-7 mm^3/(N*m)',
          friction: 0.1,
          maxTemperature: '90 degC',
          source: 'supplier sheet',
        },
      },
    });
    const m = c.bushing!.material as { maxPV: number; wearFactor: number };
    expect(m.maxPV).toBe(1e6);
    expect(m.wearFactor).toBeCloseTo(1e-16, 24);
  });
});
