// The advisor: scenario matrix (expected winners from common practice, the reason beside each),
// rule-file validation, determinism and the explain trace.
import { mkdtempSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { advise } from '../../src/advise/engine.js';
import { withToMakeFeasible } from '../../src/advise/to-feasible.js';
import { loadRules, RuleFileError } from '../../src/advise/load-rules.js';
import { validateCase } from '../../src/case/load.js';
import { runCli } from '../helpers/cli.js';
import { SCENARIOS } from './scenarios.js';
import { adviceText } from '../../src/report/advice-text.js';
import { renderNote } from '../../src/report/note/index.js';
import { describe as wordOf } from '../../src/report/findings/index.js';

describe('scenario matrix (expected winner: common practice)', () => {
  for (const s of SCENARIOS) {
    it(`${s.id} → ${s.expected}: ${s.why}`, async () => {
      const { case: c, assumed } = validateCase(s.case);
      const a = await advise(c, assumed);
      expect(a.recommendation).toBe(s.expected);
      const top = a.ranking[0]!;
      expect(top.feasible).toBe(true);
      expect(top.reasons.length).toBeGreaterThan(0);
      // Every excluded option says why.
      for (const r of a.ranking.filter((x) => !x.feasible)) expect(r.excluded.length).toBeGreaterThan(0);
      // Ranks are 1..3 and feasible options come first.
      expect(a.ranking.map((r) => r.rank)).toEqual([1, 2, 3]);
      const firstInfeasible = a.ranking.findIndex((r) => !r.feasible);
      if (firstInfeasible >= 0) expect(a.ranking.slice(firstInfeasible).every((r) => !r.feasible)).toBe(true);
    });
  }

  it('with no feasible option the recommendation is null and the advice says what would help', async () => {
    const loaded = validateCase({
      title: 'Overloaded test rig (no option can work)',
      shaft: { diameter: '20 mm', speed: '6000 rpm' },
      load: { radial: '40 kN', shock: 'heavy' },
      life: { hours: '50000 h', wearAllowance: '0.05 mm' },
      space: { maxLength: '10 mm', maxOuterDiameter: '30 mm' },
      lubrication: { supply: 'none' },
    });
    const a = await withToMakeFeasible(await advise(loaded.case, loaded.assumed), loaded);
    expect(a.recommendation).toBeNull();
    expect(a.ranking.every((r) => !r.feasible)).toBe(true);
    // Each option either has verified changes or says that no single change was found.
    const answered = [...a.toMakeFeasible.map((x) => x.option), ...a.noSingleChange.map((f) => f.values['option'])];
    expect(new Set(answered)).toEqual(new Set(['bushing', 'rolling', 'journal']));
  });

  it('priorities weigh the rules that name them: cost 5 scores the cost rule at 5/3 of its points', async () => {
    const s = SCENARIOS.find((x) => x.id === 'cost-above-all')!;
    const { case: c, assumed } = validateCase(s.case);
    const a = await advise(c, assumed);
    const cheap = a.ranking.find((r) => r.option === 'bushing')!.reasons.find((r) => r.rule === 'bushing-cheapest')!;
    expect(cheap.weight).toBeCloseTo(5 / 3, 2);
    expect(cheap.points).toBeCloseTo(3 * (5 / 3), 2);
  });
});

describe('ranking table', () => {
  // An invented sawmill roller where only the rolling bearing passes its checks: the excluded
  // bushing's rule points sum above the winner's score, so a score there would read as a better rank.
  const loaded = validateCase({
    title: 'Test: sawmill roller, excluded option scored above the winner (invented)',
    shaft: { diameter: '40 mm', speed: '250 rpm' },
    load: { radial: '3 kN', shock: 'moderate' },
    life: { hours: '20000 h', wearAllowance: '0.2 mm' },
    space: { maxLength: '60 mm', maxOuterDiameter: '90 mm' },
    lubrication: { supply: 'grease' },
    environment: { contamination: 'dirty' },
    priorities: { cost: 4, friction: 2, maintenance: 4, noise: 2, precision: 2 },
  });
  const advice = advise(loaded.case, loaded.assumed);

  it('the premise holds: an excluded option whose score is above the winner’s', async () => {
    const a = await advice;
    const out = a.ranking.filter((r) => !r.feasible);
    expect(a.ranking[0]!.feasible).toBe(true);
    expect(out.some((r) => r.score > a.ranking[0]!.score)).toBe(true);
  });

  it('text: feasible options first, an excluded one shows "excluded" and its first reason, not its score', async () => {
    const a = await advice;
    const text = adviceText(a, 'SI');
    const lines = text.split('\n');
    const head = lines.findIndex((l) => /^\s+rank\s+option\s+score/.test(l));
    expect(head).toBeGreaterThan(0);
    expect(lines[head]).toMatch(/excluded because/);
    for (const r of a.ranking) {
      const row = lines.slice(head + 2, head + 5).find((l) => new RegExp(`^\\s+${r.rank}\\s+${r.option}\\b`).test(l))!;
      expect(row, r.option).toBeDefined();
      if (r.feasible) expect(row).toContain(r.score.toFixed(2));
      else {
        expect(row).toMatch(/\bexcluded\b/);
        expect(row).not.toContain(r.score.toFixed(2));
        expect(row).toContain(wordOf(r.excluded[0]!).slice(0, 30));
      }
    }
  });

  it('Markdown and HTML notes: the same reading', async () => {
    const a = await advice;
    const out = a.ranking.find((r) => !r.feasible)!;
    const md = await renderNote(loaded, a, 'md', { units: 'SI', journalCurves: null });
    // The summary table: one row per option, "1. Rolling bearing | yes | 2.00 | …".
    const row = md.split('\n').find((l) => l.startsWith(`| ${out.rank}. `))!;
    expect(row).toMatch(/\| NO \| excluded \|/);
    expect(row).not.toContain(`| ${out.score.toFixed(2)} |`);
    const html = await renderNote(loaded, a, 'html', { units: 'SI', journalCurves: null });
    expect(html).toMatch(/>excluded</);
    expect(html).not.toMatch(new RegExp(`>${out.score.toFixed(2).replace('.', '\\.')}<`));
  });
});

describe('rule files', () => {
  it('every shipped rule file validates, names are unique, and every rule says why', () => {
    const rules = loadRules();
    expect(rules.length).toBeGreaterThanOrEqual(30);
    expect(new Set(rules.map((r) => r.file)).size).toBeGreaterThanOrEqual(11);
    for (const r of rules) {
      expect(r.because.length).toBeGreaterThan(20);
      expect(r.source).toMatch(/common practice|ISO|\d{4}/);
    }
  });

  function dirWith(files: Record<string, unknown>): URL {
    const d = mkdtempSync(join(tmpdir(), 'shaftwise-rules-'));
    mkdirSync(d, { recursive: true });
    for (const [name, body] of Object.entries(files))
      writeFileSync(join(d, name), typeof body === 'string' ? body : JSON.stringify(body));
    return pathToFileURL(d + '/');
  }
  const good = {
    name: 'ok-rule',
    because: 'A sentence a reviewer can read.',
    source: 'common practice',
    conditions: { all: [{ fact: 'duty', path: '$.speedRpm', operator: 'greaterThan', value: 10 }] },
    event: { type: 'score', option: 'rolling', points: 1 },
  };

  const bad: [string, unknown, RegExp][] = [
    ['not JSON', '{ "concern": ', /rules\/x\.json: not valid JSON/],
    [
      'unknown fact',
      {
        concern: 'c',
        description: 'd',
        rules: [{ ...good, conditions: { all: [{ fact: 'weather', operator: 'equal', value: 1 }] } }],
      },
      /rules\/x\.json: rule "ok-rule", field conditions.*fact "weather" is not one of/,
    ],
    [
      'unknown operator',
      {
        concern: 'c',
        description: 'd',
        rules: [{ ...good, conditions: { all: [{ fact: 'duty', path: '$.speedRpm', operator: 'bigger', value: 1 }] } }],
      },
      /rule "ok-rule".*operator "bigger" is not one of/,
    ],
    [
      'zero points',
      { concern: 'c', description: 'd', rules: [{ ...good, event: { type: 'score', option: 'rolling', points: 0 } }] },
      /rule "ok-rule", field event.points: points must not be 0/,
    ],
    [
      'unknown option',
      { concern: 'c', description: 'd', rules: [{ ...good, event: { type: 'exclude', option: 'magnetic' } }] },
      /rule "ok-rule", field event.option/,
    ],
    [
      'missing because',
      { concern: 'c', description: 'd', rules: [{ ...good, because: undefined }] },
      /rule "ok-rule", field because/,
    ],
  ];
  for (const [name, body, message] of bad) {
    it(`a bad rule file (${name}) names the file and the rule`, () => {
      expect(() => loadRules(dirWith({ 'x.json': body }))).toThrow(RuleFileError);
      expect(() => loadRules(dirWith({ 'x.json': body }))).toThrow(message);
    });
  }
  it('a rule name used twice is refused, naming both files', () => {
    const f = { concern: 'c', description: 'd', rules: [good] };
    expect(() => loadRules(dirWith({ 'a.json': f, 'b.json': f }))).toThrow(
      /rules\/b\.json: rule "ok-rule": the name is already used in rules\/a\.json/,
    );
  });
});

describe('shaftwise advise (built CLI)', () => {
  const DEMO = 'examples/sawmill-infeed-roller.yaml';
  it('gives byte-identical JSON for the same case', () => {
    const a = runCli(['advise', DEMO, '--format', 'json']);
    const b = runCli(['advise', DEMO, '--format', 'json']);
    expect(a.code).toBe(0);
    expect(a.stdout).toBe(b.stdout);
    const j = JSON.parse(a.stdout);
    for (const k of ['recommendation', 'ranking', 'checks', 'assumed', 'warnings']) expect(j).toHaveProperty(k);
    for (const r of j.ranking)
      for (const k of ['option', 'rank', 'score', 'feasible', 'design', 'figures', 'reasons', 'failed'])
        expect(r).toHaveProperty(k);
    expect(Object.keys(j.checks).sort()).toEqual(['bushing', 'journal', 'rolling']);
    expect(j.checks.rolling.option).toBe('rolling');
  });

  it('--explain lists every rule, fired or not, with the values seen, and the calculation sheet', () => {
    const r = runCli(['advise', DEMO, '--explain']);
    expect(r.code).toBe(0);
    for (const rule of loadRules()) expect(r.stdout).toContain(rule.name);
    expect(r.stdout).toMatch(/saw /);
    expect(r.stdout).toMatch(/Calculation sheet/);
    expect(r.stdout).toMatch(/P = F\/\(D·L\)/);
    const j = JSON.parse(runCli(['advise', DEMO, '--format', 'json', '--explain']).stdout);
    expect(j.rules.length).toBe(loadRules().length);
    expect(j.rules.some((x: { fired: boolean }) => x.fired)).toBe(true);
    expect(j.rules.some((x: { fired: boolean }) => !x.fired)).toBe(true);
  });
});
