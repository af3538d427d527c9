/**
 * The journal bearing's thrust path (src/calc/journal/thrust.ts) inside checkJournal: which path
 * carries the axial load and why, its 'thrust-' checks among the journal's, and the regression of
 * issue 14 (a worm shaft with 4 kN of thrust was once recommended a journal with no thrust check).
 * Cases invented: the worm shaft of a bottle-capping machine's indexing drive.
 */
import { describe, expect, it } from 'vitest';
import { checkJournal } from '../../../src/calc/journal/check.js';
import { padRing } from '../../../src/calc/journal/thrust.js';
import { parseCaseText } from '../../../src/case/load.js';
import { allLimitsPass } from '../../../src/core/check.js';
import { thrustPadRules, thrustPadsSchema } from '../../../src/data/thrust-pads.js';
import { readFileSync } from 'node:fs';

/** Worm shaft, 40 mm, 1450 rpm, 4 kN of tooth thrust one way, splashed by the gearbox's oil bath. */
const WORM = `
title: Bottle-capping indexer, worm shaft locating support
shaft: { diameter: 40 mm, speed: 1450 rpm }
load: { radial: 1.5 kN, axial: 4 kN, shock: light }
life: { hours: 20000 h, wearAllowance: 0.05 mm }
space: { maxLength: 50 mm, maxOuterDiameter: 100 mm }
lubrication: { supply: oil-bath, oil: ISO VG 220, inletTemperature: 55 degC }
environment: { ambient: 25 degC, contamination: normal, startsPerHour: 2 }
priorities: { cost: 3, friction: 3, maintenance: 3, noise: 3, precision: 3 }
`;
const load = (text: string) => parseCaseText(text, 'test').case;
const worm = load(WORM);

