/**
 * Argument parsing for the commands, over node:util parseArgs, so that an unknown option or a
 * missing value becomes an InputError a person can read.
 */
import { parseArgs, type ParseArgsConfig } from 'node:util';
import { InputError } from '../core/errors.ts';

export type OptionSpec = NonNullable<ParseArgsConfig['options']>;

export function parseCommandArgs<O extends OptionSpec>(argv: string[], options: O) {
  try {
    return parseArgs({ args: argv, options, allowPositionals: true, strict: true });
  } catch (err) {
    throw new InputError(err instanceof Error ? err.message.replace(/\. To specify.*$/s, '') : String(err));
  }
}

/** Splits "A=180,B=gloss" into [["A","180"],["B","gloss"]]; throws on a part without "=". */
export function parseAssignments(text: string, what: string): [string, string][] {
  return text
    .split(',')
    .map((p) => p.trim())
    .filter((p) => p !== '')
    .map((p) => {
      const eq = p.indexOf('=');
      if (eq <= 0) throw new InputError(`${what}: expected NAME=VALUE, got "${p}"`);
      return [p.slice(0, eq).trim(), p.slice(eq + 1).trim()];
    });
}
