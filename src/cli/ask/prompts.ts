import type { Prompter } from './run.js';

/** Streams for the prompts; left out, the process's terminal. Tests pass their own. */
export interface PromptContext {
  input?: NodeJS.ReadableStream;
  output?: NodeJS.WritableStream;
}

/**
 * The real prompts (@inquirer/prompts, which ships with inquirer), loaded only here so
 * other commands never pay for the prompt library. The help line is printed above each
 * prompt; inquirer shows the default in brackets and re-asks with the validation message.
 */
export async function inquirerPrompter(context: PromptContext = {}): Promise<Prompter> {
  const { input, select, confirm } = await import('@inquirer/prompts');
  const out = context.output ?? process.stdout;
  const ctx = { ...context, output: out };
  return async (spec) => {
    out.write(`  ${spec.help}\n`);
    switch (spec.kind) {
      case 'input':
        return input(
          {
            message: spec.message,
            default: spec.default,
            validate: spec.validate,
            // Called with the text as typed, before Enter: kept so Ctrl-C loses nothing.
            transformer: (value: string) => {
              spec.onDraft(value);
              return value;
            },
          },
          ctx,
        );
      case 'select':
        return select({ message: spec.message, default: spec.default, choices: spec.choices, pageSize: 8 }, ctx);
      case 'confirm':
        return confirm({ message: spec.message, default: spec.default }, ctx);
    }
  };
}
