// Regression tests of issue 14's bushing failures, each in an invented setting of our own.
import { describe, expect, it } from 'vitest';
import { better, checkBushing, materialMargin } from '../../../src/calc/bushing/check.js';
import { bushingMaterials } from '../../../src/data/bushing.js';
import { describe as wordOf } from '../../../src/report/findings/index.js';
import { pumpCase } from '../../helpers/case.js';

/** A light, slow duty every greased class passes when it is greased (so the supply alone decides). */
const lightDuty = {
  shaft: { diameter: '30 mm', speed: '20 rpm' },
  load: { radial: '300 N', axial: '0 N', shock: 'light' },
  life: { hours: '2000 h', wearAllowance: '0.2 mm' },
};
/** The same, as a pin swinging 60° at 0.3 Hz (the pin classes hold for oscillation only). */
const lightPin = { ...lightDuty, shaft: { diameter: '30 mm', oscillation: { angle: '60 deg', frequency: '0.3 Hz' } } };

describe('lubricant need (guards: a periodically greased bronze recommended for a case with no lubricant)', () => {
  it('a greased bronze never passes a supply: none case, and passes the same duty when greased', () => {
    for (const id of ['greased-bronze', 'greased-bronze-pin', 'greased-hardened-steel']) {
      const dry = checkBushing(pumpCase({ ...lightPin, lubrication: { supply: 'none' }, bushing: { material: id } }));
      const m = dry.materials[0]!;
      expect(m.needs).toBe('grease');
      expect(m.feasible, id).toBe(false);
      const k = m.checks.find((x) => x.id === 'lubricant-need')!;
      expect(k.pass).toBe(false);
      expect(k.advisory).toBeUndefined();
      expect(wordOf(m.reasons[0]!)).toMatch(/needs grease to reach its limits; the case supplies none/);
      const greased = checkBushing(pumpCase({ ...lightPin, bushing: { material: id } })).materials[0]!;
      expect(greased.feasible, id).toBe(true);
      expect(greased.checks.some((x) => x.id === 'lubricant-need')).toBe(false);
    }
  });

  it('with no lubricant, the material chosen from the whole table needs none', () => {
    const r = checkBushing(pumpCase({ ...lightDuty, lubrication: { supply: 'none' } }));
    expect(r.best).not.toBeNull();
    const best = r.materials.find((m) => m.id === r.best)!;
    expect(best.needs).toBe('none');
    for (const m of r.materials) if (m.needs !== 'none') expect(m.feasible).toBe(false);
  });
});

/** An invented tailings-thickener rake pivot: slow, dirty, in slurry, no lubricant. */
const slurry = () =>
  pumpCase({
    title: 'Tailings thickener rake pivot (invented)',
    shaft: { diameter: '50 mm', speed: '5 rpm' },
    load: { radial: '3 kN', axial: '0 N', shock: 'moderate' },
    life: { hours: '4000 h', wearAllowance: '1 mm' },
    space: { maxLength: '90 mm', maxOuterDiameter: '80 mm' },
    lubrication: { supply: 'none' },
    environment: { ambient: '20 degC', contamination: 'dirty', startsPerHour: 1, medium: 'slurry' },
  });

describe('pin classes', () => {
  it('greased hardened steel and the bronze pin bush are set aside for a continuously rotating shaft, with the reason', () => {
    const r = checkBushing(pumpCase(lightDuty));
    for (const id of ['greased-hardened-steel', 'greased-bronze-pin']) {
      const m = r.materials.find((x) => x.id === id)!;
      expect(m.feasible, id).toBe(false);
      expect(m.checks.find((k) => k.id === 'motion')!.pass).toBe(false);
      expect(wordOf(m.reasons[0]!)).toMatch(/oscillating pins and pivots; this shaft rotates continuously/);
    }
    expect(r.materials.find((x) => x.id === 'greased-bronze')!.feasible).toBe(true);
  });
});

