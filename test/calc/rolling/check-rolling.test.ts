// Kind: behaviour of checkRolling on invented cases (a carton-packaging line of our own),
// consistency with the kernels' formulas, and bad inputs that must give warnings or
// exclusions, never a crash, NaN or Infinity.
import { describe, expect, it } from 'vitest';
import type { CaseSI } from '../../../src/case/types.js';
import { checkRolling as rollingKernel } from '../../../src/calc/rolling/index.js';
import { worded } from '../../../src/report/findings/worded.js';
import { allFinite } from '../../helpers/finite.js';

/** The kernel's result with its findings worded, as the JSON and the text print them. */
const checkRolling = (c: CaseSI) => worded(rollingKernel(c));

/** Head shaft of a carton conveyor on a packaging line (invented): 35 mm shaft, 180 r/min. */
function conveyorShaft(over: Partial<CaseSI> = {}): CaseSI {
  return {
    title: 'carton conveyor head shaft',
    shaft: { diameter: 0.035, speed: 180 / 60 },
    load: { radial: 2400, axial: 300, shock: 'light' },
    life: { hours: 30000, wearAllowance: 0.0002, reliability: 90 },
    space: { maxLength: 0.03, maxOuterDiameter: 0.085 },
    lubrication: { supply: 'grease', inletTemperature: 25 },
    environment: { ambient: 25, contamination: 'normal', startsPerHour: 4 },
    priorities: { cost: 3, friction: 3, maintenance: 3, noise: 3, precision: 3 },
    ...over,
  };
}

describe('carton conveyor head shaft', () => {
  const r = checkRolling(conveyorShaft());

  it('has the contract keys', () => {
    for (const k of [
      'option',
      'equivalentLoad',
      'equivalentSpeed',
      'requiredDynamicRating',
      'candidates',
      'best',
      'assumed',
      'warnings',
      'feasible',
      'sheet',
    ]) {
      expect(r).toHaveProperty(k);
    }
    expect(r.option).toBe('rolling');
    for (const k of [
      'id',
      'type',
      'series',
      'bore',
      'outerDiameter',
      'width',
      'dynamicRating',
      'staticRating',
      'ratingSource',
      'X',
      'Y',
      'L10',
      'L10h',
      'aISO',
      'kappa',
      'L10mh',
      's0',
      'ndm',
      'frictionPower',
      'feasible',
      'checks',
    ]) {
      expect(r.candidates[0]).toHaveProperty(k);
    }
    expect(allFinite(r)).toBe(true);
  });

  it('lists the bearings of bore 35 of every kind that fit 85 mm × 30 mm, with estimated ratings', () => {
    const ids = r.candidates.map((k) => k.id);
    expect(ids).toEqual(expect.arrayContaining(['cyl-02-35', 'dgb-02-35', 'dgb-03-35', 'tap-302-35', 'sph-22-35']));
    expect(new Set(r.candidates.map((k) => k.kind)).size).toBe(7);
    expect(r.candidates.every((k) => k.ratingSource === 'estimated' && k.bore === 0.035)).toBe(true);
    expect(r.candidates.every((k) => k.outerDiameter! <= 0.085 && k.width! <= 0.03)).toBe(true);
  });

  it('rules the cylindrical roller bearing out for the 300 N axial load, with the reason', () => {
    const cyl = r.candidates.find((k) => k.id === 'cyl-02-35')!;
    expect(cyl.feasible).toBe(false);
    expect(cyl.exclusions.join(' ')).toMatch(/no axial load/);
  });

  it('picks the least costly feasible kind (a deep-groove ball bearing), then the smallest', () => {
    expect(r.best).toBe('dgb-02-35'); // series 10 misses the life target here
    expect(r.chosen?.kind).toBe('deep-groove ball');
    expect(r.feasible).toBe(true);
  });

  it('its figures follow the ISO 281 formulas from its own C, P and speed', () => {
    const k = r.candidates.find((q) => q.id === r.best)!;
    // Fa/Fr = 0.125 is below e (≥ 0.19 everywhere in the table): P = f_d·Fr = 1.2·2400
    expect(k.X).toBe(1);
    expect(k.Y).toBe(0);
    expect(k.equivalentLoad).toBeCloseTo(2880, 9);
    expect(k.L10).toBeCloseTo(Math.pow(k.dynamicRating / 2880, 3), 9);
    expect(k.L10h).toBeCloseTo((1e6 * k.L10!) / (60 * 180), 6);
    expect(k.L10mh).toBeCloseTo(k.a1 * k.aISO! * k.L10h!, 6);
    expect(k.s0).toBeCloseTo(k.staticRating / 2400, 9); // P0 = max(0.6·2400 + 0.5·300, 2400) = 2400
    expect(k.ndm).toBeCloseTo(180 * k.pitchDiameter * 1000, 6);
    expect(r.equivalentSpeed).toBeCloseTo(3, 12);
    expect(r.requiredDynamicRating).toBeCloseTo(2880 * Math.cbrt((30000 * 60 * 180) / 1e6), 6);
  });

  it('states the grease base oil, temperature, e_C and service factor it assumed', () => {
    const fields = r.assumed.map((a) => a.field);
    expect(fields).toEqual(
      expect.arrayContaining([
        'load.shock',
        'rolling.temperature',
        'lubrication.oilGrade',
        'environment.contamination',
        'rolling.ratings',
      ]),
    );
    expect(r.candidates[0]!.relubricationHours).toBeGreaterThan(0);
  });

  it('writes a sheet of formulas with substituted values', () => {
    expect(r.sheet.length).toBeGreaterThan(5);
    expect(r.sheet.find((l) => l.label.startsWith('Basic rating life L10'))!.substituted).toMatch(/\^3/);
  });

  it('a heavier load needs a larger bearing, and a far heavier one leaves none, with reasons', () => {
    const heavier = checkRolling(conveyorShaft({ load: { radial: 4500, axial: 0, shock: 'light' } }));
    expect(heavier.best).not.toBe('dgb-02-35');
    const none = checkRolling(conveyorShaft({ load: { radial: 40000, axial: 0, shock: 'heavy' } }));
    expect(none.best).toBeNull();
    expect(none.feasible).toBe(false);
    expect(none.warnings.some((w) => /not suitable/.test(w))).toBe(true);
  });
});

