// Regression: the rolling-bearing faults the practice matrix found (test/advise/matrix), each
// guarded on the duty that showed it. The duties are invented settings of our own; the answers
// practice accepts are common practice (reasons in the duty files).
import { describe, expect, it } from 'vitest';
import { parseCaseText } from '../../../src/case/load.js';
import type { CaseSI } from '../../../src/case/types.js';
import type { CheckRecord } from '../../../src/core/check.js';
import { checkRolling } from '../../../src/calc/rolling/index.js';
import { contaminationFactor, EC_GUIDANCE_DM } from '../../../src/calc/rolling/conditions.js';
import { greaseLife } from '../../../src/calc/rolling/grease.js';
import { rollingFactors } from '../../../src/data/rolling.js';
import { rollingRunning } from '../../../src/data/rolling-running.js';
import { DUTIES } from '../../advise/matrix/duties.js';

function duty(id: string): CaseSI {
  const d = DUTIES.find((x) => x.id === id);
  if (!d) throw new Error(`no duty ${id}`);
  return parseCaseText(d.yaml, id).case;
}

const checkOf = (k: { checks: CheckRecord[] }, id: string) => k.checks.find((ch) => ch.id === id);

describe('quarry-return-idler: grease life of a sealed bearing at a cool temperature', () => {
  const c = duty('quarry-return-idler');
  const r = checkRolling(c, { sheet: false });

  it('the Booser (1974) law is evaluated at the bearing temperature (35 °C), not held at 70 °C', () => {
    // Booser, Grease life forecast for ball bearings, Lubrication Engineering 30 (1974) 536–541:
    // log10 L50 = −2.60 + 2450/T − 0.301·S; here S = S_N = 0.864·(n·dm)/(n·dm)_lim only.
    const g = greaseLife({ kind: 'deep-groove ball', n: 8, d: 0.02, D: 0.042, temperature: 35 });
    const S = (0.864 * g.ndm) / g.ndmLimit;
    expect(g.temperatureUsed).toBe(35);
    expect(g.hours!).toBeCloseTo(Math.pow(10, -2.6 + 2450 / 308.15 - 0.301 * S), 0);
    // Order of magnitude of published grease-life charts for sealed ball bearings near 35 °C and
    // low speed: tens of thousands to about 10^5 hours (from memory).
    expect(g.l10Hours!).toBeGreaterThan(40000);
    expect(g.hours!).toBeGreaterThan(1e5);
  });

  it('a sealed deep-groove ball bearing is feasible, its grease-life check passing', () => {
    expect(r.feasible).toBe(true);
    const best = r.candidates.find((k) => k.id === r.best)!;
    expect(best.kind).toBe('deep-groove ball');
    const gl = checkOf(best, 'grease-life')!;
    expect(gl.pass).toBe(true);
    expect(gl.value).toBeGreaterThan(c.life.hours);
  });

  it('its contamination is the sealed-for-life class (ISO 281 "high cleanliness"), not the dirty surroundings, and is said', () => {
    const a = r.assumed.find((x) => x.field === 'environment.contamination')!;
    expect(a.code).toBe('rolling.contamination-sealed');
    expect(a.values['level']).toBe('clean');
    expect(a.values['surroundings']).toBe('dirty');
  });
});

describe('quarry-return-idler with a grease supply: an open bearing is regreased, not failed', () => {
  // The same idler with grease supply but a life target beyond one fill: an open bearing with a
  // regreasing interval is feasible (maintenance), the interval reported, no grease-life limit.
  const c = duty('quarry-return-idler');
  const open: CaseSI = {
    ...c,
    lubrication: { ...c.lubrication, supply: 'grease' },
    life: { ...c.life, hours: 150000 },
  };
  const r = checkRolling(open, { sheet: false });
  const sealed = checkRolling({ ...open, lubrication: { ...open.lubrication, supply: 'none' } }, { sheet: false });

  it('sealed for life, the grease life falls short and gates', () => {
    const k = sealed.candidates.find((x) => x.designation === r.candidates.find((y) => y.id === r.best)!.designation)!;
    expect(checkOf(k, 'grease-life')!.pass).toBe(false);
  });

  it('open and regreased, the same bearing is feasible with an interval shorter than the life target', () => {
    const best = r.candidates.find((k) => k.id === r.best)!;
    expect(r.feasible).toBe(true);
    expect(checkOf(best, 'grease-life')).toBeUndefined();
    expect(best.relubricationHours!).toBeGreaterThan(0);
    expect(best.relubricationHours!).toBeLessThan(open.life.hours);
    // The open bearing takes its surroundings' contamination.
    expect(r.assumed.find((x) => x.field === 'environment.contamination')!.code).toBe('rolling.contamination');
  });
});

