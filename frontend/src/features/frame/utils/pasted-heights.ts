import { normaliseCell, readRows } from '../../../lib/tabular-input';

/** A block pasted from a spreadsheet, row after row, as the text of each height cell (blank cells kept in place). */
export const pastedHeights = (text: string): string[] => readRows(text).flatMap((row) => row.cells.map(normaliseCell));
