// Regression tests for the questionnaire's rough edges (issue 16, "The questionnaire"): the
// note at the end and an existing file, a hand-written case resumed, one question count,
// defaults that pass, the final yes/no and keys typed early, help wrapped at 80 columns, the
// default marker. Driven by the scripted prompter (fake.ts) and, where the terminal matters,
// by inquirer's real prompts on a stream. Scenario values are invented (an irrigation pump).
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PassThrough, Writable } from 'node:stream';
import stripAnsi from 'strip-ansi';
import { describe, expect, it } from 'vitest';
import { parseCaseText } from '../../../src/case/load.js';
import { helpLines, inquirerPrompter } from '../../../src/cli/ask/prompts.js';
import { QUESTIONS, questionById } from '../../../src/cli/ask/questions.js';
import { runAsk } from '../../../src/cli/ask/run.js';
import { wrapWords } from '../../../src/cli/ask/wrap.js';
import { scripted, type Step } from './fake.js';

const fresh = () => mkdtempSync(join(tmpdir(), 'shaftwise-ask-edges-'));

function session(steps: Step[], opts: { save?: string; resume?: string; force?: boolean } = {}, cwd = fresh()) {
  const { prompter, asked } = scripted(steps);
  const said: string[] = [];
  const noted: { file: string; note: string; force: boolean }[] = [];
  const deps = {
    advise: async () => '(advice)',
    offerNote: async (file: string, note: string, force: boolean) => {
      noted.push({ file, note, force });
      writeFileSync(note, 'new note');
    },
  };
  const run = () => runAsk(opts, deps, { prompter, say: (l) => said.push(l), cwd });
  return { run, asked, said, noted, cwd };
}

describe('the note offered at the end and an existing file', () => {
  it('without --force an existing note is left untouched, not offered, and the way to replace it is said', async () => {
    const cwd = fresh();
    writeFileSync(join(cwd, 'pump.note.html'), 'my earlier note');
    const s = session([], { save: 'pump.yaml' }, cwd);
    const r = await s.run();
    expect(r.status).toBe('done');
    expect(readFileSync(join(cwd, 'pump.note.html'), 'utf8')).toBe('my earlier note');
    expect(s.noted).toEqual([]);
    expect(s.asked.some((a) => a.spec.kind === 'confirm')).toBe(false);
    const said = s.said.join('\n').replace(/\s+/g, ' ');
    expect(said).toContain(
      'The design-review note pump.note.html already exists and was left untouched; pass --force to replace it',
    );
  });

  it('with --force the offer names the note it replaces and passes force on', async () => {
    const cwd = fresh();
    writeFileSync(join(cwd, 'pump.note.html'), 'my earlier note');
    const s = session([], { save: 'pump.yaml', force: true }, cwd);
    await s.run();
    expect(s.asked.at(-1)!.spec.message).toBe('Replace the design-review note pump.note.html now?');
    expect(s.noted).toEqual([{ file: join(cwd, 'pump.yaml'), note: join(cwd, 'pump.note.html'), force: true }]);
    expect(readFileSync(join(cwd, 'pump.note.html'), 'utf8')).toBe('new note');
  });

  it('a new note is offered by name, without force', async () => {
    const s = session([], { save: 'pump.yaml' });
    await s.run();
    expect(s.asked.at(-1)!.spec.message).toBe('Write the design-review note to pump.note.html now?');
    expect(s.noted.map((n) => n.force)).toEqual([false]);
  });
});

const HAND = `# Pump house 3, checked by R.
title:    "Irrigation pump jackshaft"   # from the P&ID

shaft:
    diameter: 30 mm     # measured on the old sleeve
    speed: 1450 rpm
load: {radial: 1.2 kN}
life:
    hours: 2.50e4 h
`;

