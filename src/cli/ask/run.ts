import { UsageError } from '../../core/errors.js';
import { existsSync } from 'node:fs';
import { relative, resolve } from 'node:path';
import { parse } from 'yaml';
import { validateCase } from '../../case/load.js';

import {
  answersFromCase,
  applies,
  checkAnswer,
  nextQuestion,
  progress,
  QUESTIONS,
  steeringAnswers,
  type Answers,
  type Question,
} from './questions.js';
import { applyAnswers, freeName, readSaved, renderCase, writeAtomic, type AskState } from './save.js';
import { WIDTH, wrapWords } from './wrap.js';
import type { AskDeps, AskHooks, AskOptions, Prompter, PromptSpec } from './types.js';

/**
 * The prompt runner: asks the next unanswered question, saves after every answer,
 * and finishes with validation and advice. The prompts themselves come in through
 * `Prompter`, so tests drive it without a terminal.
 */

/** Exit code after Ctrl-C: 128 + SIGINT (2), the shell's convention for "stopped by the user" — not bad input (2). */
export const EXIT_INTERRUPTED = 130;

export interface AskResult {
  status: 'done' | 'interrupted';
  file: string;
}

/** The error inquirer throws on Ctrl-C (ExitPromptError); matched by name so this module needs no prompt library. */
export function isInterrupt(e: unknown): boolean {
  return e instanceof Error && (e.name === 'ExitPromptError' || e.name === 'AbortPromptError');
}

/** The question's place among those that apply: the same count as the resume line (progress()). */
function positionOf(q: Question, a: Answers): { n: number; total: number } {
  const live = QUESTIONS.filter((x) => applies(x, a));
  return { n: live.indexOf(q) + 1, total: progress(a).total };
}

function specFor(q: Question, a: Answers, def: string, onDraft: (t: string) => void): PromptSpec {
  const position = positionOf(q, a);
  if (q.kind === 'choice') {
    const choices = q.choices!().map((c) => ({ ...c }));
    return {
      kind: 'select',
      message: q.message,
      help: q.help,
      position,
      default: choices.some((c) => c.value === def) ? def : q.default(a),
      choices,
    };
  }
  return {
    kind: 'input',
    message: q.message,
    help: q.help,
    position,
    default: def,
    validate: (text) => {
      const c = checkAnswer(q, text === '' ? def : text, a);
      return c.ok ? true : c.message;
    },
    onDraft,
  };
}

export interface Session {
  file: string;
  /** Directory that relative names in messages are relative to. */
  cwd: string;
  /** The file's text below this tool's header, edited answer by answer. */
  body: string;
  /** This tool wrote the file: only then does it carry the header (resume hint, steering state). */
  ours: boolean;
  answers: Answers;
  state: AskState;
  /** The text last written (or read): an unchanged file is not written again. */
  written?: string;
}

/** Save the session: the case keys answered so far, and in a file of ours the steering state in the header comment. */
function save(session: Session, done: boolean): void {
  session.body = applyAnswers(session.body, session.answers, QUESTIONS);
  session.state.steer = steeringAnswers(session.answers);
  const text = renderCase(session.body, session.ours, session.state, displayPath(session.file, session.cwd), done);
  if (text === session.written) return;
  writeAtomic(session.file, text);
  session.written = text;
}

/**
 * The default offered for a question: the text typed before an interrupt, else the default of
 * the question — whichever first passes the question's own check ('' when none does). A value
 * that would be refused is never offered, so Enter never meets a refusal.
 */
export function offeredDefault(q: Question, a: Answers, draft: string | undefined): string {
  for (const c of [draft, q.default(a)]) if (c !== undefined && c !== '' && checkAnswer(q, c, a).ok) return c;
  return '';
}

