// Bad shaft cases: one clear message each, naming the field, the value and what was expected.
import { describe, expect, it } from 'vitest';
import { CaseError } from '../../src/core/errors.js';
import { parseAnyCaseText } from '../../src/case/shaft-load.js';

/** A good shaft case of our own (a conveyor test drum); each test breaks one thing in it. */
const GOOD = {
  title: 'Test drum shaft',
  shaft: {
    speed: '120 rpm',
    segments: [
      { from: '0 mm', to: '100 mm', diameter: '45 mm' },
      { from: '100 mm', to: '700 mm', diameter: '55 mm' },
      { from: '700 mm', to: '800 mm', diameter: '45 mm' },
    ],
    supports: [
      { name: 'near', at: '50 mm', locates: true },
      { name: 'far', at: '750 mm' },
    ],
    loads: [
      { at: '400 mm', force: { y: '-5 kN' } },
      { at: '790 mm', gear: { pitchDiameter: '200 mm', torque: '300 N*m', mesh: '90 deg' } },
    ],
  },
  life: { hours: '30000 h' },
  space: { maxLength: '40 mm', maxOuterDiameter: '120 mm' },
};

type Edit = (c: typeof GOOD & Record<string, unknown>) => void;

function problems(edit: Edit): string[] {
  const c = structuredClone(GOOD) as typeof GOOD & Record<string, unknown>;
  edit(c);
  try {
    parseAnyCaseText(JSON.stringify(c), 't.json');
  } catch (e) {
    if (e instanceof CaseError) return e.problems.map((p) => `${p.field}: ${p.message}`);
    throw e;
  }
  return [];
}

const sup = (c: typeof GOOD) => c.shaft.supports as Record<string, unknown>[];
const loads = (c: typeof GOOD) => c.shaft.loads as Record<string, unknown>[];

