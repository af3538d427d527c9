/** One prompt. `input` re-asks until validate returns true; `select` offers choices; `confirm` yes/no. */
export type PromptSpec =
  | {
      kind: 'input';
      message: string;
      help: string;
      default: string;
      validate: (text: string) => true | string;
      /** Called with the text as it is typed, so an interrupt loses nothing. */
      onDraft: (text: string) => void;
    }
  | {
      kind: 'select';
      message: string;
      help: string;
      default: string;
      choices: { value: string; name: string; description?: string }[];
    }
  | { kind: 'confirm'; message: string; help: string; default: boolean };

export type Prompter = (spec: PromptSpec) => Promise<string | boolean>;

/** What `ask` needs from the rest of the program. */
export interface AskDeps {
  /** The advice text for a finished case file, printed as it is. */
  advise: (casePath: string) => Promise<string>;
  /** Write the design-review note for the case; when given, the user is asked whether to. */
  offerNote?: (casePath: string) => Promise<void>;
}

/** The command's options. */
export interface AskOptions {
  /** Where to save the answers (must not exist). */
  save?: string;
  /** A file an earlier `ask` was writing, to continue. */
  resume?: string;
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