describe('material choice at a common length (guards: a slurry winner decided by millimetre rounding and list order)', () => {
  it('every material is checked at one length, the longest in the space with L/D ≤ 2, whole mm', () => {
    const r = checkBushing(slurry());
    expect(r.length).toBeCloseTo(0.09, 12); // min(90 mm, 2·50 mm)
    for (const m of r.materials) {
      expect(m.length).toBe(r.length);
      expect(m.lengthChosen).toBe('common');
      expect(m.minLength).toBeGreaterThan(0);
    }
  });

  it('the winner has the largest margin on its material limits, and reversing the table does not change it', () => {
    const r = checkBushing(slurry());
    const feasible = r.materials.filter((m) => m.feasible);
    expect(feasible.length).toBeGreaterThanOrEqual(3);
    const top = Math.max(...feasible.map(materialMargin));
    expect(materialMargin(r.materials.find((m) => m.id === r.best)!)).toBe(top);
    const reversed = checkBushing(slurry(), { materials: [...bushingMaterials()].reverse() });
    expect(reversed.best).toBe(r.best);
    expect(reversed.shown).toBe(r.shown);
  });

  it('a material poor in water is set aside in slurry with its reason; dry service keeps it', () => {
    const r = checkBushing(slurry());
    const bronze = r.materials.find((m) => m.id === 'sintered-bronze')!;
    expect(bronze.water).toBe('poor');
    expect(bronze.checks.find((k) => k.id === 'medium')!.pass).toBe(false);
    expect(wordOf(bronze.reasons.find((f) => f.code === 'bushing.medium-unsuited')!)).toMatch(/rated poor in slurry/);
    const dry = checkBushing(pumpCase({ ...lightDuty, environment: { medium: 'dry' } }));
    expect(dry.materials.find((m) => m.id === 'sintered-bronze')!.checks.some((k) => k.id === 'medium')).toBe(false);
  });

  it('equal margins are a tie broken by the lower mean friction power, whichever comes first', () => {
    // Graphite-plugged bronze and the wound PTFE-glass both allow 0.5 m/s: at 5 r/min the speed
    // check governs both with the same margin; the wound liner's friction (0.10) is below 0.12.
    const r = checkBushing(slurry());
    const a = r.materials.find((m) => m.id === 'graphite-plugged-bronze')!;
    const b = r.materials.find((m) => m.id === 'ptfe-glass-wound')!;
    expect(Math.abs(materialMargin(a) - materialMargin(b))).toBeLessThanOrEqual(1e-9);
    expect(better(a, b).id).toBe('ptfe-glass-wound');
    expect(better(b, a).id).toBe('ptfe-glass-wound');
  });
});

describe('temperature (guards: 132 °C for sintered bronze at PV 0.5 MPa·m/s from the one-node estimate)', () => {
  it('sintered bronze at PV 0.5 MPa·m/s, D 40 mm, L 40 mm runs at a credible temperature', () => {
    // P = 1600 N/(0.04·0.04) = 1 MPa; V = π·0.04 m·(0.5/(π·0.04)) rev/s = 0.5 m/s; PV = 0.5 MPa·m/s.
    // ΔT = R·μ·PV with R = (75 − 20) K/(0.08·1.16 MPa·m/s): ΔT = 55·0.5/1.16 = 23.7 K; 25 °C ambient → 48.7 °C.
    const n = 0.5 / (Math.PI * 0.04);
    const r = checkBushing(
      pumpCase({
        shaft: { diameter: '40 mm', speed: `${n} rev/s` },
        load: { radial: '1600 N', axial: '0 N', shock: 'none' },
        space: { maxLength: '60 mm', maxOuterDiameter: '80 mm' },
        bushing: { material: 'sintered-bronze', length: '40 mm' },
      }),
    );
    const m = r.materials[0]!;
    expect(m.pv).toBeCloseTo(0.5e6, 3);
    expect(m.temperature).toBeCloseTo(25 + (55 * 0.5) / 1.16, 6);
    // Credible: below the material's 75 °C limit at under half its PV limit.
    expect(m.temperature).toBeLessThan(75);
    expect(m.checks.find((k) => k.id === 'temperature')!.advisory).toBe(true);
  });
});