describe('bad shaft cases', () => {
  it('the good case loads', () => {
    expect(problems(() => {})).toEqual([]);
  });

  const cases: [string, Edit, RegExp][] = [
    [
      'supports at the same position',
      (c) => (sup(c)[1]!.at = '50 mm'),
      /^shaft\.supports\[1\]\.at: got 50 mm, the position of shaft\.supports\[0\] \("near"\); expected the two supports at different positions$/,
    ],
    [
      'a load without a position',
      (c) => delete loads(c)[0]!.at,
      /^shaft\.loads\[0\]\.at: missing; expected a position along the shaft axis such as "450 mm"/,
    ],
    [
      'a gap between segments',
      (c) => (c.shaft.segments[1]!.from = '110 mm'),
      /^shaft\.segments\[1\]: starts at 110 mm, a gap of 10 mm after the segment from 0 mm to 100 mm; expected segments that meet end to end$/,
    ],
    [
      'overlapping segments',
      (c) => (c.shaft.segments[2]!.from = '650 mm'),
      /^shaft\.segments\[2\]: starts at 650 mm, overlapping the segment from 100 mm to 700 mm by 50 mm; expected segments that meet end to end$/,
    ],
    [
      'a segment ending before it starts',
      (c) => (c.shaft.segments[0]!.to = '0 mm'),
      /^shaft\.segments\[0\]: runs from 0 mm to 0 mm; expected "to" beyond "from"$/,
    ],
    [
      'a load outside the segments',
      (c) => (loads(c)[1]!.at = '850 mm'),
      /^shaft\.loads\[1\]\.at: got 850 mm, outside the shaft's segments \(0 mm to 800 mm\); expected a position on the shaft/,
    ],
    [
      'a support outside the segments',
      (c) => (sup(c)[0]!.at = '-20 mm'),
      /^shaft\.supports\[0\]\.at: got -20 mm, outside the shaft's segments \(0 mm to 800 mm\)/,
    ],
    [
      'no locating support',
      (c) => delete sup(c)[0]!.locates,
      /^shaft\.supports: no support locates the shaft axially; expected one support with locates: true, or both one-direction/,
    ],
    [
      'only one support located one way',
      (c) => (sup(c)[0]!.locates = 'one-direction'),
      /^shaft\.supports: only one support locates one way; the shaft has no locating support for thrust the other way/,
    ],
    [
      'both supports locating',
      (c) => (sup(c)[1]!.locates = true),
      /^shaft\.supports: both supports say locates: true; the shaft would be over-constrained axially/,
    ],
    [
      'one support locating both ways, the other one way',
      (c) => (sup(c)[1]!.locates = 'one-direction'),
      /^shaft\.supports: one support locates both ways and the other one way; the shaft would be over-constrained axially/,
    ],
    [
      'a bad locates value',
      (c) => (sup(c)[1]!.locates = 'yes'),
      /^shaft\.supports\[1\]\.locates: got "yes"; expected true \(takes the axial load both ways\), false \(free to float\) or one-direction/,
    ],
    [
      'three supports',
      (c) => sup(c).push({ name: 'middle', at: '400 mm' }),
      /^shaft\.supports: got 3 supports; expected exactly two \(the shaft is a beam on two supports\)$/,
    ],
    ['one support', (c) => sup(c).pop(), /^shaft\.supports: got 1 support; expected exactly two/],
    [
      'a load of two kinds',
      (c) => (loads(c)[1]!.belt = { pitchDiameter: '150 mm', torque: '300 N*m', pullFactor: 2, direction: '0 deg' }),
      /^shaft\.loads\[1\]: gives both gear and belt; expected one of force, gear, belt, chain, weight per load/,
    ],
    [
      'a load of no kind',
      (c) => delete loads(c)[0]!.force,
      /^shaft\.loads\[0\]: gives none of force, gear, belt, chain, weight; expected one of them$/,
    ],
    [
      'an axial force beside a gear',
      (c) => (loads(c)[1]!.axial = '1 kN'),
      /^shaft\.loads\[1\]\.axial: given with a gear; expected axial only beside force/,
    ],
    [
      'an unknown key in a load',
      (c) => (loads(c)[0]!.torque = '5 N*m'),
      /^shaft\.loads\[0\]: unknown key "torque"; expected one of: at, force, axial, gear, belt, chain, weight$/,
    ],
    [
      'a radial load on a shaft case',
      (c) => (c.load = { radial: '3 kN' }),
      /^load: unknown key "radial"; expected one of: shock$/,
    ],
    [
      'a bare number for a mass',
      (c) => (loads(c)[0] = { at: '300 mm', weight: { mass: 40 } }),
      /^shaft\.loads\[0\]\.weight\.mass: 40 has no unit; write 40 kg or/,
    ],
    [
      'a length for a torque',
      (c) => ((loads(c)[1]!.gear as Record<string, unknown>).torque = '300 mm'),
      /^shaft\.loads\[1\]\.gear\.torque: "300 mm" is a length; expected a torque/,
    ],
    [
      'no space for a support',
      (c) => delete (c as Record<string, unknown>).space,
      /^space: missing; expected a mapping with keys: maxLength, maxOuterDiameter \(or a space on every support/,
    ],
    [
      'a housing no larger than the seat',
      (c) => (sup(c)[1]!.space = { maxLength: '30 mm', maxOuterDiameter: '40 mm' }),
      /^shaft\.supports\[1\]\.space\.maxOuterDiameter: got 40 mm, not more than the seat diameter 45 mm of "far"/,
    ],
    [
      'no diameter and no segments',
      (c) => delete (c.shaft as Record<string, unknown>).segments,
      /^shaft\.diameter: missing; expected a length such as "60 mm" \(or shaft\.segments/,
    ],
    [
      'no loads anywhere',
      (c) => delete (c.shaft as Record<string, unknown>).loads,
      /^shaft\.loads: missing; expected a list of loads/,
    ],
    [
      'an oil grade not in the tables',
      (c) => (c.lubrication = { supply: 'oil-bath', oil: 'ISO VG 67' }),
      /^lubrication\.oil: got ISO VG 67; expected one of the grades/,
    ],
    [
      'a rolling bore that fits one support only',
      (c) => {
        sup(c)[1]!.at = '650 mm'; // on the 55 mm segment; the near support sits on 45 mm
        c.rolling = { bore: '45 mm' };
      },
      /^rolling\.bore: got 45 mm; expected the shaft diameter 55 mm \(the bearing's bore sits on the shaft\) \(for "far"\)$/,
    ],
  ];
  for (const [what, edit, expected] of cases) {
    it(what, () => {
      const got = problems(edit);
      expect(got.length, got.join('\n')).toBeGreaterThan(0);
      expect(
        got.some((p) => expected.test(p)),
        got.join('\n'),
      ).toBe(true);
    });
  }

  it('one problem, one message: a shared problem is reported once, not per support', () => {
    const got = problems((c) => (c.lubrication = { supply: 'oil-bath', oil: 'ISO VG 67' }));
    expect(got).toHaveLength(1);
  });
});
