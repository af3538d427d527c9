// Water-lubricated bushing classes (issue 14 fix round), each in an invented setting of our own.
// Guards the practice-matrix duties trawler-stern-tube, colliery-sump-pump-guide and
// tailings-agitator-steady: before, no class ran on the water it sits in, and water-resistant
// polymers were held to dry PV and wear limits times the contamination factor.
import { describe, expect, it } from 'vitest';
import { checkBushing } from '../../../src/calc/bushing/check.js';
import { describe as wordOf } from '../../../src/report/findings/index.js';
import { pumpCase } from '../../helpers/case.js';

/** A lake launch's propeller shaft running in lake water with silt. */
const launch = (medium: string, contamination = 'severe') =>
  pumpCase({
    title: 'Lake launch propeller shaft, aft bearing (invented)',
    shaft: { diameter: '40 mm', speed: '900 rpm' },
    load: { radial: '1.5 kN', axial: '0 N', shock: 'light' },
    life: { hours: '20000 h', wearAllowance: '0.8 mm' },
    space: { maxLength: '160 mm', maxOuterDiameter: '60 mm' },
    lubrication: { supply: 'none' },
    environment: { ambient: '10 degC', contamination, startsPerHour: 1, medium },
  });

describe('water-lubricated classes (guards: trawler-stern-tube, colliery-sump-pump-guide)', () => {
  it('need water: set aside with the reason where the case runs dry, chosen where it runs in water', () => {
    const dry = checkBushing(launch('dry'));
    for (const id of ['water-lubricated-rubber', 'water-lubricated-phenolic']) {
      const m = dry.materials.find((x) => x.id === id)!;
      expect(m.needs).toBe('water');
      expect(m.feasible, id).toBe(false);
      expect(m.checks.find((k) => k.id === 'lubricant-need')!.pass).toBe(false);
      expect(wordOf(m.reasons[0]!)).toMatch(/lubricated and cooled by the water it runs in.*medium is dry/);
    }
    const wet = checkBushing(launch('water'));
    expect(wet.best).toBe('water-lubricated-rubber');
    const rubber = wet.materials.find((x) => x.id === 'water-lubricated-rubber')!;
    expect(rubber.checks.some((k) => k.id === 'lubricant-need')).toBe(false);
  });

  it('the fluted rubber is checked at its own length practice (up to 4 diameters), the other classes at L/D <= 2', () => {
    const r = checkBushing(launch('water'));
    const rubber = r.materials.find((x) => x.id === 'water-lubricated-rubber')!;
    expect(rubber.length).toBeCloseTo(0.16, 9); // the whole 160 mm of room: L/D 4
    expect(r.materials.find((x) => x.id === 'acetal')!.length).toBeCloseTo(0.08, 9); // L/D 2
    expect(rubber.checks.find((k) => k.id === 'length-to-diameter')!.pass).toBe(true);
  });

  it('grit passes the rubber (no contamination factor); the hard phenolic face is held to it', () => {
    const r = checkBushing(launch('water', 'severe'));
    const rubber = r.materials.find((x) => x.id === 'water-lubricated-rubber')!;
    const phen = r.materials.find((x) => x.id === 'water-lubricated-phenolic')!;
    expect(rubber.factors.environment).toBe(1);
    expect(phen.factors.environment).toBe(10);
    // The rubber's life does not depend on the contamination the case names.
    const clean = checkBushing(launch('water', 'clean')).materials.find((x) => x.id === 'water-lubricated-rubber')!;
    expect(rubber.lifeHours).toBeCloseTo(clean.lifeHours, 6);
  });

  it('below the film-forming speed the rubber is advised against, not excluded', () => {
    const slow = pumpCase({
      shaft: { diameter: '40 mm', speed: '30 rpm' }, // 0.063 m/s, under 0.2 m/s
      load: { radial: '500 N', axial: '0 N', shock: 'light' },
      lubrication: { supply: 'none' },
      space: { maxLength: '80 mm', maxOuterDiameter: '60 mm' },
      environment: { ambient: '10 degC', contamination: 'normal', startsPerHour: 1, medium: 'water' },
    });
    const m = checkBushing(slow).materials.find((x) => x.id === 'water-lubricated-rubber')!;
    const k = m.checks.find((x) => x.id === 'min-velocity')!;
    expect(k.pass).toBe(false);
    expect(k.advisory).toBe(true);
  });
});

describe('slurry (guards: tailings-agitator-steady)', () => {
  it('in slurry the rubber is chosen and the hard phenolic composite is set aside', () => {
    const tank = pumpCase({
      title: 'Kaolin settling tank rake, bottom steady bush (invented)',
      shaft: { diameter: '70 mm', speed: '40 rpm' },
      load: { radial: '2 kN', axial: '0 N', shock: 'moderate' },
      life: { hours: '8000 h', wearAllowance: '2 mm' },
      space: { maxLength: '100 mm', maxOuterDiameter: '100 mm' },
      lubrication: { supply: 'none' },
      environment: { ambient: '15 degC', contamination: 'severe', startsPerHour: 1, medium: 'slurry' },
    });
    const r = checkBushing(tank);
    expect(r.best).toBe('water-lubricated-rubber');
    const phen = r.materials.find((x) => x.id === 'water-lubricated-phenolic')!;
    expect(phen.checks.find((k) => k.id === 'medium')!.pass).toBe(false);
    // The same tank in plain water keeps the phenolic in play.
    const water = checkBushing({ ...tank, environment: { ...tank.environment, medium: 'water' } });
    expect(
      water.materials.find((x) => x.id === 'water-lubricated-phenolic')!.checks.some((k) => k.id === 'medium'),
    ).toBe(false);
  });
});