describe('--resume on a hand-written case', () => {
  it('Ctrl-C before any answer leaves the file byte for byte as it was', async () => {
    const cwd = fresh();
    writeFileSync(join(cwd, 'pump.yaml'), HAND);
    const s = session([{ interrupt: true }], { resume: 'pump.yaml' }, cwd);
    expect((await s.run()).status).toBe('interrupted');
    expect(readFileSync(join(cwd, 'pump.yaml'), 'utf8')).toBe(HAND);
  });

  it('finishing keeps every line the person wrote, adds the answers in their layout, and no header', async () => {
    const cwd = fresh();
    writeFileSync(join(cwd, 'pump.yaml'), HAND);
    const s = session([], { resume: 'pump.yaml' }, cwd);
    await s.run();
    const text = readFileSync(join(cwd, 'pump.yaml'), 'utf8');
    expect(text).not.toMatch(/shaftwise ask|ask-state|Run: shaftwise/);
    // Every line of the original is still there, in order.
    const lines = text.split('\n');
    let at = 0;
    for (const l of HAND.trimEnd().split('\n')) {
      if (l.startsWith('load:')) continue; // the flow mapping gains its new keys inside the braces
      at = lines.indexOf(l, at);
      expect(at, l).toBeGreaterThanOrEqual(0);
    }
    expect(text).toContain('load: {radial: 1.2 kN, axial: 0 N, shock: none}\n');
    expect(text).toContain('    hours: 2.50e4 h\n    wearAllowance: 0.25 mm\n');
    const c = parseCaseText(text).case;
    expect(c.load.radial).toBe(1200);
    expect(c.life.hours).toBe(25000);
  });

  it('an answer left unfinished in a hand-written file is not kept there, and the user is told', async () => {
    const cwd = fresh();
    writeFileSync(join(cwd, 'pump.yaml'), HAND);
    const s = session([{ interrupt: true, typed: '0.5 k' }], { resume: 'pump.yaml' }, cwd);
    await s.run();
    expect(readFileSync(join(cwd, 'pump.yaml'), 'utf8')).toBe(HAND);
    expect(s.said.join(' ').replace(/\s+/g, ' ')).toContain('The unfinished answer "0.5 k" is not kept');
  });

  it('a file this tool started keeps its header, and a comment added by hand survives', async () => {
    const first = session(['Irrigation pump', { interrupt: true }], { save: 'pump.yaml' });
    await first.run();
    const file = join(first.cwd, 'pump.yaml');
    writeFileSync(file, readFileSync(file, 'utf8') + '# pump house 3\n');
    const second = session([], { resume: 'pump.yaml' }, first.cwd);
    await second.run();
    const text = readFileSync(file, 'utf8');
    expect(text.startsWith('# Duty case written by shaftwise ask.\n# Run: shaftwise advise pump.yaml\n')).toBe(true);
    expect(text).toContain('# pump house 3\n');
  });
});

describe('one question count', () => {
  it('the resume line and the place of each question agree; a value that is asked again is not counted', async () => {
    const cwd = fresh();
    writeFileSync(join(cwd, 'pump.yaml'), 'title: Pump\nshaft:\n  diameter: 40 kg\n  speed: 1450 rpm\n');
    const s = session([], { resume: 'pump.yaml' }, cwd);
    await s.run();
    // title, motion (read from the speed) and speed are usable; the diameter is not.
    const m = /^Resuming pump\.yaml: (\d+) of (\d+) questions answered\.$/.exec(s.said[0]!);
    expect(m?.slice(1)).toEqual(['3', '20']);
    const places = s.asked.flatMap((a) => (a.spec.kind === 'confirm' ? [] : [a.spec.position!]));
    expect(places[0]).toEqual({ n: 2, total: 20 }); // the diameter, asked again in its own place
    expect(places[1]).toEqual({ n: 5, total: 20 }); // then the first unanswered: the radial load
    expect(places.at(-1)).toEqual({ n: 20, total: 20 });
    expect(1 + places.length + 2).toBe(20); // the three usable answers plus every question asked
  });

  it('a fresh run numbers its questions 1..total, the total growing only when an answer adds questions', async () => {
    // Enter for the title … the radial space (11 questions), then an oil feed at the supply.
    const s = session([...Array<Step>(11).fill(''), 'oil-feed']);
    await s.run();
    const places = s.asked.flatMap((a) => (a.spec.kind === 'confirm' ? [] : [a.spec.position!]));
    expect(places.map((p) => p.n)).toEqual(places.map((_, i) => i + 1));
    expect(places.slice(0, 12).every((p) => p.total === 20)).toBe(true);
    expect(places.slice(12).every((p) => p.total === 22)).toBe(true);
    expect(places.at(-1)).toEqual({ n: 22, total: 22 }); // oil grade and inlet temperature added
  });
});

