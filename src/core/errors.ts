/**
 * The one error class of Trialbook. Every piece of bad input fails loudly with an InputError whose
 * message says what was needed and what came ("Temperature needs two different levels, got 180
 * and 180"). Screens show the message and change nothing; the command line prints it to stderr.
 */
export class InputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'InputError';
  }
}

/** Throws an InputError with `message` unless `condition` holds. */
export function ensure(condition: unknown, message: string | (() => string)): asserts condition {
  if (!condition) throw new InputError(typeof message === 'function' ? message() : message);
}
