import type PDFKit from 'pdfkit';
import type { CheckSeries } from '../../records/readiness.js';
import { num, unitLabel } from './format.js';
import { write } from './pdf-text.js';
import { INK, MUTED, PAPER, RULE, STATUS_COLOURS, STEEL } from './palette.js';

type Doc = PDFKit.PDFDocument;

const ROW_H = 15;
const HEAD_H = 14;
const LABEL_W = 92;
/** Past this many columns the cells are too narrow to hold a number; the line chart takes over. */
export const BED_MAP_MAX_COLUMNS = 16;

export interface BedMapLayout {
  columns: number[];
  rows: { label: string; cells: Map<number, number> }[];
  height: number;
}

/**
 * A bed grid's heights as a table of shaded cells: one row per grid row (each line of the
 * series), one column per X position, darker for higher, cells above the target edged in red.
 * Null when the series does not have that shape.
 */
export function bedMapLayout(s: CheckSeries): BedMapLayout | null {
  const columns = [...new Set(s.lines.flatMap((l) => l.points.map((p) => p[0])).filter(Number.isFinite))].sort(
    (a, b) => a - b,
  );
  if (!columns.length || columns.length > BED_MAP_MAX_COLUMNS || !s.lines.length) return null;
  const rows = s.lines.map((l) => ({
    label: l.label,
    cells: new Map(
      l.points.filter(([x, y]) => Number.isFinite(x) && Number.isFinite(y)).map(([x, y]) => [x, clean(y)]),
    ),
  }));
  return { columns, rows, height: HEAD_H + rows.length * ROW_H + 22 };
}

export function drawBedMap(
  doc: Doc,
  box: { x: number; y: number; w: number },
  s: CheckSeries,
  layout: BedMapLayout,
): void {
  const values = layout.rows.flatMap((r) => [...r.cells.values()]);
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  const limit = s.limits?.[0];
  const cellW = (box.w - LABEL_W) / layout.columns.length;
  const size = cellW < 26 ? 6 : 7;
  const xUnit = unitLabel(s.x.unit);
  const yUnit = unitLabel(s.y.unit);

  doc.fillColor(MUTED);
  write(doc, 'medium', 6.5, `${s.x.label} (${xUnit}):`, box.x, box.y + 3, { width: LABEL_W - 4, lineBreak: false });
  layout.columns.forEach((x, i) =>
    write(doc, 'medium', 6.5, num(x), box.x + LABEL_W + i * cellW, box.y + 3, {
      width: cellW,
      align: 'center',
      lineBreak: false,
    }),
  );
  let y = box.y + HEAD_H;
  for (const row of layout.rows) {
    doc.fillColor(INK);
    write(doc, 'regular', 6.5, row.label, box.x, y + 4, { width: LABEL_W - 4, lineBreak: false, ellipsis: true });
    layout.columns.forEach((x, i) => {
      const cx = box.x + LABEL_W + i * cellW;
      const v = row.cells.get(x);
      if (v === undefined) {
        doc.save().lineWidth(0.4).strokeColor(RULE).rect(cx, y, cellW, ROW_H).stroke().restore();
        return;
      }
      const t = hi > lo ? (v - lo) / (hi - lo) : 0;
      doc
        .save()
        .rect(cx, y, cellW, ROW_H)
        .fill(mix(PAPER, STEEL, 0.08 + 0.8 * t))
        .restore();
      const over = limit !== undefined && v > limit.value;
      doc
        .save()
        .lineWidth(over ? 1.2 : 0.4)
        .strokeColor(over ? STATUS_COLOURS['outside-target'] : '#ffffff')
        .rect(cx + (over ? 0.6 : 0), y + (over ? 0.6 : 0), cellW - (over ? 1.2 : 0), ROW_H - (over ? 1.2 : 0))
        .stroke()
        .restore();
      doc.fillColor(t > 0.55 ? '#ffffff' : INK);
      write(doc, 'regular', size, num(v), cx, y + 4, { width: cellW, align: 'center', lineBreak: false });
    });
    y += ROW_H;
  }
  doc.fillColor(MUTED);
  const range = `${s.y.label}, ${yUnit}: lowest ${num(lo)}, highest ${num(hi)}, range ${num(hi - lo)} ${yUnit}`;
  const target = limit
    ? `; ${limit.label}${over(layout, limit.value) ? ' \u2014 cells edged in red are above it' : ''}`
    : '';
  write(doc, 'regular', 7, `${range}${target}. Darker is higher.`, box.x, y + 5, { width: box.w });
  doc.fillColor(INK);
}

// Heights taken from a fitted zone come back as 1e-18 where they are zero: nine decimals is far
// below any gauge's resolution in any unit, and prints as the 0 it is.
const clean = (v: number) => Number(v.toFixed(9)) || 0;

const over = (l: BedMapLayout, limit: number) => l.rows.some((r) => [...r.cells.values()].some((v) => v > limit));

/** A colour a fraction t of the way from a to b (#rrggbb). */
function mix(a: string, b: string, t: number): string {
  const ch = (c: string, i: number) => parseInt(c.slice(1 + 2 * i, 3 + 2 * i), 16);
  return `#${[0, 1, 2]
    .map((i) =>
      Math.round(ch(a, i) + (ch(b, i) - ch(a, i)) * t)
        .toString(16)
        .padStart(2, '0'),
    )
    .join('')}`;
}