describe('duty spectrum', () => {
  it('uses the ISO 281 mean load over revolutions and the time-weighted mean speed', () => {
    const c = conveyorShaft({
      load: { radial: 0, axial: 0, shock: 'none' },
      duty: [
        { share: 0.6, radial: 2000, axial: 0, speed: 3 },
        { share: 0.3, radial: 3500, axial: 0, speed: 1.5 },
        { share: 0.1, radial: 500, axial: 0, speed: 0 },
      ],
    });
    const r = checkRolling(c);
    // Σ n·t = 1.8 + 0.45 = 2.25 rev/s; Σ P³·n·t = 2000³·1.8 + 3500³·0.45 = 1.44e10 + 1.9294e10
    const P = Math.cbrt((2000 ** 3 * 1.8 + 3500 ** 3 * 0.45) / 2.25);
    expect(r.equivalentSpeed).toBeCloseTo(2.25, 12);
    expect(r.candidates[0]!.equivalentLoad).toBeCloseTo(P, 6);
    // static safety from the peak point
    expect(r.candidates[0]!.staticEquivalentLoad).toBe(3500);
  });
});

describe('supplier bearing', () => {
  it('comes first, rated "supplier", dimensions from the smallest table row of its kind and bore', () => {
    const r = checkRolling(conveyorShaft({ rolling: { type: 'ball', dynamicRating: 25500, staticRating: 15300 } }));
    const s = r.candidates[0]!;
    expect(s.id).toBe('supplier');
    expect(s.ratingSource).toBe('supplier');
    expect(s.dynamicRating).toBe(25500);
    expect(s.kind).toBe('deep-groove ball');
    expect(s.outerDiameter).toBeCloseTo(0.062, 12); // ISO 15 dimension series 10, bore 35: 62 mm
    expect(r.candidates.length).toBeGreaterThan(1);
  });
  it('C0 well above C for a ball bearing is questioned in a warning', () => {
    const r = checkRolling(conveyorShaft({ rolling: { type: 'ball', dynamicRating: 20000, staticRating: 45000 } }));
    expect(r.warnings.some((w) => /C0\/C = 2\.25/.test(w))).toBe(true);
  });
  it('only one of C and C0: not used, with a warning', () => {
    const r = checkRolling(conveyorShaft({ rolling: { dynamicRating: 20000 } }));
    expect(r.candidates.some((k) => k.id === 'supplier')).toBe(false);
    expect(r.warnings.some((w) => /needs both/.test(w))).toBe(true);
  });
});

