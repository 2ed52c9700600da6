export type RowOrder = 'alternate' | 'grouped';

/** Which direction and run number grid row i holds. */
export function rowLabel(i: number, runs: number, order: RowOrder): { direction: 'up' | 'down'; run: number } {
  if (order === 'alternate') return { direction: i % 2 === 0 ? 'up' : 'down', run: Math.floor(i / 2) + 1 };
  return i < runs ? { direction: 'up', run: i + 1 } : { direction: 'down', run: i - runs + 1 };
}

/** A grid of cells resized to rows × cols, keeping what is already typed. */
export function resize(cells: string[][], rows: number, cols: number): string[][] {
  return Array.from({ length: rows }, (_, r) => Array.from({ length: cols }, (_, c) => cells[r]?.[c] ?? ''));
}

/** Puts a pasted block into the grid from (row, col), growing it as needed. */
export function pasteBlock(cells: string[][], block: string[][], row: number, col: number): string[][] {
  const rows = Math.max(cells.length, row + block.length);
  const cols = Math.max(cells[0]?.length ?? 0, col + Math.max(...block.map((b) => b.length)));
  const next = resize(cells, rows, cols);
  block.forEach((line, r) => line.forEach((v, c) => (next[row + r][col + c] = v)));
  return next;
}
