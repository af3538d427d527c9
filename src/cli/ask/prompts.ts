import type { Prompter } from './types.js';

/** Streams for the prompts; left out, the process's terminal. Tests pass their own. */
export interface PromptContext {
  input?: NodeJS.ReadableStream;
  output?: NodeJS.WritableStream;
}

/**
 * The real prompts, through inquirer's prompt module (inquirer 12: each question runs the
 * @inquirer/core prompt of its type). inquirer is loaded only here, so other commands never pay
 * for the prompt library. The help line is printed above each prompt; inquirer shows the
 * default in brackets and re-asks with the validation message.
 */
export async function inquirerPrompter(context: PromptContext = {}): Promise<Prompter> {
  const { default: inquirer } = await import('inquirer');
  const out = context.output ?? process.stdout;
  const prompt = inquirer.createPromptModule({ ...context, output: out });
  return async (spec) => {
    out.write(`  ${spec.help}\n`);
    switch (spec.kind) {
      case 'input': {
        const { answer } = await prompt<{ answer: string }>([
          {
            type: 'input',
            name: 'answer',
            message: spec.message,
            default: spec.default,
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
          { type: 'confirm', name: 'answer', message: spec.message, default: spec.default },
        ]);
        return answer;
      }
    }
  };
}
