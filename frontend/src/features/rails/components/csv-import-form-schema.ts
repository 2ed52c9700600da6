import { z } from 'zod';
import { parseSweepCsv, type CsvRow } from '../utils/parse-sweep-csv';

/** Fewer stations than this do not make a sweep: two only set the line, a third departs from it. */
export const MIN_IMPORTED_STATIONS = 3;

export const badRowsMessage = (count: number) =>
  `${count} row${count === 1 ? '' : 's'} must be fixed in the text or dropped before the import.`;

export const TOO_FEW_STATIONS_MESSAGE = 'A sweep needs at least three stations.';

/**
 * The text pasted or loaded from a file, read as "position, reading" lines. It imports only when
 * every line reads and at least three stations remain; both problems are named at once.
 */
export const csvImportFormSchema = z.object({ text: z.string() }).superRefine(({ text }, ctx) => {
  const rows = parseSweepCsv(text).rows;
  const bad = rows.filter((r) => r.problem).length;
  if (bad) ctx.addIssue({ code: 'custom', path: ['text'], message: badRowsMessage(bad) });
  if (rows.length - bad < MIN_IMPORTED_STATIONS)
    ctx.addIssue({ code: 'custom', path: ['text'], message: TOO_FEW_STATIONS_MESSAGE });
});

export type CsvImportFormValues = z.input<typeof csvImportFormSchema>;

export const emptyCsvImportForm: CsvImportFormValues = { text: '' };

/** The lines that read, in the order typed. */
export const goodRows = (rows: CsvRow[]) => rows.filter((r) => !r.problem);

/** The stations to put in the sweep's grid. */
export const toImportedStations = ({ text }: CsvImportFormValues) =>
  goodRows(parseSweepCsv(text).rows).map((r) => ({ position: r.position!, reading: r.reading! }));
