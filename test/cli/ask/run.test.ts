import { UsageError } from '../../../src/core/errors.js';
// The prompt runner driven by a scripted prompter (no terminal): saving as it goes,
// interrupt and resume, refusing to overwrite, the end (validate, advise, note).
// Scenario values are invented: an irrigation pump, a packaging-line crimper.
import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Command } from 'commander';
import { parse } from 'yaml';
import { afterEach, describe, expect, it } from 'vitest';
import { parseCaseText } from '../../../src/case/load.js';

import { registerAsk } from '../../../src/cli/ask/index.js';
import { runAsk } from '../../../src/cli/ask/run.js';
import { scripted, type Step } from './fake.js';

const fresh = () => mkdtempSync(join(tmpdir(), 'shaftwise-ask-'));

function session(steps: Step[], opts: { save?: string; resume?: string } = {}, cwd = fresh()) {
  const { prompter, asked } = scripted(steps);
  const said: string[] = [];
  const advised: string[] = [];
  const noted: string[] = [];
  const deps = {
    advise: async (p: string) => {
      advised.push(p);
      return `(advice for ${p})`;
    },
    offerNote: async (p: string) => void noted.push(p),
  };
  const run = () => runAsk(opts, deps, { prompter, say: (l) => said.push(l), cwd });
  return { run, asked, said, advised, noted, cwd, ids: () => asked.map((a) => a.spec.message) };
}

/** Ctrl-C at the n-th prompt (0-based), Enter before it. */
const interruptAt = (n: number, typed?: string): Step[] => [...Array<Step>(n).fill(''), { interrupt: true, typed }];

describe('a full run', () => {
  it('Enter at every question gives a case file that validateCase accepts, then the advice and the note', async () => {
    const s = session([]);
    const r = await s.run();
    expect(r.status).toBe('done');
    expect(r.file).toBe(join(s.cwd, 'shaftwise-case.yaml'));
    const text = readFileSync(r.file, 'utf8');
    const loaded = parseCaseText(text, r.file);
    expect(loaded.case.title).toBe('New shaft support (from shaftwise ask)');
    expect(loaded.case.space.maxOuterDiameter).toBeCloseTo(0.1, 12);
    // Quantities are kept as the strings typed, in the schema's keys.
    expect(parse(text).shaft).toEqual({ diameter: '40 mm', speed: '300 rpm' });
    expect(text).not.toMatch(/ask-state/);
    expect(s.advised).toEqual([r.file]);
    expect(s.said).toContain(`(advice for ${r.file})`);
    // The last prompt is the offer of the note; Enter takes its default (yes).
    expect(s.asked.at(-1)!.spec.kind).toBe('confirm');
    expect(s.noted).toEqual([r.file]);
    // The file name and how to resume were said before the first question.
    expect(s.said.some((l) => l.includes('shaftwise-case.yaml') && l.includes('shaftwise ask --resume'))).toBe(true);
  });

  it('the real advisor (src/cli/advise.ts) accepts the finished case', async () => {
    const { runAdvise } = await import('../../../src/cli/advise.js');
    const { prompter } = scripted([
      'Irrigation pump jackshaft',
      '30 mm',
      '',
      '1450 rpm',
      '1.2 kN',
      '',
      'light',
      '',
      '',
      '',
      '',
      'grease',
    ]);
    const said: string[] = [];
    await runAsk(
      {},
      { advise: (p) => runAdvise(p, { format: 'text', units: 'SI', explain: false }) },
      { prompter, say: (l) => said.push(l), cwd: fresh() },
    );
    expect(said.at(-1)).toMatch(/^Irrigation pump jackshaft\n/);
    expect(said.at(-1)).toMatch(/Recommended|No option is feasible/);
  });

  it('gives a help line with every question', async () => {
    const s = session([]);
    await s.run();
    for (const a of s.asked) expect(a.spec.help.length, a.spec.message).toBeGreaterThan(20);
  });

  it('does not ask for the note when no offerNote is given', async () => {
    const { prompter, asked } = scripted([]);
    const r = await runAsk({}, { advise: async () => 'ok' }, { prompter, say: () => {}, cwd: fresh() });
    expect(r.status).toBe('done');
    expect(asked.some((a) => a.spec.kind === 'confirm')).toBe(false);
  });

  it('an oscillating shaft with an oil feed, answered in US units, makes a valid case without a speed', async () => {
    // Order: title, diameter, motion, angle, frequency, radial, axial, shock, hours, wear, length, bore, supply, oil, inlet…
    const s = session([
      'Packaging line crimper arm',
      '1.25 in',
      'oscillating',
      '60 deg',
      '2 Hz',
      '450 lbf',
      '',
      'moderate',
      '',
      '0.01 in',
      '',
      '',
      'oil-feed',
      'ISO VG 46',
      '104 degF',
    ]);
    const r = await s.run();
    const c = parseCaseText(readFileSync(r.file, 'utf8')).case;
    expect(c.shaft.speed).toBeUndefined();
    expect(c.shaft.oscillation!.angle).toBeCloseTo(Math.PI / 3, 12);
    expect(c.load.radial).toBeCloseTo(450 * 4.4482216, 3);
    expect(c.lubrication.oilGrade).toBe(46);
    expect(c.lubrication.inletTemperature).toBeCloseTo(40, 9);
    expect(c.space.maxOuterDiameter).toBeCloseTo(3.125 * 0.0254, 12); // default: 2.5 × the diameter, in inches
    expect(s.ids()).not.toContain('Shaft speed');
  });
});

