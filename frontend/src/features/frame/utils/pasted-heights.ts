import { normaliseCell, parseNumberCell, readRows } from '../../../lib/tabular-input';

/**
 * A block pasted from a spreadsheet, row after row, as the text of each height cell (blank cells
 * kept in place). A single number is one cell, even with a decimal comma ("0,5" is not 0 and 5).
 */
export function pastedHeights(text: string): string[] {
  const single = parseNumberCell(text);
  if (single.ok && single.value !== null) return [normaliseCell(text)];
  return readRows(text).flatMap((row) => row.cells.map(normaliseCell));
}
