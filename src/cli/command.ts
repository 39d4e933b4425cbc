/**
 * The shape every command-line command has: it reads its arguments (and files), and returns the
 * text for stdout. Bad input throws InputError, which main.ts prints to stderr with exit code 2.
 */
export interface Command {
  /** One line for the usage list. */
  readonly summary: string;
  /** Full usage text, printed for --help. */
  readonly usage: string;
  run(argv: string[]): Promise<string>;
}
