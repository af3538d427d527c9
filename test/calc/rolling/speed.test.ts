// Kind: formula checks on hand-worked numbers: n·dm, friction power M·2π·n, the small-swing
// criterion (kinematics); speed limits per kind and static-safety guidance (common practice,
// data/rolling-running.json), and that table against its schema.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runningSchema } from '../../../src/data/rolling-running.js';
import { ROLLING_KINDS, kindType } from '../../../src/calc/rolling/kinds.js';
import {
  criticalSwingAngle,
  frictionPower,
  speedFactor,
  speedLimit,
  staticSafetyGuidance,
} from '../../../src/calc/rolling/speed.js';

describe('speed factor and friction', () => {
  it('n·dm: 1500 r/min × 60 mm = 90 000 mm·r/min', () => {
    expect(speedFactor(25, 0.06)).toBeCloseTo(90000, 6);
  });
  it('a friction moment of 0.12 N·m at 25 rev/s gives 0.12·2π·25 = 18.85 W', () => {
    expect(frictionPower(0.12, 25)).toBeCloseTo(0.12 * 2 * Math.PI * 25, 12);
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
