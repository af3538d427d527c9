/** Where a question stands: the n-th of the `total` questions that apply (progress() in questions.ts). */
export interface Position {
  n: number;
  total: number;
}

/** One prompt. `input` re-asks until validate returns true; `select` offers choices; `confirm` yes/no. */
export type PromptSpec =
  | {
      kind: 'input';
      message: string;
      help: string;
      position?: Position;
      /** Always an answer that passes validate, or '' when there is none to offer. */
      default: string;
      validate: (text: string) => true | string;
      /** Called with the text as it is typed, so an interrupt loses nothing. */
      onDraft: (text: string) => void;
    }
  | {
      kind: 'select';
      message: string;
      help: string;
      position?: Position;
      default: string;
      choices: { value: string; name: string; description?: string }[];
    }
  | {
      kind: 'confirm';
      message: string;
      help: string;
      default: boolean;
      /** Drop keys typed before the prompt appeared (typed while the advice was being worked out). */
      fresh?: boolean;
    };

export type Prompter = (spec: PromptSpec) => Promise<string | boolean>;

/** What `ask` needs from the rest of the program. */
export interface AskDeps {
  /** The advice text for a finished case file, printed as it is. */
  advise: (casePath: string) => Promise<string>;
  /**
   * Write the design-review note for the case to `notePath` (replacing a file there only with
   * `force`); when given, the user is asked whether to. An existing note without `force` is
   * never offered: the user is told it was left untouched, as `--out` does.
   */
  offerNote?: (casePath: string, notePath: string, force: boolean) => Promise<void>;
}

/** The command's options. */
export interface AskOptions {
  /** Where to save the answers (must not exist). */
  save?: string;
  /** A file an earlier `ask` was writing, to continue. */
  resume?: string;
  /** Replace an existing design-review note at the end. */
  force?: boolean;
}

/** Test hooks: replace the terminal. Left out, the real prompts and process streams are used. */
export interface AskHooks {
  /** Prompts to use instead of inquirer's; implies an interactive session unless isTTY says otherwise. */
  prompter?: Prompter;
  /** Override the check that standard input is a terminal. */
  isTTY?: boolean;
  /** Lines for the user (section titles, help, the resume hint); default: standard output. */
  say?: (line: string) => void;
  /** Directory for relative paths and the default file name; default: the working directory. */
  cwd?: string;
}
