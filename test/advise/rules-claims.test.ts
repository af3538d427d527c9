// Rules that claim a computed property ("its friction is the lowest", "it is the shortest",
// "self-lubricating") fire only when this case's figures say so. Each claim is tried both ways
// on figures set by hand (so the test fails if a condition is dropped), then on invented duties
// run through the whole advisor.
import { describe, expect, it } from 'vitest';
import { advise } from '../../src/advise/engine.js';
import { compareFigures, dutyFacts, type Figures, type OptionFigures } from '../../src/advise/facts.js';
import { loadRules } from '../../src/advise/load-rules.js';
import type { Condition } from '../../src/advise/rule-schema.js';
import { validateCase } from '../../src/case/load.js';
import type { OptionName } from '../../src/core/options.js';
import { ruleRunner } from '../../src/explore/rule-runner.js';

const rules = loadRules();
const runner = ruleRunner(rules);

/** An invented oil-fed line shaft; each test changes what it needs. */
const baseCase = (over: Record<string, unknown> = {}) =>
  validateCase({
    title: 'Test: claims of the rules (invented)',
    shaft: { diameter: '50 mm', speed: '1500 rpm' },
    load: { radial: '4 kN', shock: 'none' },
    life: { hours: '20000 h', wearAllowance: '0.2 mm' },
    space: { maxLength: '60 mm', maxOuterDiameter: '110 mm' },
    lubrication: { supply: 'oil-feed', oil: 'ISO VG 46', inletTemperature: '40 degC' },
    ...over,
  }).case;

const option = (f: Partial<OptionFigures>): OptionFigures => ({
  feasible: true,
  design: {},
  lifeHours: null,
  lifeRatio: null,
  frictionPower: null,
  length: null,
  outerDiameter: null,
  failed: [],
  why: [],
  ...f,
});

/** The rules that fire for hand-set figures (compared as advise compares them) on a case. */
async function fired(figs: Partial<Record<OptionName, Partial<OptionFigures>>>, c = baseCase()): Promise<Set<string>> {
  const figures: Figures = compareFigures({
    bushing: option(figs.bushing ?? {}),
    rolling: option(figs.rolling ?? {}),
    journal: option(figs.journal ?? {}),
  });
  const run = await runner.run({
    case: c,
    duty: dutyFacts(c),
    figures,
    bushing: {} as never,
    rolling: {} as never,
    journal: {} as never,
  });
  return new Set(run.results.map((r) => r.name));
}

const facts = (c: Condition): string[] =>
  'all' in c ? c.all.flatMap(facts) : 'any' in c ? c.any.flatMap(facts) : 'not' in c ? facts(c.not) : [c.fact];

describe('every rule whose reason claims a computed figure reads the figures', () => {
  // A "because" that speaks of computed figures, of what was found, or of the material chosen.
  const claims = /\bcomputed\b|\bfound\b|\bthe check finds\b|\bmaterial chosen\b/;
  const claiming = rules.filter((r) => claims.test(r.because));
  it('there are such rules (friction, life, space, lubrication)', () => {
    expect(claiming.map((r) => r.name)).toEqual(
      expect.arrayContaining([
        'journal-lowest-friction',
        'rolling-lowest-friction',
        'bushing-boundary-friction',
        'journal-longest-life',
        'bushing-life-margin',
        'rolling-life-margin',
        'rolling-tight-axial',
        'bushing-tight-radial',
        'bushing-needs-no-supply',
        'bushing-self-lubricating',
      ]),
    );
  });
  for (const r of claiming)
    it(`${r.name} has a condition on the figures`, () => {
      expect(facts(r.conditions as Condition)).toContain('figures');
    });
});

