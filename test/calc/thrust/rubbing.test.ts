// A hand-worked rubbing thrust washer, and the sizing rule of the face (invented settings).
import { describe, expect, it } from 'vitest';
import {
  faceArea,
  rubbingThrust,
  sizeThrustFace,
  washerThickness,
  type RubbingThrustInput,
} from '../../../src/calc/thrust/rubbing.js';
import type { BushingMaterial } from '../../../src/data/bushing.js';

// An invented washer material: limits 2 MPa, 1 m/s, PV 0.5 MPa·m/s, k = 3e-7 mm³/(N·m), μ 0.1.
const washer: BushingMaterial = {
  id: 'test-washer',
  name: 'Test washer',
  maxPressure: 2e6,
  maxVelocity: 1,
  maxPV: 0.5e6,
  wearFactor: 3e-16,
  friction: 0.1,
  maxTemperature: 120,
  source: 'invented for the test',
};

describe('rubbingThrust on a hand-worked washer', () => {
  // Washer d_i = 40 mm, d_o = 80 mm, Fa = 3000 N, n = 120 rpm = 2 rev/s, 2000 h, allowance 0.5 mm,
  // f_motion 1, f_env 1.5, k = 3e-16 m²/N, μ = 0.1.
  //   A   = π/4·(0.080² − 0.040²) = π/4·0.0048 = 3.7699e-3 m²
  //   p   = 3000 / 3.7699e-3 = 0.79577 MPa
  //   d_m = 0.060 m, V = π·0.060·2 = 0.37699 m/s
  //   PV  = 3000·π·0.06·2 / (π/4·0.0048) = 1440/0.0048 = 300 000 Pa·m/s = 0.3 MPa·m/s
  //   wear rate = 1·1.5·3e-16·3e5·3600 = 4.86e-7 m/h → life = 5e-4 / 4.86e-7 = 1028.8 h
  //   friction power = 0.1·3000·0.37699 = 113.10 W
  const inp: RubbingThrustInput = {
    axial: 3000,
    face: { inner: 0.04, outer: 0.08 },
    speed: 2,
    hours: 2000,
    wearAllowance: 0.5e-3,
    fMotion: 1,
    fEnv: 1.5,
  };
  const r = rubbingThrust(inp, washer);

  it('pressure, speed, PV, life and friction power as worked', () => {
    expect(faceArea(inp.face)).toBeCloseTo(3.7699e-3, 7);
    expect(r.pressure).toBeCloseTo(795775, -1);
    expect(r.velocity).toBeCloseTo(0.37699, 5);
    expect(r.pv).toBeCloseTo(300000, 3);
    expect(r.lifeHours).toBeCloseTo(1028.8, 1);
    expect(r.frictionPower).toBeCloseTo(113.1, 1);
  });

  it('checks are prefixed thrust- and the wear life is the one that fails here', () => {
    expect(r.checks.map((k) => k.id)).toEqual(['thrust-pressure', 'thrust-velocity', 'thrust-pv', 'thrust-wear-life']);
    const failing = r.checks.filter((k) => !k.pass).map((k) => k.id);
    expect(failing).toEqual(['thrust-wear-life']);
    expect(r.checks.find((k) => k.id === 'thrust-pv')!.margin).toBeCloseTo(0.4, 9);
  });

  it('oscillation slides at θ·d_m·f', () => {
    const o = rubbingThrust({ ...inp, speed: undefined, oscillation: { angle: Math.PI / 2, frequency: 0.5 } }, washer);
    expect(o.velocity).toBeCloseTo((Math.PI / 2) * 0.06 * 0.5, 12);
  });

  it('a face without width fails on pressure; a still face wears nothing', () => {
    const flat = rubbingThrust({ ...inp, face: { inner: 0.05, outer: 0.05 } }, washer);
    expect(flat.checks.find((k) => k.id === 'thrust-pressure')!.pass).toBe(false);
    const still = rubbingThrust({ ...inp, speed: 0 }, washer);
    expect(still.lifeHours).toBe(Infinity);
    expect(still.frictionPower).toBe(0);
  });
});

describe('sizeThrustFace', () => {
  it('bore = shaft + running clearance, outer = the radial space; thickness grows with the shaft', () => {
    expect(sizeThrustFace(0.03, 0.062)).toEqual({ inner: 0.0305, outer: 0.062 });
    expect(sizeThrustFace(0.1, 0.15).inner).toBeCloseTo(0.101, 12);
    expect(washerThickness(0.02)).toBeCloseTo(1.5e-3, 12);
    expect(washerThickness(0.1)).toBeCloseTo(5e-3, 12);
  });
});
