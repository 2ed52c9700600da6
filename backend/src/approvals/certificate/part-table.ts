import type PDFKit from 'pdfkit';
import type { CheckSeries } from '../../records/readiness.js';
import { num, unitLabel } from './format.js';
import { write } from './pdf-text.js';
import { INK, MUTED, RULE, STATUS_COLOURS } from './palette.js';

type Doc = PDFKit.PDFDocument;

export interface PartRow {
  label: string;
  nominal: number;
  deviation: number;
  tolerance: number | null;
  basis: string;
}

const LINE_H = 10;
const COLS = [
  { title: 'Part', w: 0.22 },
  { title: 'Nominal', w: 0.11 },
  { title: 'Deviation', w: 0.12 },
  { title: '\u00b1 Tolerance', w: 0.13 },
  { title: 'Judged', w: 0.08 },
  { title: 'Tolerance from', w: 0.34 },
];
const FONT = 7.5;

/**
 * The test cut's parts as the series carries them: each part a one-point line [nominal,
 * deviation], followed by its tolerance as a two-point line [nominal, −t], [nominal, +t] labelled
 * "±t: basis". Null when the series does not have that shape.
 */
export function partRows(s: CheckSeries): PartRow[] | null {
  const out: PartRow[] = [];
  for (let i = 0; i < s.lines.length; i++) {
    const part = s.lines[i];
    if (part.points.length !== 1) return null;
    const next = s.lines[i + 1];
    const band = next && next.points.length === 2 && next.points[0][0] === part.points[0][0] ? next : null;
    out.push({
      label: part.label,
      nominal: part.points[0][0],
      deviation: part.points[0][1],
      tolerance: band ? Math.abs(band.points[1][1] - band.points[0][1]) / 2 : null,
      basis: band ? band.label.replace(/^±\s*[^:]*:\s*/, '') : '',
    });
    if (band) i++;
  }
  return out.length ? out : null;
}

/** Each row as tall as its longest cell (the tolerance's basis may take two lines). */
function rowHeights(doc: Doc, width: number, rows: PartRow[]): number[] {
  doc.font('regular').fontSize(FONT);
  return rows.map(
    (r) =>
      Math.max(
        LINE_H,
        doc.heightOfString(r.label, { width: COLS[0].w * width - 4 }),
        doc.heightOfString(r.basis || '-', { width: COLS[5].w * width - 4 }),
      ) + 4,
  );
}

export const partTableHeight = (doc: Doc, width: number, rows: PartRow[]) =>
  14 + rowHeights(doc, width, rows).reduce((a, b) => a + b, 0) + 6;

export function drawPartTable(
  doc: Doc,
  box: { x: number; y: number; w: number },
  s: CheckSeries,
  rows: PartRow[],
): void {
  const xu = unitLabel(s.x.unit);
  const yu = unitLabel(s.y.unit);
  const titles = [
    COLS[0].title,
    `${COLS[1].title} (${xu})`,
    `${COLS[2].title} (${yu})`,
    `${COLS[3].title} (${yu})`,
    COLS[4].title,
    COLS[5].title,
  ];
  const heights = rowHeights(doc, box.w, rows);
  let x = box.x;
  doc.fillColor(MUTED);
  COLS.forEach((c, i) => {
    write(doc, 'medium', 6.5, titles[i].toUpperCase(), x + 2, box.y, {
      width: c.w * box.w - 4,
      lineBreak: false,
      align: i >= 1 && i <= 3 ? 'right' : 'left',
    });
    x += c.w * box.w;
  });
  let y = box.y + 11;
  doc
    .save()
    .lineWidth(0.6)
    .strokeColor(INK)
    .moveTo(box.x, y)
    .lineTo(box.x + box.w, y)
    .stroke()
    .restore();
  y += 3;
  rows.forEach((r, n) => {
    const within = r.tolerance === null ? null : Math.abs(r.deviation) <= r.tolerance;
    const cells = [
      r.label,
      num(r.nominal),
      signed(r.deviation),
      r.tolerance === null ? '\u2014' : num(r.tolerance),
      within === null ? '\u2014' : within ? 'within' : 'outside',
      r.basis,
    ];
    x = box.x;
    cells.forEach((t, i) => {
      const colour = i === 4 && within !== null ? STATUS_COLOURS[within ? 'within-target' : 'outside-target'] : INK;
      doc.fillColor(colour);
      // The gap after the numbers keeps the right-aligned deviation clear of the verdict.
      const pad = i === 3 ? 10 : 4;
      write(doc, i === 4 ? 'medium' : 'regular', FONT, t, x + 2, y + 2, {
        width: COLS[i].w * box.w - pad,
        align: i >= 1 && i <= 3 ? 'right' : 'left',
      });
      x += COLS[i].w * box.w;
    });
    y += heights[n];
    doc
      .save()
      .lineWidth(0.3)
      .strokeColor(RULE)
      .moveTo(box.x, y)
      .lineTo(box.x + box.w, y)
      .stroke()
      .restore();
  });
  doc.fillColor(INK);
}

const signed = (v: number) => (v > 0 ? `+${num(v)}` : num(v));