describe('friction claims follow the computed friction power', () => {
  it('the journal is not credited with low friction at 17 times the rolling bearing’s', async () => {
    const f = await fired({ journal: { frictionPower: 1700 }, rolling: { frictionPower: 100 } });
    expect(f.has('journal-lowest-friction')).toBe(false);
    expect(f.has('rolling-lowest-friction')).toBe(true);
  });
  it('the journal is credited where its friction is the lowest of the feasible options', async () => {
    const f = await fired({ journal: { frictionPower: 40 }, rolling: { frictionPower: 100 } });
    expect(f.has('journal-lowest-friction')).toBe(true);
    expect(f.has('rolling-lowest-friction')).toBe(false);
  });
  it('an option that fails its checks is neither credited nor counted', async () => {
    // The journal's nearest miss runs cooler, but it is not an option: the rolling bearing is the lowest.
    const f = await fired({
      journal: { feasible: false, frictionPower: 1 },
      rolling: { frictionPower: 60 },
      bushing: { frictionPower: 900 },
    });
    expect(f.has('journal-lowest-friction')).toBe(false);
    expect(f.has('rolling-lowest-friction')).toBe(true);
  });
  it('the only feasible option is not called the lowest of one', async () => {
    const f = await fired({ rolling: { frictionPower: 60 }, journal: { feasible: false, frictionPower: 900 } });
    expect(f.has('rolling-lowest-friction')).toBe(false);
  });
  it('a difference under 5 W is no reason (common practice)', async () => {
    const f = await fired({ rolling: { frictionPower: 0.1 }, bushing: { frictionPower: 3 } });
    expect(f.has('rolling-lowest-friction')).toBe(false);
    expect(f.has('bushing-boundary-friction')).toBe(false);
  });
  it('the bushing is charged for friction only at twice and 5 W above the lowest', async () => {
    expect(
      (await fired({ bushing: { frictionPower: 30 }, rolling: { frictionPower: 60 } })).has(
        'bushing-boundary-friction',
      ),
    ).toBe(false);
    expect(
      (await fired({ bushing: { frictionPower: 90 }, rolling: { frictionPower: 60 } })).has(
        'bushing-boundary-friction',
      ),
    ).toBe(false);
    expect(
      (await fired({ bushing: { frictionPower: 130 }, rolling: { frictionPower: 60 } })).has(
        'bushing-boundary-friction',
      ),
    ).toBe(true);
  });
});

describe('life claims follow the computed life and the check', () => {
  const longTarget = baseCase({ life: { hours: '60000 h', wearAllowance: '0.2 mm' } });
  it('the journal is not said to last while its film does not hold', async () => {
    expect((await fired({ journal: { feasible: false } }, longTarget)).has('journal-longest-life')).toBe(false);
    expect((await fired({ journal: { feasible: true } }, longTarget)).has('journal-longest-life')).toBe(true);
  });
  it('a margin of three times the target is claimed only at three times', async () => {
    const f2 = await fired({ bushing: { lifeRatio: 2 }, rolling: { lifeRatio: 2.9 } });
    expect(f2.has('bushing-life-margin') || f2.has('rolling-life-margin')).toBe(false);
    const f4 = await fired({ bushing: { lifeRatio: 4 }, rolling: { lifeRatio: 3 } });
    expect(f4.has('bushing-life-margin') && f4.has('rolling-life-margin')).toBe(true);
  });
});

describe('size claims follow the computed sizes', () => {
  const tightAxial = baseCase({ space: { maxLength: '20 mm', maxOuterDiameter: '110 mm' } });
  it('the rolling bearing is called the shortest only where it is', async () => {
    const shorter = { bushing: { length: 0.012 }, rolling: { length: 0.018 } };
    expect((await fired(shorter, tightAxial)).has('rolling-tight-axial')).toBe(false);
    const longer = { bushing: { length: 0.02 }, rolling: { length: 0.015 } };
    expect((await fired(longer, tightAxial)).has('rolling-tight-axial')).toBe(true);
  });
  const tightRadial = baseCase({ space: { maxLength: '60 mm', maxOuterDiameter: '58 mm' } });
  it('the bushing is called the slimmest only where it is feasible and slimmest', async () => {
    const slim = { bushing: { outerDiameter: 0.055 }, rolling: { outerDiameter: 0.058 } };
    expect((await fired(slim, tightRadial)).has('bushing-tight-radial')).toBe(true);
    const out = { bushing: { feasible: false, outerDiameter: 0.055 }, rolling: { outerDiameter: 0.058 } };
    expect((await fired(out, tightRadial)).has('bushing-tight-radial')).toBe(false);
  });
});

