/** Loads a CSV fixture from test/fixtures as ResponseData, through the same reader the command line uses. */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { readTable } from '../../src/io/csv/read-table.ts';
import { tableResponseData, type TableColumns } from '../../src/io/csv/table-response-data.ts';

export function fixturePath(name: string): string {
  return fileURLToPath(new URL(`../fixtures/${name}`, import.meta.url));
}

export function fixtureData(name: string, cols: TableColumns) {
  return tableResponseData(readTable(readFileSync(fixturePath(name), 'utf8')), cols);
}
