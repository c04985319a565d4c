/**
 * Every CSV the API sends goes through `sendCsv`, which guards each text cell against formula
 * injection (OWASP, "CSV Injection"): a cell starting with =, +, -, @, a tab or a carriage return
 * is run as a formula by a spreadsheet that opens the file, so it gets a leading single quote.
 * A cell is text or a number by its JavaScript type, never by how it looks: the ledger's -2 is a
 * number and stays one, while a person named "-2" is text and is guarded.
 */
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { stringify } from 'csv-stringify';
import type { Response } from 'express';

export type CsvCells = Record<string, string | number | null>;

/**
 * Quotes already in front of a trigger count too, so that a text such as `'=x` is written `''=x`
 * and the import, which takes one quote off (`unguardCell`), reads every cell back as it was.
 */
const GUARDED = /^'*[=+\-@\t\r]/;
const WRITTEN_GUARDED = /^'+[=+\-@\t\r]/;

export function guardCell(text: string): string {
  return GUARDED.test(text) ? `'${text}` : text;
}

/** The text `guardCell` was given, for a cell it wrote. */
export function unguardCell(text: string): string {
  return WRITTEN_GUARDED.test(text) ? text.slice(1) : text;
}

export async function sendCsv(res: Response, fileName: string, columns: readonly string[], rows: AsyncIterable<CsvCells> | Iterable<CsvCells>): Promise<void> {
  res.status(200).type('text/csv; charset=utf-8').attachment(fileName);
  await pipeline(Readable.from(rows), stringify({ header: true, columns: [...columns], cast: { number: (n) => String(n), string: guardCell } }), res);
}