describe('the self-lubricating credit follows the material’s need', () => {
  const dry = baseCase({ lubrication: { supply: 'none' } });
  const credited = ['bushing-needs-no-supply', 'bushing-self-lubricating'];
  for (const needs of ['grease', 'oil', null])
    it(`no credit for a material that needs ${String(needs)}`, async () => {
      const f = await fired({ bushing: { design: { material: 'm', needs } } }, dry);
      for (const r of credited) expect(f.has(r), r).toBe(false);
    });
  it('credit for a material that needs none, on a machine with no supply', async () => {
    const f = await fired({ bushing: { design: { material: 'm', needs: 'none' } } }, dry);
    for (const r of credited) expect(f.has(r), r).toBe(true);
  });
});

describe('invented duties through the whole advisor', () => {
  it('a fast, heavily loaded 80 mm shaft on pumped oil: the journal runs at high speed but is not called low-friction', async () => {
    const c = baseCase({
      title: 'Test: textile-mill drying-cylinder drive shaft (invented)',
      shaft: { diameter: '80 mm', speed: '1500 rpm' },
      load: { radial: '8 kN', shock: 'none' },
      life: { hours: '40000 h', wearAllowance: '0.1 mm' },
      space: { maxLength: '150 mm', maxOuterDiameter: '250 mm' },
      lubrication: { supply: 'oil-feed', oil: 'ISO VG 100', inletTemperature: '40 degC' },
    });
    const a = await advise(c, []);
    const by = (o: OptionName) => a.ranking.find((r) => r.option === o)!;
    const j = by('journal');
    const r = by('rolling');
    // The premise, from the checks: both feasible, the journal's friction power well above the rolling bearing's.
    expect(j.feasible && r.feasible).toBe(true);
    expect(j.figures.frictionPower!).toBeGreaterThan(2 * r.figures.frictionPower!);
    const journalWords = j.reasons.filter((x) => x.points > 0).map((x) => x.because);
    expect(journalWords.join('\n')).not.toMatch(/friction[^.]*\blow/i);
    expect(j.reasons.map((x) => x.rule)).toContain('journal-high-speed');
    expect(r.reasons.map((x) => x.rule)).toContain('rolling-lowest-friction');
  });

  it('a periodically greased bronze on a machine with no lubricant is not credited as self-lubricating', async () => {
    const c = baseCase({
      title: 'Test: greenhouse vent-arm pivot, greased bronze named (invented)',
      shaft: { diameter: '30 mm', speed: '20 rpm' },
      load: { radial: '1.5 kN', shock: 'none' },
      life: { hours: '5000 h', wearAllowance: '0.3 mm' },
      space: { maxLength: '40 mm', maxOuterDiameter: '45 mm' },
      lubrication: { supply: 'none' },
      bushing: { material: 'greased-bronze' },
    });
    const a = await advise(c, []);
    const b = a.ranking.find((r) => r.option === 'bushing')!;
    expect(b.design.needs).toBe('grease');
    const rulesFired = b.reasons.map((x) => x.rule);
    expect(rulesFired).not.toContain('bushing-needs-no-supply');
    expect(rulesFired).not.toContain('bushing-self-lubricating');
  });

  it('the same pivot with sintered bronze (needs none) is credited', async () => {
    const c = baseCase({
      title: 'Test: greenhouse vent-arm pivot, sintered bronze (invented)',
      shaft: { diameter: '30 mm', speed: '20 rpm' },
      load: { radial: '1.5 kN', shock: 'none' },
      life: { hours: '5000 h', wearAllowance: '0.3 mm' },
      space: { maxLength: '40 mm', maxOuterDiameter: '45 mm' },
      lubrication: { supply: 'none' },
      bushing: { material: 'sintered-bronze' },
    });
    const a = await advise(c, []);
    const b = a.ranking.find((r) => r.option === 'bushing')!;
    expect(b.design.needs).toBe('none');
    expect(b.reasons.map((x) => x.rule)).toContain('bushing-needs-no-supply');
  });
});
