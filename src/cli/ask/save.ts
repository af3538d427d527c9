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
import { parseDocument } from 'yaml';
import { setInText } from './edit.js';

import type { Answers, Question } from './questions.js';

/**
 * The questionnaire's file: a case file in the case-file YAML shape (schema keys,
 * quantities as typed), rewritten atomically after every answer. Each answer is spliced
 * into the text (edit.ts), so a file a person wrote keeps its comments and layout. In a
 * file this tool started, what is not a case key — which way the shaft moves before its
 * speed is known, the text of an answer left unfinished by Ctrl-C — rides in a header
 * comment, which every YAML reader ignores, so the file stays a plain case file that
 * `advise` reads unchanged. A file a person wrote never gets that header.
 */

export interface AskState {
  /** Steering answers that have no case key (motion). */
  steer?: Answers;
  /** Text typed into the question that was interrupted. */
  draft?: { id: string; text: string };
}

export interface SavedCase {
  /** The file's text without this tool's header lines: edited in place by each answer. */
  body: string;
  /** Whether this tool wrote the file (it had the header): only then is the header written again. */
  ours: boolean;
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
const isOurs = (line: string) => /^#/.test(line) && OURS.some((re) => re.test(line.slice(1).trim()));

/** Split the header this tool wrote off the top of a file: the lines of it, and the rest untouched. */
export function splitHeader(text: string): { header: string[]; body: string } {
  const lines = text.split('\n');
  let n = 0;
  while (n < lines.length && isOurs(lines[n]!)) n++;
  return { header: lines.slice(0, n).map((l) => l.slice(1).trim()), body: lines.slice(n).join('\n') };
}

/** Put each answer at its case key in the text, creating the mappings on the way; other keys are left as they are. */
export function applyAnswers(body: string, answers: Answers, questions: readonly Question[]): string {
  let text = body;
  for (const q of questions) {
    const v = answers[q.id];
    if (!q.path || v === undefined) continue;
    const now = parseDocument(text).getIn(q.path);
    if (now !== v) text = setInText(text, q.path, v);
  }
  return text;
}

/** The file's text: this tool's header (in a file it wrote) above the body; `done` marks a finished case. */
export function renderCase(body: string, ours: boolean, state: AskState, file: string, done: boolean): string {
  if (!ours) return body;
  const lines = done
    ? ['Duty case written by shaftwise ask.', 'Run: shaftwise advise ' + file]
    : ['Duty case being written by shaftwise ask; not finished.', 'Continue with: shaftwise ask --resume ' + file];
  const keep: AskState = {};
  if (!done && state.steer && Object.keys(state.steer).length) keep.steer = state.steer;
  if (!done && state.draft && state.draft.text !== '') keep.draft = state.draft;
  if (Object.keys(keep).length) lines.push(`${STATE_TAG} ${JSON.stringify(keep)}`);
  return lines.map((l) => `# ${l}\n`).join('') + body;
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
  const { header, body } = splitHeader(text);
  return {
    body,
    ours: header.length > 0,
    doc: (raw ?? {}) as Record<string, unknown>,
    state: header.length ? parseState(header.join('\n')) : {},
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