describe('journal thrust path', () => {
  it('worm shaft with 4 kN of thrust (issue 14 regression): the journal carries it on pads and says so, or is excluded by a thrust check', () => {
    const r = checkJournal(worm);
    const thrust = r.checks.filter((k) => k.id.startsWith('thrust-'));
    expect(thrust.map((k) => k.id)).toEqual([
      'thrust-film',
      'thrust-temperature',
      'thrust-unit-load',
      'thrust-axial-room',
    ]);
    expect(r.thrust?.path).toBe('pad');
    expect(r.assumed.some((a) => a.code === 'journal.thrust-pad')).toBe(true);
    expect(r.assumed.some((a) => a.code === 'journal.axial-not-carried')).toBe(false);
    if (!allLimitsPass(thrust)) expect(r.feasible).toBe(false);
    // The journal was designed in the room left by the collar.
    expect(r.length + r.thrust!.axialThickness).toBeLessThanOrEqual(worm.space.maxLength + 1e-12);
    const pad = r.thrust!.pad!;
    const g = pad.points[pad.governingPoint]!;
    // Unit load Fa/(N·A) and the power loss are reported as computed.
    expect(thrust.find((k) => k.id === 'thrust-unit-load')!.value).toBeCloseTo(g.unitLoad, 6);
    expect(g.powerLoss).toBeGreaterThan(0);
    // The option's mean power covers the thrust pads too (one point, share 1).
    expect(r.thrust!.meanPowerLoss).toBeCloseTo(g.powerLoss, 9);
    expect(r.meanPowerLoss).toBeCloseTo(r.points[0]!.powerLoss + g.powerLoss, 9);
    expect(r.sheet.some((l) => l.label === 'Thrust pad minimum film h_min')).toBe(true);
  });

  it('excludes the journal naming the thrust check when the pads cannot carry the thrust', () => {
    const heavy = load(WORM.replace('axial: 4 kN', 'axial: 40 kN'));
    const r = checkJournal(heavy);
    expect(r.feasible).toBe(false);
    const failing = r.checks.filter((k) => !k.pass && !k.advisory).map((k) => k.id);
    expect(failing.some((id) => id.startsWith('thrust-'))).toBe(true);
  });

  it('takes a rubbing face where no film can form: grease, and an oscillating shaft', () => {
    const greased = checkJournal(load(WORM.replace('supply: oil-bath, oil: ISO VG 220', 'supply: grease')));
    expect(greased.thrust?.path).toBe('rubbing');
    expect(greased.thrust?.reason).toBe('grease');
    expect(greased.checks.map((k) => k.id)).toEqual(
      expect.arrayContaining(['thrust-pressure', 'thrust-pv', 'thrust-wear-life']),
    );
    const rocking = checkJournal(
      load(WORM.replace('speed: 1450 rpm', 'oscillation: { angle: 60 deg, frequency: 0.5 Hz }')),
    );
    expect(rocking.thrust?.path).toBe('rubbing');
    expect(rocking.thrust?.reason).toBe('no-rotation');
    expect(rocking.assumed.find((a) => a.code === 'journal.thrust-rubbing')?.values['reason']).toBe('no-rotation');
  });

  it('falls back to a rubbing face when the pads run too thin at a slow speed and the face passes', () => {
    const slow = load(WORM.replace('speed: 1450 rpm', 'speed: 1 rpm'));
    const r = checkJournal(slow);
    expect(r.thrust?.path).toBe('rubbing');
    expect(r.thrust?.reason).toBe('pad-film-thin');
    expect(allLimitsPass(r.checks.filter((k) => k.id.startsWith('thrust-')))).toBe(true);
  });

  it('has no thrust path without axial load', () => {
    const r = checkJournal(load(WORM.replace('axial: 4 kN', 'axial: 0 N')));
    expect(r.thrust).toBeNull();
    expect(r.checks.some((k) => k.id.startsWith('thrust-'))).toBe(false);
  });

  it('lays the pad ring out in the radial space (data/thrust-pads.json, common practice)', () => {
    const rules = thrustPadRules();
    const ring = padRing(0.04, 0.1, rules)!;
    expect(ring.inner).toBeCloseTo(rules.innerToShaft * 0.04, 12);
    expect(ring.outer).toBeCloseTo(Math.min(0.1, rules.outerToInner * ring.inner), 12);
    expect(ring.pads * ring.padAngle).toBeCloseTo(rules.padCoverage * 2 * Math.PI, 12);
    // Near-square pads: mean arc length within a third of the radial width.
    const arc = ((ring.inner + ring.outer) / 4) * ring.padAngle;
    expect(Math.abs(arc / ((ring.outer - ring.inner) / 2) - 1)).toBeLessThan(0.34);
    expect(padRing(0.04, 0.045, rules)).toBeNull();
  });

  it('data/thrust-pads.json passes its schema', () => {
    const raw: unknown = JSON.parse(readFileSync(new URL('../../../data/thrust-pads.json', import.meta.url), 'utf8'));
    expect(thrustPadsSchema.safeParse(raw).success).toBe(true);
  });
});

describe('rubbing thrust face life over a duty', () => {
  it('a face loaded half the time lasts twice as long as one loaded all the time (damage over the whole duty)', () => {
    // Linear damage: t = 1/Σ(share_i/t_i) with shares of the whole duty; a point with no axial
    // load adds no wear (Palmgren–Miner, as the bushing's thrust face sums it).
    const greased = (duty: string) =>
      checkJournal(
        load(
          WORM.replace('supply: oil-bath, oil: ISO VG 220, inletTemperature: 55 degC', 'supply: grease').replace(
            'load: { radial: 1.5 kN, axial: 4 kN, shock: light }',
            `load: { radial: 1.5 kN, axial: 0 N, shock: light }\n${duty}`,
          ),
        ),
        { sheet: false, pressureProfile: false },
      ).thrust!.rubbing!.lifeHours;
    const always = greased('duty: [{ share: 1, radial: 1.5 kN, axial: 1 kN, speed: 200 rpm }]');
    const half = greased(
      'duty: [{ share: 0.5, radial: 1.5 kN, axial: 1 kN, speed: 200 rpm }, { share: 0.5, radial: 1.5 kN, axial: 0 N, speed: 200 rpm }]',
    );
    expect(Number.isFinite(always)).toBe(true);
    expect(half / always).toBeCloseTo(2, 9);
  });
});
