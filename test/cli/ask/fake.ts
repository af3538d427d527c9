import type { Prompter, PromptSpec } from '../../../src/cli/ask/types.js';

/** A scripted answer: text typed then Enter ('' = Enter alone), a choice, yes/no, or Ctrl-C (optionally after typing). */
export type Step = string | boolean | { interrupt: true; typed?: string };

export interface Asked {
  spec: PromptSpec;
  /** Validation messages shown before an answer was accepted (the re-asks). */
  rejected: string[];
}

/**
 * A prompter that plays a script the way inquirer behaves: Enter on an empty input
 * takes the default, a failing validate shows its message and asks again (the next
 * step), Ctrl-C throws an error named ExitPromptError. Each prompt is recorded.
 */
export function scripted(steps: Step[]): { prompter: Prompter; asked: Asked[] } {
  const asked: Asked[] = [];
  let i = 0;
  const take = (): Step => (i < steps.length ? steps[i++]! : '');
  const interrupt = () =>
    Object.assign(new Error('User force closed the prompt with SIGINT'), { name: 'ExitPromptError' });
  const prompter: Prompter = async (spec) => {
    const rec: Asked = { spec, rejected: [] };
    asked.push(rec);
    for (;;) {
      const step = take();
      if (typeof step === 'object') {
        if (step.typed && spec.kind === 'input') spec.onDraft(step.typed);
        throw interrupt();
      }
      if (spec.kind === 'confirm') return step === '' ? spec.default : step === true || step === 'y';
      if (spec.kind === 'select') {
        const v = step === '' ? spec.default : String(step);
        if (!spec.choices.some((c) => c.value === v))
          throw new Error(`script offers "${v}" to a select without it: ${spec.message}`);
        return v;
      }
      const text = step === '' ? spec.default : String(step);
      spec.onDraft(text);
      const ok = spec.validate(text);
      if (ok === true) return text;
      rec.rejected.push(ok);
    }
  };
  return { prompter, asked };
}
