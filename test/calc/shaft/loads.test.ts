// Kind: the usual spur and helical gear force relations on a hand-worked number set (Juvinall &
// Marshek, Fundamentals of Machine Component Design, 6th ed. 2017, ch. 15–16, from memory:
// Ft = 2T/d, Fr = Ft·tan αn / cos β, Fa = Ft·tan β), our stated sign convention, belt pull and
// weight.
import { describe, expect, it } from 'vitest';
import { gearLoad, pullLoad, resolveLoads, STANDARD_GRAVITY } from '../../../src/calc/shaft/loads.js';

const deg = Math.PI / 180;

describe('gear mesh forces', () => {
  // Hand: T = 150 N·m, d = 200 mm → Ft = 2·150/0.2 = 1500 N.
  // Spur, αn = 20°: Fr = 1500·tan 20° = 1500·0.363970 = 545.955 N, Fa = 0.
  // Helical, β = 15°: Fr = 545.955/cos 15° = 545.955/0.965926 = 565.215 N,
  //   Fa = 1500·tan 15° = 1500·0.267949 = 401.924 N, couple Fa·d/2 = 40.192 N·m.
  const spur = { pitchDiameter: 0.2, torque: 150, pressureAngle: 20 * deg, helixAngle: 0, mesh: 0 };
  it('spur, mesh at +y: tangential 1500 N along −z (resisting the torque), separating 545.955 N towards the axis', () => {
    const l = gearLoad(0.3, spur);
    expect(l.fz).toBeCloseTo(-1500, 6);
    expect(l.fy).toBeCloseTo(-545.955, 2);
    expect(l.fx).toBeCloseTo(0, 9);
    expect(l.my).toBeCloseTo(0, 9);
    expect(l.mz).toBeCloseTo(0, 9);
    expect(l.torque).toBe(-150);
    // the tangential force's moment about x at the mesh point (0, r, 0): r·ŷ × fz·ẑ = r·fz·x̂ = −T
    expect(0.1 * l.fz).toBeCloseTo(-150, 9);
  });
  it('helical β = 15°: Fr = 565.215 N, Fa = 401.924 N towards +x, couple 40.192 N·m about −z', () => {
    const l = gearLoad(0.3, { ...spur, helixAngle: 15 * deg });
    expect(l.fz).toBeCloseTo(-1500, 6);
    expect(l.fy).toBeCloseTo(-565.215, 2);
    expect(l.fx).toBeCloseTo(401.924, 2);
    expect(l.mz).toBeCloseTo(-40.1924, 3);
    expect(l.my).toBeCloseTo(0, 9);
  });
  it('mesh at +z (90°): separating force along −z, tangential along +y, the couple about +y', () => {
    const l = gearLoad(0, { ...spur, helixAngle: 15 * deg, mesh: 90 * deg });
    expect(l.fz).toBeCloseTo(-565.215, 2);
    expect(l.fy).toBeCloseTo(1500, 6);
    expect(l.my).toBeCloseTo(40.1924, 3);
    expect(l.mz).toBeCloseTo(0, 9);
  });
  it('the other hand or the other torque reverses the axial force; the separating force stays', () => {
    const a = gearLoad(0, { ...spur, helixAngle: -15 * deg });
    const b = gearLoad(0, { ...spur, torque: -150, helixAngle: 15 * deg });
    expect(a.fx).toBeCloseTo(-401.924, 2);
    expect(b.fx).toBeCloseTo(-401.924, 2);
    expect(b.fy).toBeCloseTo(-565.215, 2);
    expect(b.fz).toBeCloseTo(1500, 6);
  });
  it('the resultant across the shaft is √(Ft² + Fr²) at any mesh angle', () => {
    for (const m of [0, 33, 140, 251, 359]) {
      const l = gearLoad(0, { ...spur, mesh: m * deg });
      expect(Math.hypot(l.fy, l.fz)).toBeCloseTo(Math.hypot(1500, 545.955), 2);
    }
  });
});

describe('belt and chain pull, weight, plain force', () => {
  it('belt: k = 2, T = 60 N·m, d = 150 mm → 2·2·60/0.15 = 1600 N in the stated direction', () => {
    const l = pullLoad(0, { pitchDiameter: 0.15, torque: 60, pullFactor: 2, direction: 180 * deg }, 'belt 1');
    expect(l.fy).toBeCloseTo(-1600, 6);
    expect(l.fz).toBeCloseTo(0, 9);
    const z = pullLoad(0, { pitchDiameter: 0.15, torque: -60, pullFactor: 2, direction: 90 * deg }, 'belt 1');
    expect(z.fz).toBeCloseTo(1600, 6);
  });
  it('resolves every kind in order with labels; a 40 kg weight is 392.266 N along −y', () => {
    const out = resolveLoads([
      { at: 0.1, force: { y: 10, z: -20 }, axial: 5 },
      { at: 0.2, weight: { mass: 40 } },
      { at: 0.3, chain: { pitchDiameter: 0.2, torque: 100, pullFactor: 1.1, direction: 0 } },
      { at: 0.4, gear: spur40() },
    ]);
    expect(out.map((l) => l.label)).toEqual(['force 1', 'weight 2', 'chain 3', 'gear 4']);
    expect(out[0]).toMatchObject({ at: 0.1, fx: 5, fy: 10, fz: -20, my: 0, mz: 0 });
    expect(out[1]!.fy).toBeCloseTo(-40 * STANDARD_GRAVITY, 9);
    expect(out[1]!.fy).toBeCloseTo(-392.266, 3);
    expect(out[2]!.fy).toBeCloseTo(1100, 6);
    expect(out[3]!.at).toBe(0.4);
  });
});

function spur40(): { pitchDiameter: number; torque: number; pressureAngle: number; helixAngle: number; mesh: number } {
  return { pitchDiameter: 0.1, torque: 20, pressureAngle: 20 * deg, helixAngle: 0, mesh: 0 };
}
