import type { Prompter, PromptSpec } from './types.js';
import { WIDTH, wrapWords } from './wrap.js';

/** Streams for the prompts; left out, the process's terminal. Tests pass their own. */
export interface PromptContext {
  input?: NodeJS.ReadableStream;
  output?: NodeJS.WritableStream;
}

/**
 * The real prompts, through inquirer's prompt module (inquirer 12: each question runs the
 * @inquirer/core prompt of its type). inquirer is loaded only here, so other commands never pay
 * for the prompt library. The help line is printed above each prompt, wrapped between words
 * at 80 columns and led by the question's place ("(3 of 20)"); the default is shown in
 * [brackets] (the theme below: inquirer's own marker is parentheses, which a default such as
 * "New shaft support (from shaftwise ask)" already holds), and a refused answer is re-asked
 * with the validation message.
 */
export async function inquirerPrompter(context: PromptContext = {}): Promise<Prompter> {
  const { default: inquirer } = await import('inquirer');
  const out = context.output ?? process.stdout;
  const input = context.input ?? process.stdin;
  const prompt = inquirer.createPromptModule({ ...context, output: out });
  const theme = { style: { defaultAnswer: (text: string) => DEFAULT_MARK(text) } };
  return async (spec) => {
    out.write(helpLines(spec) + '\n');
    if (spec.kind === 'confirm' && spec.fresh) await dropTypeahead(input);
    switch (spec.kind) {
      case 'input': {
        const { answer } = await prompt<{ answer: string }>([
          {
            type: 'input',
            name: 'answer',
            message: spec.message,
            default: spec.default === '' ? undefined : spec.default,
            theme,
            validate: spec.validate,
            // Called with the text as typed, before Enter: kept so Ctrl-C loses nothing.
            transformer: (value: string) => {
              spec.onDraft(value);
              return value;
            },
          },
        ]);
        return answer;
      }
      case 'select': {
        const { answer } = await prompt<{ answer: string }>([
          {
            type: 'select',
            name: 'answer',
            message: spec.message,
            default: spec.default,
            choices: spec.choices,
            pageSize: 8,
          },
        ]);
        return answer;
      }
      case 'confirm': {
        const { answer } = await prompt<{ answer: boolean }>([
          { type: 'confirm', name: 'answer', message: spec.message, default: spec.default, theme },
        ]);
        return answer;
      }
    }
  };
}

/** How a default is marked after the question, as the start-up line describes it. */
export const DEFAULT_MARK = (text: string): string => `[${text}]`;

/** The help line under a question: its place, then the help, wrapped between words at 80 columns. */
export function helpLines(spec: PromptSpec): string {
  const at = spec.kind !== 'confirm' && spec.position ? `(${spec.position.n} of ${spec.position.total}) ` : '';
  return wrapWords(at + spec.help, WIDTH, '  ');
}

/**
 * Throw away what was typed while no prompt was listening, so a key pressed while the advice
 * was being worked out does not answer the question that follows it. The terminal is put in
 * raw mode (a line typed but not entered becomes readable too) and read for a moment; what
 * arrives is dropped. A stream that buffers (a pipe, a test's stream) is emptied the same way.
 */
export async function dropTypeahead(input: NodeJS.ReadableStream, ms = 40): Promise<void> {
  const tty = input as NodeJS.ReadableStream & { isTTY?: boolean; isRaw?: boolean; setRawMode?: (m: boolean) => void };
  const raw = tty.isTTY === true && typeof tty.setRawMode === 'function';
  const wasRaw = tty.isRaw === true;
  if (raw) tty.setRawMode!(true);
  const drop = () => {};
  input.on('data', drop);
  input.resume();
  await new Promise((r) => setTimeout(r, ms));
  input.removeListener('data', drop);
  input.pause();
  if (raw) tty.setRawMode!(wasRaw);
}
