// Kind: formula checks on hand-worked numbers: grease relubrication interval (a rolling-
// bearing maker's general technical guide, seen; not named here; kept until its callers move
// to grease.ts), n·dm, friction torque M = μ·P·d/2 (common practice), the small-swing
// criterion (kinematics); speed limits per kind and static-safety guidance (common practice,
// data/rolling-running.json), and that table against its schema.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runningSchema } from '../../../src/data/rolling-running.js';
import { ROLLING_KINDS, kindType } from '../../../src/calc/rolling/kinds.js';
import {
  criticalSwingAngle,
  frictionPower,
  frictionTorque,
  relubricationInterval,
  speedFactor,
  speedLimit,
  staticSafetyGuidance,
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

describe('speed limits per kind and supply (common practice)', () => {
  const supplies = ['grease', 'oil-bath', 'oil-feed'] as const;
  it('every kind has a limit on every supply, rising from grease to bath to fed oil', () => {
    for (const kind of ROLLING_KINDS) {
      const [g, b, f] = supplies.map((s) => speedLimit(kind, s).ndm);
      expect(g).toBeGreaterThan(0);
      expect(b).toBeGreaterThan(g!);
      expect(f).toBeGreaterThan(b!);
      expect(speedLimit(kind, 'grease').source).toMatch(/common practice/);
    }
  });
  it('deep-groove and angular-contact highest, tapered and spherical lower, drawn cups below machined needles', () => {
    const grease = (k: (typeof ROLLING_KINDS)[number]): number => speedLimit(k, 'grease').ndm;
    expect(grease('deep-groove ball')).toBe(500000);
    expect(grease('angular-contact ball')).toBe(grease('deep-groove ball'));
    expect(grease('tapered roller')).toBeLessThan(grease('cylindrical roller'));
    expect(grease('spherical roller')).toBeLessThan(grease('tapered roller'));
    expect(speedLimit('needle roller', 'grease', 'drawn cup').ndm).toBeLessThan(
      speedLimit('needle roller', 'grease', 'machined without inner ring').ndm,
    );
  });
});

describe('static-safety guidance (common practice, values of our own)', () => {
  const shocks = ['none', 'light', 'moderate', 'heavy'] as const;
  it('rises with the shock level, and rollers ask more than balls', () => {
    for (const type of ['ball', 'roller'] as const) {
      const mins = shocks.map((s) => staticSafetyGuidance(s, type).min);
      for (let i = 1; i < mins.length; i++) expect(mins[i]).toBeGreaterThan(mins[i - 1]!);
    }
    for (const s of shocks)
      expect(staticSafetyGuidance(s, 'roller').min).toBeGreaterThan(staticSafetyGuidance(s, 'ball').min);
  });
  it('labels are our own words, one per level, and every row names its source', () => {
    const labels = shocks.map((s) => staticSafetyGuidance(s, 'ball').label);
    expect(new Set(labels).size).toBe(4);
    for (const l of labels) expect(l).not.toMatch(/vibration-free|normal running/i);
    for (const s of shocks) expect(staticSafetyGuidance(s, 'ball').source).toMatch(/common practice/);
    expect(staticSafetyGuidance('none', kindType('tapered roller')).min).toBe(1.5);
  });
});

describe('data/rolling-running.json against its schema', () => {
  it('validates, with a row for every kind in each per-kind list', () => {
    const raw: unknown = JSON.parse(
      readFileSync(new URL('../../../data/rolling-running.json', import.meta.url), 'utf8'),
    );
    const t = runningSchema.parse(raw);
    for (const kind of ROLLING_KINDS) {
      expect(t.friction.some((r) => r.kind === kind)).toBe(true);
      expect(t.greaseKinds.some((r) => r.kind === kind)).toBe(true);
      expect(t.speedLimits.some((r) => r.kind === kind && r.form === null)).toBe(true);
    }
    expect(t.staticSafety.map((r) => r.shock)).toEqual(['none', 'light', 'moderate', 'heavy']);
  });
  it('the schema rejects a row without a source', () => {
    const raw = JSON.parse(readFileSync(new URL('../../../data/rolling-running.json', import.meta.url), 'utf8')) as {
      speedLimits: { source?: string }[];
    };
    delete raw.speedLimits[0]!.source;
    expect(runningSchema.safeParse(raw).success).toBe(false);
  });
});
