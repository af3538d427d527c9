import { mkdtempSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse, stringify } from 'yaml';
import { advise, type AdviceResult } from '../../src/advise/engine.js';
import { loadRules } from '../../src/advise/load-rules.js';
import { withToMakeFeasible, type FeasibleChange } from '../../src/advise/to-feasible.js';
import { loadCaseFile, validateCase, type LoadedCase } from '../../src/case/load.js';
import { adviceText } from '../../src/report/advice-text.js';
import { ROOT, runCli } from '../helpers/cli.js';
import { FAILING_CASES } from './to-feasible-cases.js';

const rules = loadRules();

/** The document with `field` set to `to`, written here independently of the code under test. */
function applied(doc: unknown, field: string, to: string): Record<string, unknown> {
  const out = JSON.parse(JSON.stringify(doc)) as Record<string, unknown>;
  const keys = field.split('.');
  let o = out;
  for (const k of keys.slice(0, -1)) o = (o[k] ??= {}) as Record<string, unknown>;
  o[keys.at(-1)!] = to;
  return out;
}

/** Whether `option` is feasible in a full advise (every kernel, every rule) of the document. */
async function feasibleIn(doc: unknown, option: string): Promise<boolean> {
  const l = validateCase(doc);
  const a = await advise(l.case, l.assumed, rules);
  return a.ranking.find((r) => r.option === option)!.feasible;
}

async function adviceOf(loaded: LoadedCase): Promise<AdviceResult> {
  return withToMakeFeasible(await advise(loaded.case, loaded.assumed, rules), loaded, rules);
}

const DIMENSIONED = new Set([
  'space.maxOuterDiameter',
  'space.maxLength',
  'life.hours',
  'life.wearAllowance',
  'bushing.length',
]);

/** Every entry re-run on its changed document; every failing option answered exactly once. */
async function expectVerified(loaded: LoadedCase, a: AdviceResult): Promise<void> {
  const failing = a.ranking.filter((r) => !r.feasible).map((r) => r.option);
  const withChange = new Set(a.toMakeFeasible.map((x) => x.option));
  const without = a.noSingleChange.map((f) => f.values['option']);
  expect([...withChange, ...without].sort()).toEqual([...failing].sort());
  for (const x of a.toMakeFeasible) {
    expect(x.verified).toBe(true);
    if (DIMENSIONED.has(x.field)) expect(x.to).toMatch(/^\d+(\.\d+)? [a-z]+$/);
    expect(await feasibleIn(applied(loaded.given, x.field, x.to), x.option), `${x.option} ${x.field} ${x.to}`).toBe(
      true,
    );
  }
}

const changesOf = (a: AdviceResult, option: string): FeasibleChange[] =>
  a.toMakeFeasible.filter((x) => x.option === option);

