/**
 * The shape every command-line command has: it reads its arguments (and files), and returns the
 * text for stdout. Bad input throws InputError, which main.ts prints to stderr with exit code 2.
 * main.ts passes everything it prints through visibleText (control characters made visible).
 */
export interface Command {
  /** One line for the usage list. */
  readonly summary: string;
  /** Full usage text, printed for --help. */
  readonly usage: string;
  run(argv: string[]): Promise<string>;
  /**
   * True when stdout is a file's exact text (the csv command's export). Sent to a terminal it is
   * shown with control characters made visible like every report; redirected to a file or a
   * pipe it is written exactly, so that no record changes on its way out.
   */
  readonly writesFile?: boolean;
}
