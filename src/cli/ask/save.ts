import { UsageError } from '../../core/errors.js';
import {
  closeSync,
  existsSync,
  fsyncSync,
  openSync,
  readFileSync,
  renameSync,
  rmSync,
  statSync,
  writeSync,
} from 'node:fs';
import { basename, dirname, extname, join } from 'node:path';
import { Document, isMap, parseDocument } from 'yaml';

import type { Answers, Question } from './questions.js';

/**
 * The questionnaire's file: a case file in the case-file YAML shape (schema keys,
 * quantities as typed), rewritten atomically after every answer. What is not a case
 * key — which way the shaft moves before its speed is known, the text of an answer
 * left unfinished by Ctrl-C — rides in a header comment, which every YAML reader
 * ignores, so the file stays a plain case file that `advise` reads unchanged.
 */

export interface AskState {
  /** Steering answers that have no case key (motion). */
  steer?: Answers;
  /** Text typed into the question that was interrupted. */
  draft?: { id: string; text: string };
}

export interface SavedCase {
  /** The parsed document: edited in place, so a person's comments and layout survive a resume. */
  document: Document;
  /** Its plain value (a mapping; empty for an empty file). */
  doc: Record<string, unknown>;
  state: AskState;
}

const STATE_TAG = 'ask-state:';
/** Header lines this tool writes (and replaces on each save); other comment lines are kept. */
const OURS = [
  /^Duty case (being )?written by shaftwise ask/,
  /^Continue with: shaftwise ask/,
  /^Run: shaftwise advise/,
  new RegExp(`^${STATE_TAG}`),
];

/** A document for a new case. */
export function newDocument(): Document {
  return new Document({});
}

/** Put each answer at its case key, creating the mappings on the way; other keys are left as they are. */
export function applyAnswers(document: Document, answers: Answers, questions: readonly Question[]): void {
  for (const q of questions) {
    const v = answers[q.id];
    if (!q.path || v === undefined) continue;
    for (let i = 1; i < q.path.length; i++) {
      const prefix = q.path.slice(0, i);
      const node = document.getIn(prefix, true);
      // A scalar where a mapping belongs (hand-edited "shaft: 40") gives way to the mapping.
      if (node !== undefined && !isMap(node)) document.setIn(prefix, document.createNode({}));
    }
    if (document.getIn(q.path) !== v) document.setIn(q.path, v);
  }
}

/** The YAML text for a (partial) case; `done` marks a finished case. */
export function renderCase(document: Document, state: AskState, file: string, done: boolean): string {
  const lines = done
    ? [' Duty case written by shaftwise ask.', ' Run: shaftwise advise ' + file]
    : [' Duty case being written by shaftwise ask; not finished.', ' Continue with: shaftwise ask --resume ' + file];
  const keep: AskState = {};
  if (!done && state.steer && Object.keys(state.steer).length) keep.steer = state.steer;
  if (!done && state.draft && state.draft.text !== '') keep.draft = state.draft;
  if (Object.keys(keep).length) lines.push(` ${STATE_TAG} ${JSON.stringify(keep)}`);
  const theirs = (document.commentBefore ?? '')
    .split('\n')
    .filter((l) => l.trim() !== '' && !OURS.some((re) => re.test(l.trim())));
  document.commentBefore = [...lines, ...theirs].join('\n');
  return document.toString();
}