describe('contamination: sealed or open, and the bearing size (ISO 281:2007 guidance, from memory)', () => {
  it('each level is less severe for dm ≥ 100 mm, and the column changes at 100 mm', () => {
    for (const row of rollingFactors().contamination) {
      expect(row.eCLarge, row.level).toBeGreaterThanOrEqual(row.eC);
      expect(row.eCLarge).toBeGreaterThanOrEqual(row.lowLarge);
      expect(row.eCLarge).toBeLessThanOrEqual(row.highLarge);
      expect(contaminationFactor(row, EC_GUIDANCE_DM - 1e-6)).toBe(row.eC);
      expect(contaminationFactor(row, EC_GUIDANCE_DM)).toBe(row.eCLarge);
    }
  });

  it('fertiliser-dryer-trunnion: an open, regreased bearing keeps its dirty surroundings', () => {
    const r = checkRolling(duty('fertiliser-dryer-trunnion'), { sheet: false });
    const a = r.assumed.find((x) => x.field === 'environment.contamination')!;
    expect(a.code).toBe('rolling.contamination');
    expect(a.values['level']).toBe('dirty');
  });

  it('colliery-sump-pump-guide and trawler-stern-tube: a sealed bearing in water or severe dirt keeps its surroundings', () => {
    for (const id of ['colliery-sump-pump-guide', 'trawler-stern-tube']) {
      const r = checkRolling(duty(id), { sheet: false });
      const a = r.assumed.find((x) => x.field === 'environment.contamination')!;
      expect(a.code, id).toBe('rolling.contamination');
      expect(a.values['level'], id).toBe('severe');
    }
  });
});

describe('biscuit-oven-sprocket: grease and steel temperature, at any speed', () => {
  const lim = rollingRunning().temperatureLimits;
  const c = duty('biscuit-oven-sprocket');
  const r = checkRolling(c, { sheet: false });

  it('at 8 rpm (the static path) a greased bearing at 220 °C fails both limits and nothing is feasible', () => {
    expect(r.feasible).toBe(false);
    const rated = r.candidates.filter((k) => k.exclusions.length === 0);
    expect(rated.length).toBeGreaterThan(0);
    for (const k of rated) {
      expect(k.staticOnly).toBe(true);
      expect(checkOf(k, 'grease-temperature')!.pass).toBe(false);
      expect(checkOf(k, 'steel-temperature')!.pass).toBe(false);
      expect(checkOf(k, 'grease-temperature')!.limit).toBe(lim.grease);
    }
  });

  it('a cool duty passes both with the margin measured above the surroundings', () => {
    const cool = checkRolling({ ...c, environment: { ...c.environment, ambient: 20 } }, { sheet: false });
    expect(cool.feasible).toBe(true);
    const best = cool.candidates.find((k) => k.id === cool.best)!;
    const t = checkOf(best, 'steel-temperature')!;
    expect(t.pass).toBe(true);
    // (120 − 40)/(120 − 20): the bearing runs 20 K over a 20 °C room.
    expect(t.margin).toBeCloseTo((lim.steel - 40) / (lim.steel - 20), 9);
  });

  it('on circulating oil the grease limit does not apply, the steel limit does', () => {
    const hot = checkRolling(
      {
        ...c,
        environment: { ...c.environment, ambient: 20 },
        lubrication: { ...c.lubrication, supply: 'oil-feed', inletTemperature: 130 },
      },
      { sheet: false },
    );
    for (const k of hot.candidates.filter((x) => x.exclusions.length === 0)) {
      expect(checkOf(k, 'grease-temperature')).toBeUndefined();
      expect(checkOf(k, 'steel-temperature')!.pass).toBe(false);
    }
  });
});
