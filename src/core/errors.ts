/**
 * The errors a user can cause and fix. Each is caught in one place (the CLI's main, or the
 * caller of the library) and shown as one message per problem; the CLI exits with code 2.
 */

/** One problem in a case: the field (a dotted path, "(file)" for the file itself) and what is wrong. */
export interface Problem {
  field: string;
  message: string;
}

/** A case that cannot be used: every problem found, each naming its field. */
export class CaseError extends Error {
  constructor(
    readonly source: string,
    readonly problems: Problem[],
  ) {
    super(`${source}: ${problems.map((p) => `${p.field}: ${p.message}`).join('; ')}`);
    this.name = 'CaseError';
  }
}

/** A data table or rule file that does not validate, or a data folder that cannot be read. */
export class DataError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'DataError';
  }
}

/** A bad option or argument (a flag, a file name): one clear message. */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}
