/**
 * How a true-scale template is split over sheets of paper. Lengths in mm; a sheet's window is the
 * part of the page that carries the drawing, and each window shows one rectangle of the pattern.
 * Neighbouring windows share an overlap band so the sheets can be laid over each other and lined
 * up on the alignment marks printed in it.
 */

/** PostScript points per millimetre: 72 points to the inch, 25.4 mm to the inch (exactly). */
export const PT_PER_MM = 72 / 25.4;

export const PAPERS = {
  a4: { name: 'A4', widthMm: 210, heightMm: 297 },
  letter: { name: 'Letter', widthMm: 215.9, heightMm: 279.4 },
} as const;
export type PaperKey = keyof typeof PAPERS;

/** Most home and office printers cannot print closer than about 5 mm to the edge (common practice). */
export const PAGE_MARGIN_MM = 10;
export const HEADER_MM = 24;
export const FOOTER_MM = 26;
export const OVERLAP_MM = 20;
/** Room drawn around the outline for the reference marks and labels. */
export const BORDER_MM = 10;
export const MAX_SHEETS = 120;

export interface Box {
  x0: number;
  x1: number;
  /** Bottom and top, in pattern coordinates (y upwards). */
  y0: number;
  y1: number;
}

export interface Sheet {
  number: number;
  row: number;
  column: number;
  /** Where the drawing goes on the page, mm from the page's top-left corner. */
  window: { left: number; top: number; width: number; height: number };
  /** The rectangle of the pattern this sheet shows. */
  covers: Box;
}

export interface SheetLayout {
  paper: (typeof PAPERS)[PaperKey];
  orientation: 'portrait' | 'landscape';
  pageWidthMm: number;
  pageHeightMm: number;
  rows: number;
  columns: number;
  overlapMm: number;
  /** Outline plus border: what the sheets together must show. */
  extent: Box;
  sheets: Sheet[];
}

function countAlong(lengthMm: number, windowMm: number): number {
  return lengthMm <= windowMm ? 1 : Math.ceil((lengthMm - OVERLAP_MM) / (windowMm - OVERLAP_MM));
}

function layoutFor(
  widthMm: number,
  heightMm: number,
  paperKey: PaperKey,
  orientation: 'portrait' | 'landscape',
): SheetLayout {
  const paper = PAPERS[paperKey];
  const [pageWidthMm, pageHeightMm] =
    orientation === 'portrait' ? [paper.widthMm, paper.heightMm] : [paper.heightMm, paper.widthMm];
  const winW = pageWidthMm - 2 * PAGE_MARGIN_MM;
  const winH = pageHeightMm - 2 * PAGE_MARGIN_MM - HEADER_MM - FOOTER_MM;
  const extent: Box = { x0: -BORDER_MM, x1: widthMm + BORDER_MM, y0: -BORDER_MM, y1: heightMm + BORDER_MM };
  const extW = extent.x1 - extent.x0;
  const extH = extent.y1 - extent.y0;
  const columns = countAlong(extW, winW);
  const rows = countAlong(extH, winH);
  // A pattern smaller than one window is centred in it; a longer one starts at the window's edge.
  const startX = columns === 1 ? extent.x0 - (winW - extW) / 2 : extent.x0;
  const startTop = rows === 1 ? extent.y1 + (winH - extH) / 2 : extent.y1;
  const sheets: Sheet[] = [];
  for (let row = 0; row < rows; row++) {
    for (let column = 0; column < columns; column++) {
      const x0 = startX + column * (winW - OVERLAP_MM);
      const y1 = startTop - row * (winH - OVERLAP_MM);
      sheets.push({
        number: row * columns + column + 1,
        row,
        column,
        window: { left: PAGE_MARGIN_MM, top: PAGE_MARGIN_MM + HEADER_MM, width: winW, height: winH },
        covers: { x0, x1: x0 + winW, y0: y1 - winH, y1 },
      });
    }
  }
  return { paper, orientation, pageWidthMm, pageHeightMm, rows, columns, overlapMm: OVERLAP_MM, extent, sheets };
}

/** The orientation needing fewer sheets (landscape on a tie, as long rails read along it). */
export function layoutSheets(widthMm: number, heightMm: number, paperKey: PaperKey): SheetLayout {
  const landscape = layoutFor(widthMm, heightMm, paperKey, 'landscape');
  const portrait = layoutFor(widthMm, heightMm, paperKey, 'portrait');
  return portrait.sheets.length < landscape.sheets.length ? portrait : landscape;
}

/** Pattern mm → page mm on a sheet (the page's y runs downwards). */
export function toPage(sheet: Sheet, xMm: number, yMm: number): { x: number; y: number } {
  return { x: sheet.window.left + (xMm - sheet.covers.x0), y: sheet.window.top + (sheet.covers.y1 - yMm) };
}

/**
 * Alignment marks, in pattern mm: in the middle of every overlap band, near both ends of the
 * seam, so each mark prints on the two sheets it joins.
 */
export function alignmentMarks(layout: SheetLayout): { xMm: number; yMm: number }[] {
  const marks: { xMm: number; yMm: number }[] = [];
  const inset = 12;
  const first = layout.sheets[0];
  for (let c = 1; c < layout.columns; c++) {
    const x = first.covers.x0 + c * (first.window.width - layout.overlapMm) + layout.overlapMm / 2;
    for (let r = 0; r < layout.rows; r++) {
      const s = layout.sheets[r * layout.columns];
      marks.push({ xMm: x, yMm: s.covers.y1 - inset }, { xMm: x, yMm: s.covers.y0 + inset });
    }
  }
  for (let r = 1; r < layout.rows; r++) {
    const y = first.covers.y1 - r * (first.window.height - layout.overlapMm) - layout.overlapMm / 2;
    for (let c = 0; c < layout.columns; c++) {
      const s = layout.sheets[c];
      marks.push({ xMm: s.covers.x0 + inset, yMm: y }, { xMm: s.covers.x1 - inset, yMm: y });
    }
  }
  return marks;
}