describe('defaults that pass', () => {
  it('an interrupted answer that would be refused is not offered; the question’s own default is', async () => {
    const first = session(['Pump', { interrupt: true, typed: '35 m' }]);
    const { file } = await first.run();
    const second = session([''], { resume: file }, first.cwd);
    await second.run();
    expect(second.asked[0]!.spec.default).toBe('40 mm');
    expect(second.asked[0]!.rejected).toEqual([]);
    expect(second.said.join('\n')).toContain('(what you had typed last time, "35 m", is not usable');
  });

  it('a saved value that does not pass is never the default', async () => {
    const cwd = fresh();
    writeFileSync(join(cwd, 'pump.yaml'), 'shaft:\n  diameter: 40 kg\n');
    const s = session(['', ''], { resume: 'pump.yaml' }, cwd);
    await s.run();
    const d = s.asked.find((a) => a.spec.message.startsWith('Shaft diameter'))!;
    expect(d.spec.default).toBe('40 mm');
    expect(d.rejected).toEqual([]);
  });

  it('every default offered in a full run passes its own validation', async () => {
    const s = session([]);
    await s.run();
    for (const a of s.asked)
      if (a.spec.kind === 'input') expect(a.spec.validate(a.spec.default), a.spec.message).toBe(true);
  });
});

/** A terminal made of streams: keys written to `inp` wait there until a prompt reads them. */
function streams() {
  const inp = new PassThrough();
  let screen = '';
  const out = new Writable({
    write(chunk, _enc, cb) {
      screen += chunk.toString();
      cb();
    },
  });
  out.end = function (this: typeof out) {
    return this;
  } as typeof out.end;
  return { inp, out, screen: () => stripAnsi(screen) };
}

const wait = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe('the final yes/no and keys typed before it appeared', () => {
  const spec = (fresh: boolean) =>
    ({ kind: 'confirm', message: 'Write the note?', help: 'The note.', default: true, fresh }) as const;

  it('"n" and Enter typed early do not answer it; it waits, and Enter then takes the default (yes)', async () => {
    const t = streams();
    const prompt = await inquirerPrompter({ input: t.inp, output: t.out });
    t.inp.write('n\r');
    let settled = false;
    const answer = prompt(spec(true)).then((v) => ((settled = true), v));
    await wait(150);
    expect(settled).toBe(false);
    t.inp.write('\r');
    await expect(answer).resolves.toBe(true);
  });

  it('control: without dropping them, the same early keys answer "no" at once', async () => {
    const t = streams();
    const prompt = await inquirerPrompter({ input: t.inp, output: t.out });
    t.inp.write('n\r');
    await expect(prompt(spec(false))).resolves.toBe(false);
  });
});

describe('the words on screen', () => {
  it('every help line fits 80 columns and breaks only between words', () => {
    for (const q of QUESTIONS) {
      const text = helpLines({
        kind: 'select',
        message: q.message,
        help: q.help,
        position: { n: 12, total: 22 },
        default: '',
        choices: [],
      });
      for (const line of text.split('\n')) expect(line.length, line).toBeLessThanOrEqual(80);
      expect(text.replace(/\s+/g, ' ').trim()).toBe(`(12 of 22) ${q.help}`);
    }
    expect(wrapWords('a '.repeat(60).trim(), 80, '  ').split('\n')[0]).toHaveLength(79);
    expect(wrapWords(`short ${'x'.repeat(90)} end`, 80)).toBe(`short\n${'x'.repeat(90)}\nend`);
  });

  it('the start line says the default is in [brackets], and the prompts show it so; every line within 80 columns', async () => {
    const t = streams();
    const prompt = await inquirerPrompter({ input: t.inp, output: t.out });
    const said: string[] = [];
    const cwd = fresh();
    const run = runAsk(
      {},
      { advise: async () => '', offerNote: async () => {} },
      {
        prompter: async (s) => {
          const p = prompt(s);
          await wait(80); // past the moment the final yes/no drops early keys
          t.inp.write('\r');
          return p;
        },
        say: (l) => said.push(l),
        cwd,
      },
    );
    expect((await run).status).toBe('done');
    expect(said.find((l) => l.startsWith('Answers are saved'))!.replace(/\s+/g, ' ')).toContain(
      'Enter takes the default shown in [brackets]',
    );
    const screen = t.screen();
    expect(screen).toContain(`${questionById('diameter')!.message} [40 mm]`);
    expect(screen).toContain('Write the design-review note to shaftwise-case.note.html now? [Y/n]');
    expect(screen).not.toMatch(/\(40 mm\)|\(Y\/n\)/);
    for (const l of said.join('\n').split('\n')) expect(l.length, l).toBeLessThanOrEqual(80);
    for (const l of screen.split('\n').filter((x) => x.startsWith('  ('))) expect(l.length, l).toBeLessThanOrEqual(80);
  });
});
