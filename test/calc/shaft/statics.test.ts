// Kind: reactions against hand statics of a rigid shaft on two simple supports (ΣF = 0,
// ΣM = 0; any mechanics text, e.g. Gere & Goodno, Mechanics of Materials, 8th ed. 2013, ch. 4,
// from memory), worked in each test's comment; couples against the equivalent force pair;
// which support takes the thrust.
import { describe, expect, it } from 'vitest';
import type { Locates, ShaftSupportSI } from '../../../src/case/shaft-types.js';
import { shaftStatics } from '../../../src/calc/shaft/statics.js';
import type { PointLoad } from '../../../src/calc/shaft/types.js';

function support(name: string, at: number, locates: Locates = 'none'): ShaftSupportSI {
  return { name, at, diameter: 0.04, locates };
}
function load(at: number, f: Partial<Omit<PointLoad, 'at' | 'label'>>): PointLoad {
  return { at, fx: 0, fy: 0, fz: 0, my: 0, mz: 0, torque: 0, label: 'test', ...f };
}
const pair = (a: number, b: number, la: Locates = 'both', lb: Locates = 'none') => ({
  supports: [support('A', a, la), support('B', b, lb)] as [ShaftSupportSI, ShaftSupportSI],
});

describe('reactions by hand statics', () => {
  it('simply supported: 3 kN down at 0.2 m of a 0.8 m span → R_A = 2250 N, R_B = 750 N up', () => {
    // hand: R_B = 3000·0.2/0.8 = 750 N, R_A = 3000 − 750 = 2250 N
    const s = shaftStatics(pair(0, 0.8), [load(0.2, { fy: -3000 })]);
    expect(s.supports[0].y).toBeCloseTo(2250, 9);
    expect(s.supports[1].y).toBeCloseTo(750, 9);
    expect(s.supports[0].radial).toBeCloseTo(2250, 9);
  });
  it('overhung right: 1 kN down 0.2 m beyond B (span 0.5 m) → R_B = 1400 N up, R_A = 400 N down', () => {
    // hand: ΣM_A = 0.7·(−1000) + 0.5·R_B = 0 → R_B = 1400 N; R_A = 1000 − 1400 = −400 N
    const s = shaftStatics(pair(0, 0.5), [load(0.7, { fy: -1000 })]);
    expect(s.supports[1].y).toBeCloseTo(1400, 9);
    expect(s.supports[0].y).toBeCloseTo(-400, 9);
    expect(s.supports[0].radial).toBeCloseTo(400, 9);
  });
  it('overhung left: 1 kN down 0.1 m before A → R_A = 1200 N up, R_B = 200 N down', () => {
    // hand: ΣM_A = (−0.1)·(−1000) + 0.5·R_B = 0 → R_B = −200 N; R_A = 1000 + 200 = 1200 N
    const s = shaftStatics(pair(0, 0.5), [load(-0.1, { fy: -1000 })]);
    expect(s.supports[0].y).toBeCloseTo(1200, 9);
    expect(s.supports[1].y).toBeCloseTo(-200, 9);
  });
  it('loads in both planes: radial reactions 831.04 N and 784.62 N', () => {
    // hand, span 0.6 m: x–y, 1200 N down at 0.2 → R_By = 400, R_Ay = 800;
    // x–z, 900 N along +z at 0.45 → R_Bz = −900·0.45/0.6 = −675, R_Az = −225;
    // radial A = √(800² + 225²) = 831.04 N, B = √(400² + 675²) = 784.62 N
    const s = shaftStatics(pair(0, 0.6), [load(0.2, { fy: -1200 }), load(0.45, { fz: 900 })]);
    expect(s.supports[0]).toMatchObject({ y: expect.closeTo(800, 9), z: expect.closeTo(-225, 9) });
    expect(s.supports[1]).toMatchObject({ y: expect.closeTo(400, 9), z: expect.closeTo(-675, 9) });
    expect(s.supports[0].radial).toBeCloseTo(831.04, 2);
    expect(s.supports[1].radial).toBeCloseTo(784.62, 2);
  });
  it('supports written in the other order give the same reactions per support', () => {
    const loads = [load(0.2, { fy: -1200 }), load(0.45, { fz: 900 })];
    const ab = shaftStatics(pair(0, 0.6), loads);
    const ba = shaftStatics({ supports: [support('B', 0.6), support('A', 0, 'both')] }, loads);
    expect(ba.supports[1].y).toBeCloseTo(ab.supports[0].y, 9);
    expect(ba.supports[0].z).toBeCloseTo(ab.supports[1].z, 9);
  });
  it('a couple equals a force pair: my = −h·F from +F·ẑ at x0 + h and −F·ẑ at x0; mz = +h·F from fy', () => {
    const h = 0.01;
    const F = 5000;
    const couple = shaftStatics(pair(0, 0.5), [load(0.3, { my: -h * F, mz: h * F })]);
    const forces = shaftStatics(pair(0, 0.5), [load(0.3 + h, { fz: F, fy: F }), load(0.3, { fz: -F, fy: -F })]);
    for (const i of [0, 1] as const) {
      expect(couple.supports[i].y).toBeCloseTo(forces.supports[i].y, 9);
      expect(couple.supports[i].z).toBeCloseTo(forces.supports[i].z, 9);
    }
    // hand: a couple C_z on span L gives ∓C/L at the supports: 50/0.5 = 100 N
    expect(Math.abs(couple.supports[1].y)).toBeCloseTo(100, 9);
  });
  it('refuses supports at the same position', () => {
    expect(() => shaftStatics(pair(0.2, 0.2), [])).toThrow(RangeError);
  });
});

describe('thrust', () => {
  const push = (fx: number) => [load(0.1, { fx, fy: -100 })];
  it('goes to the locating support, as a reaction opposing the net axial load', () => {
    const s = shaftStatics(pair(0, 0.5, 'none', 'both'), push(400));
    expect(s.thrustSupport).toBe(1);
    expect(s.supports[1].axial).toBe(-400);
    expect(s.supports[0].axial).toBe(0);
  });
  it('a cross-located pair: the support at larger x takes thrust towards +x, the other towards −x', () => {
    const written = { supports: [support('far', 0.5, 'one-direction'), support('near', 0, 'one-direction')] } as {
      supports: [ShaftSupportSI, ShaftSupportSI];
    };
    const plus = shaftStatics(written, push(250));
    expect(plus.thrustSupport).toBe(0);
    expect(plus.supports[0].axial).toBe(-250);
    const minus = shaftStatics(written, push(-250));
    expect(minus.thrustSupport).toBe(1);
    expect(minus.supports[1].axial).toBe(250);
  });
  it('no net axial load: no support takes thrust', () => {
    const s = shaftStatics(pair(0, 0.5), [load(0.1, { fx: 50 }), load(0.3, { fx: -50 })]);
    expect(s.thrustSupport).toBeNull();
    expect(s.supports[0].axial).toBe(0);
  });
});