describe('what it would take: verified single changes', () => {
  const examples = readdirSync(join(ROOT, 'examples')).filter((f) => f.endsWith('.yaml'));
  for (const f of examples) {
    it(`${f}: every suggestion makes its option feasible when set in the case file`, async () => {
      const loaded = loadCaseFile(join(ROOT, 'examples', f));
      await expectVerified(loaded, await adviceOf(loaded));
    });
  }

  for (const [name, doc] of Object.entries(FAILING_CASES)) {
    it(`${name}: every suggestion makes its option feasible when set in the case file`, async () => {
      const loaded = validateCase(doc);
      await expectVerified(loaded, await adviceOf(loaded));
    });
  }

  it('a housing bore is the smallest whole millimetre that works: one mm less does not', async () => {
    const loaded = validateCase(FAILING_CASES.tightPivot);
    const a = await adviceOf(loaded);
    const bore = changesOf(a, 'rolling').find((x) => x.field === 'space.maxOuterDiameter');
    expect(bore).toBeDefined();
    expect(bore!.from).toBe('60 mm');
    const mm = Number(/^(\d+) mm$/.exec(bore!.to)![1]);
    expect(mm).toBeGreaterThan(60);
    expect(await feasibleIn(applied(loaded.given, 'space.maxOuterDiameter', `${mm - 1} mm`), 'rolling')).toBe(false);
  });

  it('a grease-life failure is not answered with more radial room (a larger series)', async () => {
    const loaded = validateCase(FAILING_CASES.sealedFan);
    const a = await adviceOf(loaded);
    const rolling = a.ranking.find((r) => r.option === 'rolling')!;
    expect(rolling.failed.map((k) => k.id)).toEqual(['grease-life']);
    const fields = changesOf(a, 'rolling').map((x) => x.field);
    expect(fields).not.toContain('space.maxOuterDiameter');
    expect(fields).toContain('lubrication.supply');
  });

  it('where life passes, the life target is left alone', async () => {
    const loaded = validateCase(FAILING_CASES.fastSpindle);
    const a = await adviceOf(loaded);
    const rolling = a.ranking.find((r) => r.option === 'rolling')!;
    expect(rolling.feasible).toBe(false);
    expect(rolling.failed.some((k) => k.unit === 'h')).toBe(false);
    expect(changesOf(a, 'rolling').map((x) => x.field)).not.toContain('life.hours');
  });

  it('a journal bearing on grease is told the oil supply it needs, with the default it had as from', async () => {
    const loaded = validateCase(FAILING_CASES.greasedFan);
    const a = await adviceOf(loaded);
    const supply = changesOf(a, 'journal').find((x) => x.field === 'lubrication.supply');
    expect(supply).toMatchObject({ from: 'grease', verified: true });
    expect(['oil-bath', 'oil-feed']).toContain(supply!.to);
  });

  it('a named bushing material that fails is answered with another material', async () => {
    const loaded = validateCase(FAILING_CASES.namedNylon);
    const a = await adviceOf(loaded);
    const m = changesOf(a, 'bushing').find((x) => x.field === 'bushing.material');
    expect(m?.from).toBe('nylon');
    expect(m?.to).not.toBe('nylon');
  });

  it('with no option feasible, the text starts with what it would take, the nearest option first', async () => {
    const loaded = validateCase(FAILING_CASES.tightPivot);
    const a = await adviceOf(loaded);
    expect(a.recommendation).toBeNull();
    const text = adviceText(a, 'SI');
    const take = text.indexOf('What it would take');
    expect(take).toBeGreaterThan(-1);
    expect(take).toBeLessThan(text.indexOf('rank'));
    expect(text.slice(take)).toMatch(new RegExp(`- ${a.toMakeFeasible[0]!.option}: feasible with `));
  });

  it('an option no single change rescues says so', async () => {
    const loaded = validateCase({
      title: 'Overloaded test rig (invented)',
      shaft: { diameter: '20 mm', speed: '6000 rpm' },
      load: { radial: '40 kN', shock: 'heavy' },
      life: { hours: '50000 h', wearAllowance: '0.05 mm' },
      space: { maxLength: '10 mm', maxOuterDiameter: '30 mm' },
      lubrication: { supply: 'none' },
    });
    const a = await adviceOf(loaded);
    expect(a.toMakeFeasible).toEqual([]);
    expect(adviceText(a, 'SI')).toMatch(/bushing: no single change found/);
  });
});

describe('what it would take, through the CLI', () => {
  it('an entry of the JSON, written into the case file, makes that option feasible when advised again', () => {
    const dir = mkdtempSync(join(tmpdir(), 'shaftwise-feasible-'));
    const file = join(dir, 'pivot.yaml');
    writeFileSync(file, stringify(FAILING_CASES.tightPivot));
    const first = runCli(['advise', file, '--format', 'json']);
    expect(first.code).toBe(0);
    const changes = (JSON.parse(first.stdout) as { toMakeFeasible: FeasibleChange[] }).toMakeFeasible;
    expect(changes.length).toBeGreaterThan(0);
    for (const x of changes) {
      const changed = join(dir, `${x.option}-${x.field}.yaml`);
      writeFileSync(changed, stringify(applied(parse(stringify(FAILING_CASES.tightPivot)), x.field, x.to)));
      const again = runCli(['advise', changed, '--format', 'json']);
      expect(again.code, again.stderr).toBe(0);
      const ranking = (JSON.parse(again.stdout) as { ranking: { option: string; feasible: boolean }[] }).ranking;
      expect(ranking.find((r) => r.option === x.option)!.feasible, `${x.field}: ${x.to}`).toBe(true);
    }
  });
});
