/**
 * Argument parsing for the commands, over node:util parseArgs, so that an unknown option or a
 * missing value becomes an InputError a person can read.
 */
import { parseArgs, type ParseArgsConfig } from 'node:util';
import { InputError } from '../core/errors.ts';

export type OptionSpec = NonNullable<ParseArgsConfig['options']>;

/** A negative number as an option's value: "-10", "-0.5", "-.5", "-1e-3". */
const NEGATIVE_NUMBER = /^-(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * The arguments with "--opt -10" joined into "--opt=-10" for every option that takes a value,
 * because parseArgs reads a value that starts with "-" as a possible option and refuses it.
 * Only negative numbers are joined: "--step -h" still asks for help.
 * Example: joinNegativeValues(['--step', '-10'], {step: {type: 'string'}}) -> ['--step=-10'].
 */
export function joinNegativeValues(argv: readonly string[], options: OptionSpec): string[] {
  const out: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === '--') return [...out, ...argv.slice(i)];
    const name = a.startsWith('--') && !a.includes('=') ? a.slice(2) : undefined;
    const next = argv[i + 1];
    if (name !== undefined && options[name]?.type === 'string' && next !== undefined && NEGATIVE_NUMBER.test(next)) {
      out.push(`${a}=${next}`);
      i++;
    } else {
      out.push(a);
    }
  }
  return out;
}

export function parseCommandArgs<O extends OptionSpec>(argv: string[], options: O) {
  try {
    return parseArgs({ args: joinNegativeValues(argv, options), options, allowPositionals: true, strict: true });
  } catch (err) {
    throw new InputError(err instanceof Error ? err.message.replace(/\. To specify.*$/s, '') : String(err));
  }
}

/** Splits "A=180,B=gloss" into [["A","180"],["B","gloss"]]; throws on a part without "=" or with two. */
export function parseAssignments(text: string, what: string): [string, string][] {
  return text
    .split(',')
    .map((p) => p.trim())
    .filter((p) => p !== '')
    .map((p) => {
      const eq = p.indexOf('=');
      if (eq <= 0) throw new InputError(`${what}: expected NAME=VALUE, got "${p}"`);
      // "A=B=1:2" is refused rather than read as A with the value "B=1:2": no name or level holds "=".
      if (p.indexOf('=', eq + 1) >= 0) throw new InputError(`${what}: expected one "=" in NAME=VALUE, got "${p}"; a name or level cannot contain "="`);
      return [p.slice(0, eq).trim(), p.slice(eq + 1).trim()];
    });
}
