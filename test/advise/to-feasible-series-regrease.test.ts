// Kind: behaviour of two levers of "what it would take": the rolling bearing's dimension series
// and the regreasing plan's interval. Each found, verified here by a full advise of the case
// file with the change written in (independently of the code under test), and through the CLI.
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { stringify } from 'yaml';
import { advise, type AdviceResult } from '../../src/advise/engine.js';
import { loadRules } from '../../src/advise/load-rules.js';
import { withToMakeFeasible, type FeasibleChange } from '../../src/advise/to-feasible.js';
import { validateCase } from '../../src/case/load.js';
import { adviceText } from '../../src/report/advice-text.js';
import { runCli } from '../helpers/cli.js';
import { FAILING_CASES } from './to-feasible-cases.js';

const rules = loadRules();

function applied(doc: unknown, field: string, to: unknown): Record<string, unknown> {
  const out = JSON.parse(JSON.stringify(doc)) as Record<string, unknown>;
  const keys = field.split('.');
  let o = out;
  for (const k of keys.slice(0, -1)) o = (o[k] ??= {}) as Record<string, unknown>;
  o[keys.at(-1)!] = to;
  return out;
}

async function adviceOf(doc: unknown): Promise<AdviceResult> {
  const l = validateCase(structuredClone(doc));
  return withToMakeFeasible(await advise(l.case, l.assumed, rules), { given: doc, assumed: l.assumed }, rules);
}

async function feasibleIn(doc: unknown, option: string): Promise<boolean> {
  const l = validateCase(doc);
  return (await advise(l.case, l.assumed, rules)).ranking.find((r) => r.option === option)!.feasible;
}

const change = (a: AdviceResult, field: string): FeasibleChange | undefined =>
  a.toMakeFeasible.find((x) => x.option === 'rolling' && x.field === field);

describe('the regreasing plan as a lever', () => {
  const doc = FAILING_CASES.regreasePlan;

  it('fails only on the plan, and the plan is lowered to at most the interval the bearing needs', async () => {
    const a = await adviceOf(doc);
    const failed = a.ranking.find((r) => r.option === 'rolling')!.failed;
    expect(failed.map((k) => k.id)).toEqual(['regrease-interval']);
    const x = change(a, 'lubrication.regreaseInterval')!;
    expect(x).toMatchObject({ from: '4000 h', verified: true });
    const h = Number(/^(\d+) h$/.exec(x.to)![1]);
    expect(Number(h.toPrecision(2))).toBe(h); // a value a plan carries: two significant figures
    expect(h).toBeLessThan(4000);
    expect(h).toBeLessThanOrEqual(failed[0]!.value);
    expect(await feasibleIn(applied(doc, x.field, x.to), 'rolling')).toBe(true);
    // The smallest change: the next value up on the grid is not enough.
    const up = Number((h + 10 ** (Math.floor(Math.log10(h)) - 1)).toPrecision(2));
    expect(await feasibleIn(applied(doc, x.field, `${up} h`), 'rolling')).toBe(false);
    expect(adviceText(a, 'SI')).toContain(`regreasing every ${x.to} (lubrication.regreaseInterval: ${x.to})`);
  });
});

describe('the dimension series as a lever', () => {
  const doc = FAILING_CASES.lightSeries;

  it('a light series too weak is answered with the nearest series that works, the nearer one having failed', async () => {
    const a = await adviceOf(doc);
    expect(a.ranking.find((r) => r.option === 'rolling')!.feasible).toBe(false);
    const x = change(a, 'rolling.series')!;
    expect(x).toMatchObject({ from: '10', to: '03', verified: true });
    expect(await feasibleIn(applied(doc, x.field, x.to), 'rolling')).toBe(true);
    // Series 02 lies between 10 and 03 in size and is tried first: it does not carry the duty.
    expect(await feasibleIn(applied(doc, x.field, '02'), 'rolling')).toBe(false);
  });
});

describe('both levers through the CLI: the change written into the YAML file as a user writes it', () => {
  it('series 03 unquoted, and the plan interval, each make rolling feasible', () => {
    const dir = mkdtempSync(join(tmpdir(), 'shaftwise-levers-'));
    for (const [name, doc, field] of [
      ['series', FAILING_CASES.lightSeries, 'rolling.series'],
      ['plan', FAILING_CASES.regreasePlan, 'lubrication.regreaseInterval'],
    ] as const) {
      const file = join(dir, `${name}.yaml`);
      writeFileSync(file, stringify(doc));
      const first = runCli(['advise', file, '--format', 'json']);
      expect(first.code, first.stderr).toBe(0);
      const x = (JSON.parse(first.stdout) as { toMakeFeasible: FeasibleChange[] }).toMakeFeasible.find(
        (c) => c.option === 'rolling' && c.field === field,
      )!;
      expect(x, name).toBeDefined();
      // A user types series: 03 without quotes (YAML reads the number 3).
      const text = stringify(applied(doc, field, x.to)).replace(/series: "03"/, 'series: 03');
      if (name === 'series') expect(text).toContain('series: 03\n');
      const changed = join(dir, `${name}-changed.yaml`);
      writeFileSync(changed, text);
      const again = runCli(['advise', changed, '--format', 'json']);
      expect(again.code, again.stderr).toBe(0);
      const ranking = (JSON.parse(again.stdout) as { ranking: { option: string; feasible: boolean }[] }).ranking;
      expect(ranking.find((r) => r.option === 'rolling')!.feasible, `${field}: ${x.to}`).toBe(true);
    }
  });
});
