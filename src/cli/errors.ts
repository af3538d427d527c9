/** An error the user caused and can fix (bad option, bad file): exit code 2, one clear message. */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}

/** Exit codes: 130 follows the shell's convention for a user interrupt (128 + SIGINT). */
export const EXIT = { ok: 0, checkFailed: 1, badInput: 2, defect: 70, interrupted: 130 } as const;
