/**
 * Reads a file named on the command line as text: its encoding by its byte-order mark, else
 * strict UTF-8 (io/decode-text.ts). Throws InputError for a file that cannot be read or decoded.
 */
import { readFileSync } from 'node:fs';
import { InputError } from '../core/errors.ts';
import { decodeText } from '../io/decode-text.ts';

export function readTextFile(path: string): string {
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(path);
  } catch (err) {
    throw new InputError(`Cannot read the file "${path}": ${(err as NodeJS.ErrnoException).code === 'ENOENT' ? 'it does not exist' : (err as Error).message}`);
  }
  return decodeText(bytes, `The file "${path}"`).text;
}
