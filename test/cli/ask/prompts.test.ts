// The real prompts (inquirer's prompt module through our adapter), driven by keypresses on a
// fake terminal stream: Enter takes the default, a wrong unit is shown with its reason
// and asked again, Ctrl-C ends with the answers saved. Scenario data invented (a
// vineyard sprayer fan shaft).
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Writable } from 'node:stream';
import inquirer from 'inquirer';
import { render } from '@inquirer/testing';
import MuteStream from 'mute-stream';
import stripAnsi from 'strip-ansi';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { parseCaseText } from '../../../src/case/load.js';
import { checkAnswer, questionById } from '../../../src/cli/ask/questions.js';
import { inquirerPrompter } from '../../../src/cli/ask/prompts.js';
import { runAsk } from '../../../src/cli/ask/run.js';
import type { Prompter } from '../../../src/cli/ask/types.js';

/** The prompt inquirer runs for a question of type 'input' (its registry of built-in prompts). */
const input = inquirer.prompt.prompts['input']!;

describe('one real input prompt (@inquirer/testing render)', () => {
  it('re-asks "40 kg" for the diameter with the reason, then takes "40 mm"', async () => {
    const q = questionById('diameter')!;
    const validate = (t: string) => {
      const c = checkAnswer(q, t === '' ? '40 mm' : t, {});
      return c.ok ? true : c.message;
    };
    // Types of @inquirer/testing 2.1.9 predate inquirer 12's prompts; the runtime contract is the same.
    const { answer, events, getScreen } = await render(
      input as never,
      { message: q.message, default: '40 mm', validate } as never,
    );
    events.type('40 kg');
    events.keypress('enter');
    await new Promise((r) => setTimeout(r, 20));
    // The screen wraps at 80 columns and may drop the space at the break: compare without whitespace.
    const squash = (t: string) => t.replace(/\s+/g, '');
    expect(squash(getScreen())).toContain(
      squash('shaft.diameter: "40 kg" is a mass; expected a length such as "40 mm" or "1.5 in"'),
    );
    for (let i = 0; i < '40 kg'.length; i++) events.keypress('backspace');
    events.type('40 mm');
    events.keypress('enter');
    await expect(answer).resolves.toBe('40 mm');
  });
});

/** A fake terminal: keypresses go in, the screen text is collected. */
function terminal() {
  const inp = new MuteStream();
  inp.unmute();
  let screen = '';
  const out = new Writable({
    write(chunk, _enc, cb) {
      screen += chunk.toString();
      cb();
    },
  });
  // Each prompt pipes into the output and ends the pipe when done; a terminal outlives them.
  out.end = function (this: typeof out) {
    return this;
  } as typeof out.end;
  const key = (name: string, extra: Record<string, unknown> = {}) => inp.emit('keypress', null, { name, ...extra });
  const type = (text: string) => {
    inp.write(text);
    for (const ch of text) key(ch);
  };
  return { inp, out, key, type, screen: () => stripAnsi(screen) };
}

/**
 * What to type at a prompt: each entry is one try — text then Enter ('' = Enter alone);
 * for a select, the value to move down to; `^C` after the text presses Ctrl-C instead of Enter.
 */
type Tries = string[];

/** The real prompter; keys are played when a prompt whose message starts with a script key opens (others: Enter). */
async function keyed(script: Record<string, Tries>) {
  const t = terminal();
  const real = await inquirerPrompter({ input: t.inp, output: t.out });
  const wait = (ms: number) => new Promise((r) => setTimeout(r, ms));
  const prompter: Prompter = (spec) => {
    const pending = real(spec);
    const key = Object.keys(script).find((k) => spec.message.startsWith(k));
    const tries = key ? script[key]! : [''];
    void (async () => {
      let typed = '';
      for (const attempt of tries) {
        // Let the prompt attach its listeners (as @inquirer/testing does), or redraw after a refusal.
        await wait(10);
        for (let k = 0; k < typed.length; k++) t.key('backspace');
        const stop = attempt.endsWith('^C');
        const text = stop ? attempt.slice(0, -2) : attempt;
        if (spec.kind === 'select') {
          const at = spec.choices.findIndex((c) => c.value === text);
          const from = spec.choices.findIndex((c) => c.value === spec.default);
          for (let k = from; k < at; k++) t.key('down');
        } else if (text) t.type(text);
        typed = text;
        if (stop) t.key('c', { ctrl: true });
        else t.key('enter');
      }
    })();
    return pending;
  };
  return { prompter, t };
}

describe('the whole questionnaire on real prompts', () => {
  it('Enter at every prompt completes a case that validates, with each help line shown', async () => {
    const cwd = mkdtempSync(join(tmpdir(), 'shaftwise-ask-real-'));
    const { prompter, t } = await keyed({});
    const r = await runAsk({}, { advise: async () => 'advice text' }, { prompter, say: () => {}, cwd });
    expect(r.status).toBe('done');
    expect(() => parseCaseText(readFileSync(r.file, 'utf8'))).not.toThrow();
    expect(t.screen()).toContain('The bore of the support: sets bearing pressure');
    expect(t.screen()).toMatch(/Shaft diameter at the support 40 mm/);
  });

  it('typed answers, a wrong unit re-asked, selects moved to oil-feed and VG 100, Ctrl-C mid-answer: all saved, and resume finishes', async () => {
    const cwd = mkdtempSync(join(tmpdir(), 'shaftwise-ask-real-'));
    const { prompter, t } = await keyed({
      'Name of this': ['Vineyard sprayer fan shaft'],
      'Shaft diameter': ['25 kg', '25 mm'],
      'Shaft speed': ['2800 rpm'],
      'What lubrication': ['oil-feed'],
      'Which oil': ['ISO VG 100'],
      'Lubricant temperature': ['45 de^C'],
    });
    const r = await runAsk({}, { advise: async () => '' }, { prompter, say: () => {}, cwd });
    expect(r.status).toBe('interrupted');
    expect(t.screen().replace(/\n/g, '')).toContain('shaft.diameter: "25 kg" is a mass; expected a length');
    const text = readFileSync(r.file, 'utf8');
    const doc = parse(text);
    expect(doc.shaft).toEqual({ diameter: '25 mm', speed: '2800 rpm' });
    expect(doc.lubrication).toEqual({ supply: 'oil-feed', oil: 'ISO VG 100' });
    expect(doc.environment).toBeUndefined();
    expect(text).toContain('"draft":{"id":"inletTemperature","text":"45 de"}');

    const again = await keyed({ 'Lubricant temperature': ['45 degC'] });
    const done = await runAsk(
      { resume: r.file },
      { advise: async () => '' },
      { prompter: again.prompter, say: () => {}, cwd },
    );
    expect(done.status).toBe('done');
    const c = parseCaseText(readFileSync(r.file, 'utf8')).case;
    expect(c.lubrication.oilGrade).toBe(100);
    expect(c.lubrication.inletTemperature).toBe(45);
  });
});
