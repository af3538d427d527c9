// Kind: behaviour of the grease-life kernel (Booser 1974 law, constants in
// data/rolling-running.json) and of the regreasing interval taken from it; the law itself is
// checked by hand in test/reference/grease-life.test.ts. Kind half-lives, the load rule, the
// 20 °C hold, the Weibull slope 1.5 and the half-of-L10 interval are common practice.
import { describe, expect, it } from 'vitest';
import { greaseLife, regreasingInterval, tenPercentShare } from '../../../src/calc/rolling/grease.js';
import { ROLLING_KINDS } from '../../../src/calc/rolling/kinds.js';

const base = { kind: 'deep-groove ball' as const, n: 25, d: 0.04, D: 0.08, temperature: 90 };
const codes = (g: { findings: { code: string }[] }): string[] => g.findings.map((f) => f.code);

describe('grease life', () => {
  it('L10 of a Weibull life with slope 1.5 is (ln 0.9/ln 0.5)^(1/1.5) = 0.2848 of L50', () => {
    expect(tenPercentShare(1.5)).toBeCloseTo(0.28482, 5);
    const g = greaseLife(base);
    expect(g.l10Hours! / g.hours!).toBeCloseTo(0.28482, 5);
  });
  it('does not turn: no life, no error', () => {
    const g = greaseLife({ ...base, n: 0 });
    expect(g.hours).toBeNull();
    expect(g.l10Hours).toBeNull();
  });
  it('below 20 °C the law is held at its 20 °C value, and says so; above it the law runs on (each 14-15 K cooler about doubles the life)', () => {
    const cold = greaseLife({ ...base, temperature: 5 });
    const at20 = greaseLife({ ...base, temperature: 20 });
    expect(cold.hours).toBeCloseTo(at20.hours!, 9);
    expect(cold.temperatureUsed).toBe(20);
    expect(codes(cold)).toContain('rolling.grease-life-cool-held');
    expect(codes(at20)).not.toContain('rolling.grease-life-cool-held');
    const at40 = greaseLife({ ...base, temperature: 40 });
    const at55 = greaseLife({ ...base, temperature: 55 });
    expect(at40.temperatureUsed).toBe(40);
    // 2450·(1/313.15 − 1/328.15) = 0.3577 decades: a factor 2.28 for 15 K.
    expect(at40.hours! / at55.hours!).toBeCloseTo(Math.pow(10, 2450 * (1 / 313.15 - 1 / 328.15)), 6);
  });
  it('hotter than 120 °C: a caution', () => {
    expect(codes(greaseLife({ ...base, temperature: 125 }))).toContain('rolling.grease-hot');
    expect(codes(greaseLife({ ...base, temperature: 115 }))).not.toContain('rolling.grease-hot');
  });
  it('shorter with temperature and with speed', () => {
    let last = Infinity;
    for (const t of [70, 80, 95, 110, 130]) {
      const h = greaseLife({ ...base, temperature: t }).hours!;
      expect(h).toBeLessThan(last);
      last = h;
    }
    last = Infinity;
    for (const n of [5, 20, 60, 120]) {
      const h = greaseLife({ ...base, n }).hours!;
      expect(h).toBeLessThan(last);
      last = h;
    }
  });
  it('beyond the grease speed limit: a caution with n·dm and the limit', () => {
    const g = greaseLife({ ...base, n: 150 }); // 9000 r/min × 60 mm = 540 000 > 500 000
    const f = g.findings.find((x) => x.code === 'rolling.grease-speed-beyond-limit')!;
    expect(f.values['ndm']).toBeCloseTo(540000, 6);
    expect(f.values['limit']).toBe(500000);
  });
  it('load: nothing up to P/C = 0.1, then one half-life for each further 0.1', () => {
    const light = greaseLife({ ...base, load: { P: 2000, C: 30000 } });
    const heavy = greaseLife({ ...base, load: { P: 6000, C: 30000 } });
    expect(light.halvings.load).toBe(0);
    expect(codes(light)).not.toContain('rolling.grease-heavy-load');
    expect(heavy.halvings.load).toBeCloseTo(1, 12);
    expect(heavy.hours! / light.hours!).toBeCloseTo(Math.pow(10, -0.301), 12);
    expect(codes(heavy)).toContain('rolling.grease-heavy-load');
  });
  it('every kind has a row; roller kinds and angular contact lose at least one half-life', () => {
    for (const kind of ROLLING_KINDS) {
      const g = greaseLife({ ...base, kind });
      expect(g.hours!).toBeGreaterThan(0);
      if (kind !== 'deep-groove ball') expect(g.halvings.kind).toBeGreaterThanOrEqual(1);
    }
  });
  it('a drawn-cup needle roller bearing takes its own, lower speed limit', () => {
    const cup = greaseLife({ ...base, kind: 'needle roller', form: 'drawn cup' });
    const machined = greaseLife({ ...base, kind: 'needle roller', form: 'machined with inner ring' });
    expect(cup.ndmLimit).toBeLessThan(machined.ndmLimit);
    expect(cup.hours!).toBeLessThan(machined.hours!);
  });
});

describe('regreasing interval of an open bearing', () => {
  it('half the 10 % grease life', () => {
    const r = regreasingInterval(base);
    expect(r.fraction).toBe(0.5);
    expect(r.hours!).toBeCloseTo(0.5 * r.life.l10Hours!, 9);
    expect(r.hours!).toBeCloseTo(0.5 * 0.28482 * r.life.hours!, 0);
  });
  it('no interval when the bearing does not turn', () => {
    expect(regreasingInterval({ ...base, n: 0 }).hours).toBeNull();
  });
});