/** The file as the user should type it: relative to the working directory when inside it, quoted for a shell when needed. */
function displayPath(file: string, cwd: string): string {
  const rel = relative(cwd, file);
  const p = rel && !rel.startsWith('..') ? rel : file;
  return /[\s'"$`\\]/.test(p) ? `'${p.replace(/'/g, `'\\''`)}'` : p;
}

const NO_HEADER = 'the file was written by hand, and ask adds no header to it.';

/** Ask every unanswered question, saving as it goes. Returns false when interrupted. */
export async function runQuestions(session: Session, prompt: Prompter, say: (line: string) => void): Promise<boolean> {
  let section = '';
  for (let next = nextQuestion(session.answers); next; next = nextQuestion(session.answers)) {
    const q = next.question;
    if (q.section !== section) {
      section = q.section;
      say(`\n${section}`);
    }
    if (next.stale)
      say(wrapWords(`The saved answer is not usable (${next.stale.reason}); please answer again.`, WIDTH, '  '));
    const draft = session.state.draft?.id === q.id ? session.state.draft.text : undefined;
    const def = offeredDefault(q, session.answers, draft);
    if (draft !== undefined && def === draft) say(`  (what you had typed last time is offered as the default)`);
    else if (draft !== undefined)
      say(wrapWords(`(what you had typed last time, "${draft}", is not usable, so it is not offered)`, WIDTH, '  '));
    let typed = '';
    try {
      const got = await prompt(specFor(q, session.answers, def, (t) => (typed = t)));
      const c = checkAnswer(q, got === '' ? def : got, session.answers);
      // The prompt validated already; a prompter that did not is caught here, not in the file.
      if (!c.ok) throw new Error(`prompt returned an answer that does not pass: ${c.message}`);
      session.answers[q.id] = c.value;
      delete session.state.draft;
      save(session, false);
    } catch (e) {
      if (!isInterrupt(e)) throw e;
      if (q.kind !== 'choice' && typed.trim() !== '') {
        session.state.draft = { id: q.id, text: typed };
        // Only a file this tool started has the header that holds it; a person's file gets none.
        if (!session.ours) say(wrapWords(`\n(The unfinished answer "${typed}" is not kept: ${NO_HEADER})`));
      }
      save(session, false);
      return false;
    }
  }
  return true;
}

/** Where the note offered at the end goes: beside the case file, its name with .note.html. */
export function notePathFor(casePath: string): string {
  return casePath.replace(/\.(ya?ml|json)$/i, '') + '.note.html';
}

function resumeHint(session: Session): string {
  return `shaftwise ask --resume ${displayPath(session.file, session.cwd)}`;
}

/** Open the session: a fresh file (never over an existing one) or the file to resume. */
function open(opts: AskOptions, cwd: string, say: (l: string) => void): Session {
  if (opts.resume !== undefined) {
    const from = resolve(cwd, opts.resume);
    const file = opts.save !== undefined ? resolve(cwd, opts.save) : from;
    if (file !== from && existsSync(file)) {
      throw new UsageError(
        `--save ${opts.save}: already exists; expected a new file name (or leave out --save to continue ${opts.resume} in place)`,
      );
    }
    const saved = readSaved(from, opts.resume);
    const answers = answersFromCase(saved.doc, saved.state.steer);
    const p = progress(answers);
    say(
      wrapWords(
        `Resuming ${displayPath(from, cwd)}: ${p.answered} of ${p.total} questions answered.` +
          (file !== from ? ` Saving to ${displayPath(file, cwd)}.` : ''),
      ),
    );
    const body = saved.body;
    // Resumed in place, the file as read is what is on disk: nothing is written until an answer changes it.
    const written =
      file === from ? renderCase(body, saved.ours, saved.state, displayPath(file, cwd), false) : undefined;
    return { file, cwd, body, ours: saved.ours, answers, state: saved.state, written };
  }
  let file: string;
  if (opts.save !== undefined) {
    file = resolve(cwd, opts.save);
    if (existsSync(file)) {
      throw new UsageError(
        `--save ${opts.save}: already exists; expected a new file name, or continue that file with: shaftwise ask --resume ${opts.save}`,
      );
    }
  } else {
    file = freeName(resolve(cwd, 'shaftwise-case.yaml'));
  }
  return { file, cwd, body: '', ours: true, answers: {}, state: {} };
}

/** The whole `ask` command: open, ask, validate, advise, offer the note. */
export async function runAsk(opts: AskOptions, deps: AskDeps, hooks: AskHooks = {}): Promise<AskResult> {
  const say = hooks.say ?? ((l: string) => void process.stdout.write(l + '\n'));
  const tty = hooks.isTTY ?? (hooks.prompter ? true : process.stdin.isTTY === true);
  if (!tty) {
    throw new UsageError(
      'ask needs an interactive terminal, and standard input is not one. ' +
        'To run without questions, write the duty in a case file (see examples/sawmill-infeed-roller.yaml and the README) and run: shaftwise advise CASE',
    );
  }
  const cwd = hooks.cwd ?? process.cwd();
  const s = open(opts, cwd, say);
  // Written at once so the name is taken and a Ctrl-C at the first question still leaves a file to resume.
  save(s, false);
  // The prompt library loads before the first words to the user (it takes some 0.1 s), so the
  // first question follows them at once and nothing typed in between goes astray.
  const prompt = hooks.prompter ?? (await (await import('./prompts.js')).inquirerPrompter());
  say(
    wrapWords(
      `Answers are saved to ${displayPath(s.file, s.cwd)} as you go. Enter takes the default shown in [brackets] ` +
        `(in a list, the one highlighted); Ctrl-C stops, and ${resumeHint(s)} continues.`,
    ),
  );

  const finished = await runQuestions(s, prompt, say);
  if (!finished) {
    say(`\nStopped. Your answers so far are saved in ${displayPath(s.file, s.cwd)}.\nContinue with: ${resumeHint(s)}`);
    return { status: 'interrupted', file: s.file };
  }
  // The whole case must pass exactly as a case file would; a hand-edited key that does not is reported (exit 2).
  validateCase(parse(s.body, { maxAliasCount: 50 }) ?? {}, displayPath(s.file, s.cwd));
  save(s, true);
  say(`\nThe case is complete and saved in ${displayPath(s.file, s.cwd)}.\n`);
  say(await deps.advise(s.file));
  if (deps.offerNote) {
    const note = notePathFor(s.file);
    const shown = displayPath(note, s.cwd);
    const force = opts.force === true;
    if (existsSync(note) && !force) {
      // As --out does: an existing file is kept unless --force says to replace it.
      say(
        wrapWords(
          `\nThe design-review note ${shown} already exists and was left untouched; pass --force to replace it ` +
            `(${resumeHint(s)} --force), or write it elsewhere with: shaftwise advise ${displayPath(s.file, s.cwd)} --format html --out FILE`,
        ),
      );
      return { status: 'done', file: s.file };
    }
    let yes: string | boolean;
    try {
      yes = await prompt({
        kind: 'confirm',
        message: existsSync(note)
          ? `Replace the design-review note ${shown} now?`
          : `Write the design-review note to ${shown} now?`,
        help: 'The note sets out inputs, checks with margins and why the other options lost.',
        default: true,
        fresh: true,
      });
    } catch (e) {
      if (!isInterrupt(e)) throw e;
      say(`\nNo note written. The case is complete in ${displayPath(s.file, s.cwd)}.`);
      return { status: 'interrupted', file: s.file };
    }
    if (yes === true) await deps.offerNote(s.file, note, force);
  }
  return { status: 'done', file: s.file };
}