/** Read a saved (possibly partial) case. Throws UsageError naming the file when it cannot be used. */
export function readSaved(file: string, shownAs = file): SavedCase {
  let text: string;
  try {
    if (statSync(file).isDirectory())
      throw new UsageError(`--resume ${shownAs}: is a directory; expected the case file shaftwise ask was writing`);
    text = readFileSync(file, 'utf8');
  } catch (e) {
    if (e instanceof UsageError) throw e;
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EACCES' ? 'permission denied' : (e as Error).message;
    throw new UsageError(
      `--resume ${shownAs}: cannot be read (${why}); expected the case file shaftwise ask was writing`,
    );
  }
  // Same limits as the case loader: bounded aliases, duplicate keys are errors.
  const parsed = parseDocument(text, { uniqueKeys: true, prettyErrors: true });
  if (parsed.errors.length) {
    throw new UsageError(
      `--resume ${shownAs}: is not valid YAML (${parsed.errors[0]!.message.split('\n')[0]}); expected a case file`,
    );
  }
  const raw: unknown = parsed.toJS({ maxAliasCount: 50 });
  if (raw !== null && raw !== undefined && (typeof raw !== 'object' || Array.isArray(raw))) {
    throw new UsageError(
      `--resume ${shownAs}: holds ${Array.isArray(raw) ? 'a list' : `a ${typeof raw}`}; expected a mapping with the case keys (title, shaft, load…)`,
    );
  }
  const document = raw === null || raw === undefined ? newDocument() : parsed;
  if (document !== parsed) document.commentBefore = parsed.commentBefore ?? parsed.comment ?? null;
  return {
    document,
    doc: (raw ?? {}) as Record<string, unknown>,
    state: parseState(parsed.commentBefore ?? parsed.comment ?? ''),
  };
}

function parseState(comment: string): AskState {
  for (const line of comment.split('\n')) {
    const t = line.trim();
    if (!t.startsWith(STATE_TAG)) continue;
    try {
      const s = JSON.parse(t.slice(STATE_TAG.length)) as unknown;
      if (s && typeof s === 'object' && !Array.isArray(s)) {
        const o = s as Record<string, unknown>;
        const out: AskState = {};
        if (o.steer && typeof o.steer === 'object' && !Array.isArray(o.steer)) {
          out.steer = Object.fromEntries(
            Object.entries(o.steer).filter(([, v]) => typeof v === 'string' || typeof v === 'number'),
          ) as Answers;
        }
        const d = o.draft as Record<string, unknown> | undefined;
        if (d && typeof d.id === 'string' && typeof d.text === 'string') out.draft = { id: d.id, text: d.text };
        return out;
      }
    } catch {
      // A damaged state line only loses the steering answers; the case keys still resume.
    }
  }
  return {};
}

/**
 * Write `text` to `file` atomically: a temporary file in the same directory, flushed,
 * then renamed over the target, so a reader (or a crash) sees the old file or the new
 * one, never half of one.
 */
export function writeAtomic(file: string, text: string): void {
  const tmp = join(dirname(file), `.${basename(file)}.${process.pid}.tmp`);
  try {
    const fd = openSync(tmp, 'w', 0o644);
    try {
      writeSync(fd, text);
      fsyncSync(fd);
    } finally {
      closeSync(fd);
    }
    renameSync(tmp, file);
  } catch (e) {
    rmSync(tmp, { force: true });
    const code = (e as NodeJS.ErrnoException).code;
    const why =
      code === 'ENOENT' ? 'no such directory' : code === 'EACCES' ? 'permission denied' : (e as Error).message;
    throw new UsageError(
      `cannot write the case file ${file} (${why}); expected a writable path (choose one with --save FILE)`,
    );
  }
}

/** Largest number tried for a free default name; past it the directory is full of earlier runs. */
const MAX_NUMBERED = 999;

/** `base` if free, else base-2, base-3… before the extension: never an existing file. */
export function freeName(base: string): string {
  if (!existsSync(base)) return base;
  const ext = extname(base);
  const stem = base.slice(0, base.length - ext.length);
  for (let n = 2; n <= MAX_NUMBERED; n++) {
    const candidate = `${stem}-${n}${ext}`;
    if (!existsSync(candidate)) return candidate;
  }
  throw new UsageError(
    `${base} and its numbered versions up to ${MAX_NUMBERED} exist; expected a free name: choose one with --save FILE`,
  );
}
