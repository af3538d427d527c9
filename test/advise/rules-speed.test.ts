// The speed rules read the speed the bearing sees (n·dm for a rolling bearing, the surface
// speed for a journal), never r/min alone. Guards the practice-matrix duty `boiler-feed-pump`
// (test/advise/matrix/duties-drives.ts): 4500 r/min on a 100 mm shaft was counted as a
// "moderate" speed for a rolling bearing because 4500 is below 6000 r/min, and rolling was
// scored above a feasible journal. Bands: common practice, stated in rules/speed-load.json.
import { describe, expect, it } from 'vitest';
import { advise } from '../../src/advise/engine.js';
import { dutyFacts, PITCH_DIAMETER_FACTOR } from '../../src/advise/facts.js';
import { loadRules } from '../../src/advise/load-rules.js';
import type { LoadedRule } from '../../src/advise/load-rules.js';
import { parseCaseText, validateCase } from '../../src/case/load.js';
import { ruleRunner } from '../../src/explore/rule-runner.js';
import { DUTIES } from './matrix/duties.js';

const rules = loadRules();
const runner = ruleRunner(rules);
const KERNEL = { sheet: false, pressureProfile: false } as const;

/** An invented oil-fed shaft (a test rig's idler) at the given diameter and speed. */
const shaft = (diameter: string, speed: string) =>
  validateCase({
    title: 'Test: speed bands of the rules (invented test-rig idler)',
    shaft: { diameter, speed },
    load: { radial: '4 kN', shock: 'none' },
    life: { hours: '20000 h', wearAllowance: '0.2 mm' },
    space: { maxLength: '200 mm', maxOuterDiameter: '400 mm' },
    lubrication: { supply: 'oil-feed', oil: 'ISO VG 46', inletTemperature: '40 degC' },
  }).case;

/** The names of the duty-only speed rules that fire on a case (no option figures needed). */
async function speedRulesFired(c: ReturnType<typeof shaft>): Promise<string[]> {
  const run = await runner.run({
    case: c,
    duty: dutyFacts(c),
    figures: {} as never,
    bushing: {} as never,
    rolling: {} as never,
    journal: {} as never,
  });
  return run.results.map((r) => r.name).filter((n) => n.startsWith('rolling-') && n.endsWith('-speed'));
}

const readsPath = (r: LoadedRule, path: string): boolean => JSON.stringify(r.conditions).includes(`"${path}"`);

describe('speed rules read the speed the bearing sees', () => {
  it('n·dm = n [r/min] × 1.3·d [mm]', () => {
    const f = dutyFacts(shaft('100 mm', '4500 rpm'));
    expect(PITCH_DIAMETER_FACTOR).toBe(1.3);
    expect(f.ndm).toBeCloseTo(4500 * 1.3 * 100, 6);
  });

  it('no rule reads r/min alone', () => {
    expect(rules.filter((r) => readsPath(r, '$.speedRpm')).map((r) => r.name)).toEqual([]);
  });

  it('the same 4500 r/min is moderate on a 30 mm shaft and high on a 100 mm one', async () => {
    expect(await speedRulesFired(shaft('30 mm', '4500 rpm'))).toEqual(['rolling-moderate-speed']);
    expect(await speedRulesFired(shaft('100 mm', '4500 rpm'))).toEqual(['rolling-high-speed']);
  });

  it('a slow large shaft is in the rolling band; a crawl on a small one is not', async () => {
    // 45 r/min on 150 mm: n·dm about 8 800 (a large slow rolling bearing is ordinary practice).
    expect(await speedRulesFired(shaft('150 mm', '45 rpm'))).toEqual(['rolling-moderate-speed']);
    // 120 r/min on 6 mm: n·dm about 940, a crawl.
    expect(await speedRulesFired(shaft('6 mm', '120 rpm'))).toEqual([]);
  });

  it('boiler-feed-pump: the journal is recommended over a feasible rolling bearing', async () => {
    const d = DUTIES.find((x) => x.id === 'boiler-feed-pump')!;
    const { case: c, assumed } = parseCaseText(d.yaml, d.id);
    const a = await advise(c, assumed, rules, { kernel: KERNEL, traces: false });
    expect(a.recommendation).toBe('journal');
    const rolling = a.ranking.find((r) => r.option === 'rolling')!;
    expect(rolling.reasons.map((r) => r.rule)).toContain('rolling-high-speed');
    expect(rolling.reasons.map((r) => r.rule)).not.toContain('rolling-moderate-speed');
  });
});
