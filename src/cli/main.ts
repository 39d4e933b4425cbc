/**
 * Trialbook's command line, for desktop use on exported files:
 *   npm run --silent cli -- COMMAND [options]
 * Each command lives in commands/NAME.ts and is registered below.
 */
import { InputError } from '../core/errors.ts';
import type { Command } from './command.ts';
import { visibleText } from './visible-text.ts';

/** Every print goes through here: control characters from files and arguments made visible. */
function print(stream: NodeJS.WriteStream, text: string, exact = false): void {
  stream.write(exact ? text : visibleText(text));
}

const commands: Record<string, () => Promise<Command>> = {
  analyze: async () => (await import('./commands/analyze.ts')).analyze,
  design: async () => (await import('./commands/design.ts')).design,
  predict: async () => (await import('./commands/predict.ts')).predict,
  solve: async () => (await import('./commands/solve.ts')).solve,
  path: async () => (await import('./commands/path.ts')).path,
  csv: async () => (await import('./commands/csv.ts')).csv,
  optimize: async () => (await import('./commands/optimize.ts')).optimize,
  augment: async () => (await import('./commands/augment.ts')).augment,
};

async function usage(): Promise<string> {
  const rows = await Promise.all(Object.entries(commands).map(async ([name, load]) => `  ${name.padEnd(9)}${(await load()).summary}`));
  return [
    'Trialbook command line: plan and analyze two-level experiments, and read exported files.',
    '',
    'Usage: npm run --silent cli -- COMMAND [options]   (COMMAND --help for its options)',
    '',
    'Commands:',
    ...rows,
  ].join('\n');
}

async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  if (!name || name === '--help' || name === '-h' || name === 'help') {
    print(process.stdout, (await usage()) + '\n');
    return name ? 0 : 2;
  }
  const load = commands[name];
  if (!load) {
    print(process.stderr, `Unknown command "${name}".\n\n${await usage()}\n`);
    return 2;
  }
  const command = await load();
  if (rest.includes('--help') || rest.includes('-h')) {
    print(process.stdout, command.usage + '\n');
    return 0;
  }
  try {
    const out = await command.run(rest);
    print(process.stdout, out.endsWith('\n') ? out : out + '\n', command.writesFile === true && !process.stdout.isTTY);
    return 0;
  } catch (err) {
    if (err instanceof InputError) {
      print(process.stderr, `trialbook ${name}: ${err.message}\n`);
      return 2;
    }
    throw err;
  }
}

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (err: unknown) => {
    print(process.stderr, `trialbook: unexpected failure, please report it: ${err instanceof Error ? err.stack : String(err)}\n`);
    process.exitCode = 1;
  },
);
