/** Exit codes: 130 follows the shell's convention for a user interrupt (128 + SIGINT). */
export const EXIT = { ok: 0, checkFailed: 1, badInput: 2, defect: 70, interrupted: 130 } as const;