describe('bad or awkward inputs give warnings or exclusions, not crashes', () => {
  it('axial load beyond the X/Y table excludes the deep-groove ball bearings', () => {
    const r = checkRolling(conveyorShaft({ load: { radial: 1000, axial: 12000, shock: 'none' } }));
    const balls = r.candidates.filter((k) => k.kind === 'deep-groove ball');
    expect(balls.length).toBeGreaterThan(0);
    for (const k of balls) {
      expect(k.feasible).toBe(false);
      expect(k.exclusions.join(' ')).toMatch(/beyond the end of the ISO 281 X\/Y table/);
    }
    expect(allFinite(r)).toBe(true);
  });
  it('a shaft diameter that is not a standard bore names the nearest bores', () => {
    const r = checkRolling(conveyorShaft({ shaft: { diameter: 0.037, speed: 3 } }));
    expect(r.candidates).toHaveLength(0);
    expect(r.warnings.some((w) => /is not a bore .*nearest: 35 and \d+ mm/.test(w))).toBe(true);
    expect(r.best).toBeNull();
    expect(r.equivalentLoad).not.toBeNull();
    expect(allFinite(r)).toBe(true);
  });
  it('sizes that do not fit the space are not listed; the warning says how many and why', () => {
    const r = checkRolling(conveyorShaft({ space: { maxLength: 0.03, maxOuterDiameter: 0.075 } }));
    expect(r.candidates.map((k) => k.id)).not.toContain('dgb-03-35');
    expect(
      r.warnings.some((w) => /^\d+ bearing\(s\) of this bore excluded by the space available: .*D > 75 mm/.test(w)),
    ).toBe(true);
  });
  it('κ below 0.1 (thin oil, slow shaft): a warning and an advisory check that fails, never an exclusion', () => {
    const r = checkRolling(
      conveyorShaft({
        shaft: { diameter: 0.035, speed: 0.2 },
        lubrication: { supply: 'oil-bath', viscosity: 0.002, inletTemperature: 25 },
      }),
    );
    const k = r.candidates[0]!;
    expect(k.kappa!).toBeLessThan(0.1);
    expect(k.checks.find((x) => x.id === 'viscosity-ratio')!.pass).toBe(false);
    expect(k.checks.find((x) => x.id === 'viscosity-ratio')!.advisory).toBe(true);
    expect(r.warnings.some((w) => /κ = .* < 0\.1 is outside the a_ISO method/.test(w))).toBe(true);
    expect(allFinite(r)).toBe(true);
  });
  it('κ above 4 (thick oil): taken as 4, with a warning', () => {
    const r = checkRolling(conveyorShaft({ lubrication: { supply: 'oil-bath', oilGrade: 460, inletTemperature: 25 } }));
    expect(Math.max(...r.candidates.map((k) => k.kappa!))).toBeGreaterThan(4);
    expect(r.warnings.some((w) => /> 4 is taken as 4/.test(w))).toBe(true);
  });
  it('a shaft that does not turn: lives null, static safety still checked, no NaN', () => {
    const r = checkRolling(conveyorShaft({ shaft: { diameter: 0.035, speed: 0 } }));
    const k = r.candidates[0]!;
    expect(k.L10h).toBeNull();
    expect(k.L10mh).toBeNull();
    expect(k.s0).not.toBeNull();
    expect(r.requiredDynamicRating).toBeNull();
    expect(r.warnings.some((w) => /does not turn/.test(w))).toBe(true);
    expect(allFinite(r)).toBe(true);
  });
  it('no load at all: nulls where nothing is defined, no NaN', () => {
    const r = checkRolling(conveyorShaft({ load: { radial: 0, axial: 0, shock: 'none' } }));
    expect(r.candidates[0]!.L10).toBeNull();
    expect(r.candidates[0]!.s0).toBeNull();
    expect(allFinite(r)).toBe(true);
  });
  it('a non-positive shaft diameter gives a warning and no candidates', () => {
    const r = checkRolling(conveyorShaft({ shaft: { diameter: 0, speed: 3 } }));
    expect(r.candidates).toHaveLength(0);
    expect(r.warnings.some((w) => /not a positive number/.test(w))).toBe(true);
    expect(allFinite(r)).toBe(true);
  });
  it('reliability outside 90..99.95 % is held to the range with a warning', () => {
    const r = checkRolling(conveyorShaft({ life: { hours: 30000, wearAllowance: 0, reliability: 80 } }));
    expect(r.candidates[0]!.a1).toBe(1);
    expect(r.warnings.some((w) => /reliability 80 %/.test(w))).toBe(true);
  });
});

describe('oscillating shaft and no lubricant supply', () => {
  it('small swing: equivalent speed θ·f/π, and a false-brinelling warning', () => {
    const theta = (10 * Math.PI) / 180;
    const r = checkRolling(
      conveyorShaft({
        shaft: { diameter: 0.035, oscillation: { angle: theta, frequency: 2 } },
        load: { radial: 2400, axial: 0, shock: 'light' },
      }),
    );
    expect(r.equivalentSpeed).toBeCloseTo((theta * 2) / Math.PI, 12);
    expect(r.warnings.some((w) => /false brinelling and fretting/.test(w))).toBe(true);
    expect(r.candidates[0]!.criticalSwingAngle).toBeGreaterThan(theta);
  });
  it('a wide swing raises no such warning', () => {
    const r = checkRolling(
      conveyorShaft({
        shaft: { diameter: 0.035, oscillation: { angle: Math.PI, frequency: 1 } },
        load: { radial: 2400, axial: 0, shock: 'light' },
      }),
    );
    expect(r.warnings.some((w) => /false brinelling/.test(w))).toBe(false);
  });
  it('supply "none" is read as a sealed-for-life greased bearing whose grease life is checked', () => {
    const r = checkRolling(conveyorShaft({ lubrication: { supply: 'none', inletTemperature: 25 } }));
    expect(r.assumed.find((a) => a.field === 'lubrication.supply')!.value).toMatch(/sealed-for-life grease/);
    expect(r.candidates[0]!.checks.some((x) => x.id === 'grease-life')).toBe(true);
  });
});
