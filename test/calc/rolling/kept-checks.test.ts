// Kind: the check records kept across calls (space and temperature checks, which read neither
// load nor speed) follow the case: a change of room, temperature or supply between two calls
// gives the records of a fresh process. Invented case: a 40 mm conveyor idler shaft.
import { describe, expect, it } from 'vitest';
import type { CaseSI } from '../../../src/case/types.js';
import { checkRolling } from '../../../src/calc/rolling/index.js';

function idler(over: Partial<CaseSI> = {}): CaseSI {
  return {
    title: 'conveyor idler shaft',
    shaft: { diameter: 0.04, speed: 8 },
    load: { radial: 2500, axial: 200, shock: 'light' },
    life: { hours: 30000, wearAllowance: 0.0002, reliability: 90 },
    space: { maxLength: 0.03, maxOuterDiameter: 0.1 },
    lubrication: { supply: 'grease', inletTemperature: 30 },
    environment: { ambient: 25, contamination: 'normal', startsPerHour: 2 },
    priorities: { cost: 3, friction: 3, maintenance: 3, noise: 3, precision: 3 },
    ...over,
  };
}

const checksOf = (c: CaseSI) =>
  JSON.parse(JSON.stringify(checkRolling(c, { sheet: false }).candidates.map((k) => k.checks)));

describe('kept check records', () => {
  it('follow a change of room, ambient temperature and supply between calls', () => {
    const base = checksOf(idler());
    // One figure changed at a time, each call after the one before.
    const variants: Partial<CaseSI>[] = [
      { space: { maxLength: 0.02, maxOuterDiameter: 0.1 } },
      { space: { maxLength: 0.02, maxOuterDiameter: 0.09 } },
      { environment: { ambient: 60, contamination: 'normal', startsPerHour: 2 } },
      { lubrication: { supply: 'oil-feed', oilGrade: 68, inletTemperature: 40 } },
      { lubrication: { supply: 'oil-feed', oilGrade: 68, inletTemperature: 60 } },
      {
        lubrication: { supply: 'oil-feed', oilGrade: 68, inletTemperature: 60 },
        environment: { ambient: 10, contamination: 'normal', startsPerHour: 2 },
      },
      // The same bearing temperature (50 °C) and ambient, on grease and then on fed oil.
      { environment: { ambient: 30, contamination: 'normal', startsPerHour: 2 } },
      {
        lubrication: { supply: 'oil-feed', oilGrade: 68, inletTemperature: 40 },
        environment: { ambient: 30, contamination: 'normal', startsPerHour: 2 },
      },
      {},
    ];
    for (const v of variants) {
      const c = idler(v);
      const r = checkRolling(c, { sheet: false });
      expect(r.candidates.length).toBeGreaterThan(1);
      for (const k of r.candidates) {
        const by = (id: string) => k.checks.find((x) => x.id === id);
        expect(by('steel-temperature')!.value).toBe(k.temperature);
        expect(by('grease-temperature') !== undefined).toBe(c.lubrication.supply === 'grease');
        const outer = by('space-outer-diameter')!;
        expect([outer.value, outer.limit]).toEqual([k.outerDiameter, c.space.maxOuterDiameter]);
        const width = by('space-width')!;
        expect([width.value, width.limit]).toEqual([k.width, c.space.maxLength]);
      }
    }
    expect(checksOf(idler())).toEqual(base);
    // Each case's records do not depend on the call before it: forward and backward orders agree.
    const forward = variants.map((v) => checksOf(idler(v)));
    const backward = [...variants].reverse().map((v) => checksOf(idler(v)));
    expect(backward.reverse()).toEqual(forward);
  });

  it('are shared between candidates only as frozen records', () => {
    const r = checkRolling(idler(), { sheet: false });
    const steel = r.candidates.map((k) => k.checks.find((x) => x.id === 'steel-temperature')!);
    expect(steel.length).toBeGreaterThan(1);
    for (const k of steel) expect(Object.isFrozen(k)).toBe(true);
    expect(() => {
      (steel[0] as { pass: boolean }).pass = !steel[0]!.pass;
    }).toThrow(TypeError);
  });
});