describe('a wrong answer', () => {
  it('"40 kg" for the diameter is refused with the reason and asked again; the file never holds it', async () => {
    const s = session(['Irrigation pump jackshaft', '40 kg', '40 mm']);
    const r = await s.run();
    const diameter = s.asked.find((a) => a.spec.message.startsWith('Shaft diameter'))!;
    expect(diameter.rejected).toEqual([
      'shaft.diameter: "40 kg" is a mass; expected a length such as "40 mm" or "1.5 in"',
    ]);
    const text = readFileSync(r.file, 'utf8');
    expect(text).not.toContain('40 kg');
    expect(parse(text).shaft.diameter).toBe('40 mm');
  });
});

describe('interrupt and resume', () => {
  it('Ctrl-C part-way leaves valid YAML with the answers so far and prints how to resume', async () => {
    // Title, diameter, motion, speed answered; Ctrl-C at the radial load.
    const s = session(['Irrigation pump jackshaft', '30 mm', 'rotating', '1450 rpm', { interrupt: true }]);
    const r = await s.run();
    expect(r.status).toBe('interrupted');
    const text = readFileSync(r.file, 'utf8');
    const doc = parse(text);
    expect(doc).toEqual({ title: 'Irrigation pump jackshaft', shaft: { diameter: '30 mm', speed: '1450 rpm' } });
    expect(text).toContain('# Continue with: shaftwise ask --resume shaftwise-case.yaml');
    expect(s.said.at(-1)).toMatch(
      /saved in shaftwise-case\.yaml\.\nContinue with: shaftwise ask --resume shaftwise-case\.yaml$/,
    );
    expect(s.advised).toEqual([]);
    expect(readdirSync(s.cwd)).toEqual(['shaftwise-case.yaml']); // no temporary file left
  });

  it('--resume continues from the first unanswered question and finishes a valid case', async () => {
    const first = session([
      'Irrigation pump jackshaft',
      '30 mm',
      'rotating',
      '1450 rpm',
      '1.2 kN',
      { interrupt: true },
    ]);
    const { file } = await first.run();
    const second = session(['', 'light'], { resume: file }, first.cwd);
    const r = await second.run();
    expect(r.status).toBe('done');
    expect(r.file).toBe(file);
    expect(second.asked[0]!.spec.message).toBe('Axial (thrust) load');
    expect(second.said[0]).toMatch(/^Resuming shaftwise-case\.yaml: 5 of \d+ questions answered\.$/);
    const c = parseCaseText(readFileSync(file, 'utf8')).case;
    expect(c.load.radial).toBe(1200);
    expect(c.load.shock).toBe('light');
    expect(c.shaft.speed).toBeCloseTo(1450 / 60, 12);
  });

  it('remembers an answer that has no case key (the motion) across the interrupt', async () => {
    const first = session(['Crimper arm', '25 mm', 'oscillating', { interrupt: true }]);
    const { file } = await first.run();
    expect(readFileSync(file, 'utf8')).toMatch(/# ask-state: \{"steer":\{"motion":"oscillating"\}\}/);
    const second = session([], { resume: file }, first.cwd);
    await second.run();
    expect(second.asked[0]!.spec.message).toBe('Total swing angle (end to end)');
    expect(parseCaseText(readFileSync(file, 'utf8')).case.shaft.oscillation).toBeDefined();
  });

  it('keeps the text typed into the interrupted question and offers it as the default on resume', async () => {
    const first = session(['Irrigation pump', { interrupt: true, typed: '1.5 in' }]);
    const { file } = await first.run();
    expect(readFileSync(file, 'utf8')).toContain('"draft":{"id":"diameter","text":"1.5 in"}');
    const second = session([''], { resume: file }, first.cwd);
    await second.run();
    expect(second.asked[0]!.spec.default).toBe('1.5 in');
    expect(second.said).toContain('  (what you had typed last time is offered as the default)');
    expect(parse(readFileSync(file, 'utf8')).shaft.diameter).toBe('1.5 in');
  });

  it('Ctrl-C at the very first question still leaves a file that resumes', async () => {
    const first = session(interruptAt(0));
    const { file, status } = await first.run();
    expect(status).toBe('interrupted');
    // Only the header: no keys yet (YAML reads a file of comments as null).
    expect(parse(readFileSync(file, 'utf8'))).toBeNull();
    expect(readFileSync(file, 'utf8')).toContain('# Continue with: shaftwise ask --resume shaftwise-case.yaml');
    const second = session([], { resume: file }, first.cwd);
    expect((await second.run()).status).toBe('done');
    expect(second.asked[0]!.spec.message).toBe('Name of this shaft support');
  });

  it('resume keeps keys and comments a person added by hand, and re-asks a saved value that does not pass', async () => {
    const cwd = fresh();
    const file = join(cwd, 'pump.yaml');
    writeFileSync(
      file,
      '# Pump house 3, checked by R.\ntitle: Irrigation pump jackshaft   # from the P&ID\nshaft:\n  diameter: 40 kg\nbushing:\n  material: sintered-bronze\n',
    );
    const s = session(['30 mm'], { resume: file }, cwd);
    await s.run();
    expect(s.said.some((l) => l.includes('The saved answer is not usable (shaft.diameter: "40 kg" is a mass'))).toBe(
      true,
    );
    const text = readFileSync(file, 'utf8');
    expect(text).toContain('# Pump house 3, checked by R.');
    expect(text).toContain('# from the P&ID');
    const c = parseCaseText(text).case;
    expect(c.shaft.diameter).toBeCloseTo(0.03, 12);
    expect(c.bushing?.material).toBe('sintered-bronze');
  });

  it('--resume with --save writes the continued case to the new file and leaves the old one as it was', async () => {
    const first = session(['Irrigation pump', '30 mm', { interrupt: true }]);
    const { file } = await first.run();
    const before = readFileSync(file, 'utf8');
    const second = session([], { resume: file, save: 'pump-final.yaml' }, first.cwd);
    const r = await second.run();
    expect(r.file).toBe(join(first.cwd, 'pump-final.yaml'));
    expect(readFileSync(file, 'utf8')).toBe(before);
    expect(parseCaseText(readFileSync(r.file, 'utf8')).case.shaft.diameter).toBeCloseTo(0.03, 12);
  });

  it('Ctrl-C at the offer of the note leaves the finished case and says so', async () => {
    const probe = session([]); // count the questions of a default run
    await probe.run();
    const questions = probe.asked.length - 1;
    const s = session(interruptAt(questions));
    const r = await s.run();
    expect(r.status).toBe('interrupted');
    expect(s.advised).toHaveLength(1);
    expect(s.noted).toEqual([]);
    expect(() => parseCaseText(readFileSync(r.file, 'utf8'))).not.toThrow();
    expect(s.said.at(-1)).toMatch(/No note written\. The case is complete in shaftwise-case\.yaml\./);
  });
});

describe('files it will not touch', () => {
  it('picks a numbered name when the default exists, and says which', async () => {
    const cwd = fresh();
    writeFileSync(join(cwd, 'shaftwise-case.yaml'), 'title: earlier work\n');
    writeFileSync(join(cwd, 'shaftwise-case-2.yaml'), 'title: more earlier work\n');
    const s = session([], {}, cwd);
    const r = await s.run();
    expect(r.file).toBe(join(cwd, 'shaftwise-case-3.yaml'));
    expect(readFileSync(join(cwd, 'shaftwise-case.yaml'), 'utf8')).toBe('title: earlier work\n');
    expect(s.said.some((l) => l.startsWith('Answers are saved to shaftwise-case-3.yaml'))).toBe(true);
  });

  it('refuses --save onto an existing file, pointing to --resume', async () => {
    const cwd = fresh();
    writeFileSync(join(cwd, 'mine.yaml'), 'title: keep me\n');
    const s = session([], { save: 'mine.yaml' }, cwd);
    await expect(s.run()).rejects.toThrow(UsageError);
    await expect(s.run()).rejects.toThrow(
      '--save mine.yaml: already exists; expected a new file name, or continue that file with: shaftwise ask --resume mine.yaml',
    );
    expect(readFileSync(join(cwd, 'mine.yaml'), 'utf8')).toBe('title: keep me\n');
    expect(s.asked).toEqual([]);
  });

  it('refuses a --save path in a folder that does not exist, before asking anything', async () => {
    const s = session([], { save: 'no-such-folder/pump.yaml' });
    await expect(s.run()).rejects.toThrow(
      /^cannot write the case file .*no-such-folder\/pump\.yaml \(no such directory\); expected a writable path \(choose one with --save FILE\)$/,
    );
    expect(s.asked).toEqual([]);
  });

  it('refuses a --resume file that is missing, not YAML, or not a mapping', async () => {
    const cwd = fresh();
    await expect(session([], { resume: 'nope.yaml' }, cwd).run()).rejects.toThrow(
      /--resume nope\.yaml: cannot be read \(no such file\)/,
    );
    writeFileSync(join(cwd, 'bad.yaml'), 'title: [unclosed\n');
    await expect(session([], { resume: 'bad.yaml' }, cwd).run()).rejects.toThrow(
      /--resume bad\.yaml: is not valid YAML/,
    );
    writeFileSync(join(cwd, 'list.yaml'), '- 1\n- 2\n');
    await expect(session([], { resume: 'list.yaml' }, cwd).run()).rejects.toThrow(
      '--resume list.yaml: holds a list; expected a mapping with the case keys (title, shaft, load…)',
    );
    expect(readFileSync(join(cwd, 'list.yaml'), 'utf8')).toBe('- 1\n- 2\n');
  });

  it('reports a finished case that does not validate (a bad hand-added key) as a CaseError and keeps the file', async () => {
    const cwd = fresh();
    writeFileSync(join(cwd, 'odd.yaml'), 'title: Irrigation pump\nrolling:\n  dynamicRating: 20 kN\n');
    const s = session([], { resume: 'odd.yaml' }, cwd);
    await expect(s.run()).rejects.toThrow(/rolling: gives only one of dynamicRating and staticRating/);
    expect(parse(readFileSync(join(cwd, 'odd.yaml'), 'utf8')).rolling).toEqual({ dynamicRating: '20 kN' });
  });
});

describe('no terminal', () => {
  it('throws a UsageError pointing to case files and shaftwise advise', async () => {
    const cwd = fresh();
    const r = runAsk({}, { advise: async () => '' }, { isTTY: false, cwd });
    await expect(r).rejects.toThrow(UsageError);
    await expect(runAsk({}, { advise: async () => '' }, { isTTY: false, cwd })).rejects.toThrow(
      /not one\. .*case file .*shaftwise advise CASE/,
    );
    expect(existsSync(join(cwd, 'shaftwise-case.yaml'))).toBe(false);
  });
});

describe('registerAsk on a commander program', () => {
  const saved = process.exitCode;
  afterEach(() => {
    process.exitCode = saved;
  });

  it('adds ask with --save, --resume and --force, and sets exit code 130 after Ctrl-C', async () => {
    const cwd = fresh();
    const { prompter } = scripted(['Irrigation pump', { interrupt: true }]);
    const program = new Command().exitOverride();
    registerAsk(program, { advise: async () => '' }, { prompter, say: () => {}, cwd });
    const ask = program.commands.find((c) => c.name() === 'ask')!;
    expect(ask.options.map((o) => o.long)).toEqual(['--save', '--resume', '--force']);
    await program.parseAsync(['node', 'shaftwise', 'ask', '--save', 'pump.yaml']);
    expect(process.exitCode).toBe(130);
    expect(parse(readFileSync(join(cwd, 'pump.yaml'), 'utf8'))).toEqual({ title: 'Irrigation pump' });
  });
});