describe('hot surroundings', () => {
  it('an ambient above a material class limit excludes it whatever the duty (a limit, not advice)', () => {
    const r = checkBushing(
      pumpCase({ ...lightDuty, lubrication: { supply: 'none' }, environment: { ambient: '80 degC' } }),
    );
    const bronze = r.materials.find((m) => m.id === 'sintered-bronze')!; // limit 75 degC
    const k = bronze.checks.find((x) => x.id === 'ambient-temperature')!;
    expect(k.pass).toBe(false);
    expect(k.advisory).toBeUndefined();
    expect(bronze.feasible).toBe(false);
    // A class that stands the room gets no such check, so the room never decides a choice margin.
    const ptfe = r.materials.find((m) => m.id === 'filled-ptfe')!;
    expect(ptfe.checks.some((x) => x.id === 'ambient-temperature')).toBe(false);
  });
});

describe('axial load (guards: 4 kN of thrust on a bushing not checked at all)', () => {
  const thrust = (axial: string) => checkBushing(pumpCase({ load: { radial: '1.2 kN', axial, shock: 'light' } }));

  it('4 kN of thrust is checked on a flange or washer sized in the space, the washer taken from the length', () => {
    const r = thrust('4 kN');
    expect(r.warnings.some((w) => w.code === 'bushing.axial-not-carried')).toBe(false);
    expect(r.assumed.some((a) => a.code === 'bushing.thrust-face')).toBe(true);
    // Washer 1.5 mm (30 mm shaft): common length floor(50 − 1.5) = 48 mm.
    expect(r.length).toBeCloseTo(0.048, 12);
    // Face 30.5/62 mm: A = π/4·(0.062² − 0.0305²) = 2.2884e-3 m²; p = 4000/2.2884e-3 = 1.748 MPa.
    for (const m of r.materials) {
      expect(m.thrust!.face).toEqual({ inner: 0.0305, outer: 0.062 });
      expect(m.thrust!.pressure).toBeCloseTo(1.748e6, -3);
      for (const id of ['thrust-pressure', 'thrust-velocity', 'thrust-pv', 'thrust-wear-life'])
        expect(m.checks.find((k) => k.id === id)?.advisory, `${m.id} ${id}`).toBeUndefined();
    }
  });

  it('a thrust the face cannot carry makes the materials infeasible through the thrust checks', () => {
    const r = thrust('60 kN');
    expect(r.feasible).toBe(false);
    for (const m of r.materials)
      expect(m.checks.filter((k) => k.id.startsWith('thrust-') && !k.pass).length).toBeGreaterThan(0);
    const none = thrust('0 N');
    for (const m of none.materials) expect(m.thrust).toBeNull();
  });
});

describe('axial room taken to the whole millimetre (guards: 57 mm + 3 mm washer failing 60 mm of room by a float residue)', () => {
  it('a common length plus its washer that fills the room exactly passes the axial-space check', () => {
    // 60 mm shaft, 60 mm of room, axial load: washer max(1.5 mm, 5 % of 60 mm) = 3 mm, common
    // length min(60 − 3, 2·60) = 57 mm; 57 + 3 = 60 mm is within 60 mm.
    const r = checkBushing(
      pumpCase({
        ...lightDuty,
        shaft: { diameter: '60 mm', speed: '20 rpm' },
        load: { radial: '300 N', axial: '200 N', shock: 'light' },
        space: { maxLength: '60 mm', maxOuterDiameter: '120 mm' },
      }),
    );
    for (const m of r.materials) {
      expect(m.length).toBeCloseTo(0.057, 12);
      expect(m.checks.find((k) => k.id === 'axial-space')).toBeUndefined();
    }
  });
});
