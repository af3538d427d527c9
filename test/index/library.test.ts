// The public library entry (src/index.ts) against the CLI it must agree with: for every demo
// case, advise(parseCase(text)) is the object `advise FILE --format json` prints, the note is
// what `advise --format md|html` prints, and a bad case throws CaseError naming each field.
// Not physics: these are agreement checks between two front doors to the same engine.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import * as lib from '../../src/index.js';
import {
  advise,
  CaseError,
  checkBushing,
  checkJournal,
  checkRolling,
  loadCase,
  parseCase,
  renderNote,
} from '../../src/index.js';
import { parseCaseText } from '../../src/case/load.js';
import { caseFileOf } from '../../src/case/base-units.js';
import { ROOT, runCli } from '../helpers/cli.js';

const EXAMPLES = [
  ...readdirSync(join(ROOT, 'examples')).filter((f) => f.endsWith('.yaml')),
  ...readdirSync(join(ROOT, 'examples/batch'))
    .filter((f) => f.endsWith('.yaml'))
    .map((f) => `batch/${f}`),
].sort();
const DEMO = join(ROOT, 'examples/sawmill-infeed-roller.yaml');

/** The CLI's JSON for a case file, parsed. */
function cliJson(file: string, extra: string[] = []): unknown {
  const r = runCli(['advise', file, '--format', 'json', ...extra]);
  expect(r.code, r.stderr).toBe(0);
  return JSON.parse(r.stdout);
}

describe('advise(parseCase(text)) is what `advise FILE --format json` prints', () => {
  it('finds the demo cases', () => {
    expect(EXAMPLES.length).toBeGreaterThanOrEqual(6);
  });

  for (const name of EXAMPLES) {
    it(name, async () => {
      const file = join(ROOT, 'examples', name);
      const c = parseCase(readFileSync(file, 'utf8'), file);
      const printed = cliJson(file) as { case: unknown };
      expect(await advise(c)).toEqual(printed);
      // The CLI's `case` is the case object written as a case file in base units, nothing added to it.
      expect(caseFileOf(c)).toEqual(printed.case);
    });
  }

  it('with explain: the rule trace too, as `--explain` prints it', async () => {
    const got = await advise(parseCase(readFileSync(DEMO, 'utf8')), { explain: true });
    const printed = cliJson(DEMO, ['--explain']) as { rules: unknown[] };
    expect(printed.rules.length).toBeGreaterThan(0);
    expect(got).toEqual(printed);
  });

  it('loadCase(path) reads the same case as parseCase(text)', async () => {
    const a = loadCase(DEMO);
    const b = parseCase(readFileSync(DEMO, 'utf8'));
    expect(a).toEqual(b);
    expect(await advise(a)).toEqual(await advise(b));
  });
});

describe('the loader assumptions belong to the case object the loader made', () => {
  // The irrigation case leaves fields to defaults, so its loader has assumptions to keep.
  const file = join(ROOT, 'examples/irrigation-pump-lineshaft.yaml');
  const text = readFileSync(file, 'utf8');
  const loaderAssumed = parseCaseText(text).assumed;

  it('a parsed case is advised with them; a copy of it (not made by the loader) without them', async () => {
    expect(loaderAssumed.length).toBeGreaterThan(0);
    const c = parseCase(text);
    const withThem = await advise(c);
    const copy = await advise(structuredClone(c));
    expect(withThem.assumed.slice(0, loaderAssumed.length)).toEqual(loaderAssumed);
    expect(copy.assumed).toEqual(withThem.assumed.slice(loaderAssumed.length));
    // Everything but the assumptions is the same advice.
    expect({ ...copy, assumed: [] }).toEqual({ ...withThem, assumed: [] });
  });
});

describe('the kernels are the ones advise runs', () => {
  it('checkBushing, checkRolling and checkJournal give the checks in the advice', async () => {
    const c = parseCase(readFileSync(DEMO, 'utf8'));
    const a = await advise(c);
    expect(checkBushing(c)).toEqual(a.checks.bushing);
    expect(checkRolling(c)).toEqual(a.checks.rolling);
    expect(checkJournal(c)).toEqual(a.checks.journal);
    // Findings come worded, as in the JSON: no { code, values } object reaches a library caller.
    expect(JSON.stringify(checkBushing(c))).not.toMatch(/"code":/);
  });
});

describe('renderNote(c, format) is what `advise FILE --format md|html` prints', () => {
  const EPOCH = '1700000000';
  for (const format of ['md', 'html'] as const) {
    it(`${format}, dated by SOURCE_DATE_EPOCH in the CLI and by opts.now in the library`, async () => {
      const r = runCli(['advise', DEMO, '--format', format], { env: { SOURCE_DATE_EPOCH: EPOCH } });
      expect(r.code, r.stderr).toBe(0);
      const text = await renderNote(loadCase(DEMO), format, { now: new Date(Number(EPOCH) * 1000) });
      expect(text).toBe(r.stdout);
      expect(text).toContain('2023-11-14');
    });
  }

  it('an unknown format or unit system is a UsageError naming the value', async () => {
    const c = loadCase(DEMO);
    await expect(renderNote(c, 'pdf' as never)).rejects.toThrow(/renderNote format: got "pdf"; expected md or html/);
    await expect(renderNote(c, 'md', { units: 'imperial' as never })).rejects.toBeInstanceOf(lib.UsageError);
  });
});

describe('bad input', () => {
  it('parseCase of a bad case throws CaseError with every problem, each naming its field', () => {
    const text = [
      'title: Bad case (invented)',
      'shaft: { diameter: 30 kg, speed: 300 rpm }',
      'load: { radial: 1.2 mm }',
      'life: { hours: 10000 h }',
      'space: { maxLength: 40 mm, maxOuterDiameter: 70 mm }',
    ].join('\n');
    let err: unknown;
    try {
      parseCase(text, 'bad.yaml');
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(CaseError);
    const ce = err as CaseError;
    expect(ce.source).toBe('bad.yaml');
    expect(ce.problems.map((p) => p.field).sort()).toEqual(['load.radial', 'shaft.diameter']);
    expect(ce.problems.find((p) => p.field === 'shaft.diameter')!.message).toMatch(
      /"30 kg" is a mass; expected a length/,
    );
  });

  it('loadCase of a missing file throws CaseError naming the file', () => {
    expect(() => loadCase(join(ROOT, 'examples/no-such-case.yaml'))).toThrow(CaseError);
  });
});

describe('the public names', () => {
  it('are the documented functions and error classes, nothing else at run time', () => {
    expect(Object.keys(lib).sort()).toEqual(
      [
        'CaseError',
        'DataError',
        'UsageError',
        'advise',
        'checkBushing',
        'checkJournal',
        'checkRolling',
        'loadCase',
        'parseCase',
        'renderNote',
      ].sort(),
    );
  });
});
