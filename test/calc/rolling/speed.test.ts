// Kind: formula checks on hand-worked numbers: grease relubrication interval (a rolling-
// bearing maker's general technical guide, seen; not named here), n·dm, friction torque
// M = μ·P·d/2 (common practice), and the small-swing criterion (kinematics).
import { describe, expect, it } from 'vitest';
import {
  criticalSwingAngle,
  frictionPower,
  frictionTorque,
  relubricationInterval,
  speedFactor,
} from '../../../src/calc/rolling/speed.js';

describe('grease relubrication interval t_f = k_f·[14e6/(n·√d) − 4d]', () => {
  it('1500 r/min, d = 40 mm, k_f = 10: 14e6/(1500·6.3246) = 1475.73; − 160 = 1315.73; ×10 = 13 157 h', () => {
    expect(relubricationInterval(25, 0.04, 10, 60)).toBeCloseTo(13157.3, 0);
  });
  it('halves for each 15 °C above 70 °C', () => {
    const cool = relubricationInterval(25, 0.04, 10, 70)!;
    expect(relubricationInterval(25, 0.04, 10, 85)! / cool).toBeCloseTo(0.5, 12);
    expect(relubricationInterval(25, 0.04, 10, 100)! / cool).toBeCloseTo(0.25, 12);
  });
  it('too fast for grease by this rule: 0, not negative; no rotation: null', () => {
    expect(relubricationInterval(20000 / 60, 0.05, 10, 40)).toBe(0);
    expect(relubricationInterval(0, 0.05, 10, 40)).toBeNull();
  });
});

describe('speed factor and friction', () => {
  it('n·dm: 1500 r/min × 60 mm = 90 000 mm·r/min', () => {
    expect(speedFactor(25, 0.06)).toBeCloseTo(90000, 6);
  });
  it('M = 0.0015·4000 N·0.040 m/2 = 0.12 N·m; at 25 rev/s the power is 0.12·2π·25 = 18.85 W', () => {
    const M = frictionTorque(0.0015, 4000, 0.04);
    expect(M).toBeCloseTo(0.12, 12);
    expect(frictionPower(M, 25)).toBeCloseTo(0.12 * 2 * Math.PI * 25, 12);
  });
});

describe('smallest swing for rolling-element overlap, θ = 720°/(Z·(1 − Dw/dm))', () => {
  it('Z = 9, Dw/dm = 0.2: 720/(9·0.8) = 100°', () => {
    expect((criticalSwingAngle(9, 0.012, 0.06) * 180) / Math.PI).toBeCloseTo(100, 9);
  });
});
