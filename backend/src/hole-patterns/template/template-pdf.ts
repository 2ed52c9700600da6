import PDFDocument from 'pdfkit';
// The certificate's Roboto loader: the same fonts, read and unpacked once for both documents.
import { certificateFonts } from '../../approvals/certificate/fonts.js';
import {
  alignmentMarks,
  FOOTER_MM,
  PAGE_MARGIN_MM,
  PT_PER_MM,
  toPage,
  type Sheet,
  type SheetLayout,
} from './sheet-layout.js';
import {
  CROSSHAIR_BEYOND_MM,
  diameterLabel,
  INSTRUCTION,
  PUNCH_DOT_MM,
  PUNCH_RING_MM,
  REFERENCE_LABELS,
  referenceLabelAt,
  referenceSegments,
  TILING_NOTE,
  type TemplateInput,
} from './template-drawing.js';

type Doc = PDFKit.PDFDocument;
const K = PT_PER_MM;
const INK = '#000000';
const MUTED = '#4d5855';
const REFERENCE = '#1d4f4a';
const GUIDE = '#8a8f8d';
const WARN = '#8a1c14';

/** The template at true scale: one page per sheet of the layout, 1 mm on paper per mm of pattern. */
export function renderTemplatePdf(input: TemplateInput, layout: SheetLayout): Promise<Buffer> {
  const doc = new PDFDocument({
    size: [layout.pageWidthMm * K, layout.pageHeightMm * K],
    margin: 0,
    autoFirstPage: false,
    compress: true,
    info: { Title: `Drilling template — ${input.title}`, Creator: 'Railwright', Producer: 'Railwright' },
  });
  const fonts = certificateFonts();
  doc.registerFont('regular', fonts.regular);
  doc.registerFont('bold', fonts.bold);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const marks = alignmentMarks(layout);
  for (const sheet of layout.sheets) {
    doc.addPage({ size: [layout.pageWidthMm * K, layout.pageHeightMm * K], margin: 0 });
    header(doc, input, layout, sheet);
    drawing(doc, input, layout, sheet, marks);
    scaleBars(doc, layout);
  }
  doc.end();
  return done;
}

function header(doc: Doc, input: TemplateInput, layout: SheetLayout, sheet: Sheet) {
  const left = PAGE_MARGIN_MM * K;
  const mapWidth = layout.sheets.length > 1 ? 40 * K : 0;
  const width = (layout.pageWidthMm - 2 * PAGE_MARGIN_MM) * K - mapWidth - 8;
  let y = PAGE_MARGIN_MM * K;
  doc.font('bold').fontSize(11).fillColor(INK).text(input.title, left, y, { width, lineBreak: false, ellipsis: true });
  y += 14;
  const sheetText = `Sheet ${sheet.number} of ${layout.sheets.length} · ${layout.paper.name} ${layout.orientation}`;
  const lines = [sheetText, ...input.details].join(' · ');
  doc
    .font('regular')
    .fontSize(7.5)
    .fillColor(MUTED)
    .text(`${input.machineName} · ${lines}`, left, y, { width, height: 20, ellipsis: true });
  y = doc.y + 2;
  doc.font('bold').fontSize(7.5).fillColor(WARN).text(INSTRUCTION, left, y, { width });
  if (layout.sheets.length > 1)
    doc
      .font('regular')
      .fontSize(7)
      .fillColor(MUTED)
      .text(TILING_NOTE, left, doc.y + 1, { width });
  if (mapWidth) sheetMap(doc, layout, sheet, left + width + 8, PAGE_MARGIN_MM * K, mapWidth);
}

/** A small map of the sheets, this one filled, so the stack can be laid out in order. */
function sheetMap(doc: Doc, layout: SheetLayout, sheet: Sheet, x: number, y: number, width: number) {
  const maxHeight = 19 * K;
  const cell = Math.min(width / layout.columns, (maxHeight - 9) / layout.rows);
  const ratio = Math.min(1, sheet.window.height / sheet.window.width);
  doc.font('regular').fontSize(6).fillColor(MUTED).text('How the sheets join', x, y, { width, lineBreak: false });
  for (const s of layout.sheets) {
    const cx = x + s.column * cell;
    const cy = y + 9 + s.row * cell * ratio;
    doc.lineWidth(0.4).rect(cx, cy, cell, cell * ratio);
    if (s.number === sheet.number) doc.fillAndStroke('#cfd8d6', INK);
    else doc.stroke(GUIDE);
    if (cell >= 7)
      doc
        .font('regular')
        .fontSize(Math.min(6, cell / 2))
        .fillColor(INK)
        .text(String(s.number), cx, cy + (cell * ratio) / 2 - 2.5, { width: cell, align: 'center', lineBreak: false });
  }
}

function drawing(
  doc: Doc,
  input: TemplateInput,
  layout: SheetLayout,
  sheet: Sheet,
  marks: { xMm: number; yMm: number }[],
) {
  const w = sheet.window;
  const at = (xMm: number, yMm: number) => {
    const p = toPage(sheet, xMm, yMm);
    return [p.x * K, p.y * K] as const;
  };
  // Only what reaches this sheet is drawn: text placed off the page would start a new one.
  const shows = (xMm: number, yMm: number, reachMm = 0) =>
    xMm + reachMm >= sheet.covers.x0 &&
    xMm - reachMm <= sheet.covers.x1 &&
    yMm + reachMm >= sheet.covers.y0 &&
    yMm - reachMm <= sheet.covers.y1;
  doc
    .lineWidth(0.3)
    .rect(w.left * K, w.top * K, w.width * K, w.height * K)
    .stroke(GUIDE);
  doc.save();
  doc.rect(w.left * K, w.top * K, w.width * K, w.height * K).clip();

  // Outline.
  const [ox, oy] = at(0, input.heightMm);
  doc
    .lineWidth(0.5)
    .rect(ox, oy, input.widthMm * K, input.heightMm * K)
    .stroke(MUTED);
  // Reference edge(s): a heavy line along the datum edge.
  for (const s of referenceSegments(input.reference, input.widthMm, input.heightMm)) {
    doc
      .lineWidth(2)
      .moveTo(...at(s.x1, s.y1))
      .lineTo(...at(s.x2, s.y2))
      .stroke(REFERENCE);
  }
  const label = referenceLabelAt(input.reference, input.widthMm, input.heightMm);
  const [lx, ly] = at(label.x, label.y);
  doc.font('bold').fontSize(6.5).fillColor(REFERENCE);
  const text = `REFERENCE: ${REFERENCE_LABELS[input.reference]}`;
  if (!shows(label.x, label.y)) {
    // The reference label is on another sheet.
  } else if (label.vertical) {
    doc
      .save()
      .rotate(-90, { origin: [lx, ly] })
      .text(text, lx - 60, ly - (label.x < 0 ? 8 : -1), { width: 120, align: 'center', lineBreak: false })
      .restore();
  } else {
    doc.text(text, lx - (label.x === 0 ? 0 : label.x >= input.widthMm ? 120 : 60), ly - (label.y < 0 ? -1 : 8), {
      width: 120,
      align: label.x === 0 ? 'left' : label.x >= input.widthMm ? 'right' : 'center',
      lineBreak: false,
    });
  }

  // Overlap guides and alignment marks.
  for (const s of layout.sheets) {
    if (s.column > 0 && s.row === sheet.row && (s.column === sheet.column || s.column === sheet.column + 1))
      seamLine(
        doc,
        sheet,
        s.covers.x0 + layout.overlapMm / 2,
        'x',
        s.column === sheet.column ? `trim · lay over sheet ${sheet.number - 1}` : `sheet ${s.number} laps here`,
      );
    if (s.row > 0 && s.column === sheet.column && (s.row === sheet.row || s.row === sheet.row + 1))
      seamLine(
        doc,
        sheet,
        s.covers.y1 - layout.overlapMm / 2,
        'y',
        s.row === sheet.row ? `trim · lay over sheet ${sheet.number - layout.columns}` : `sheet ${s.number} laps here`,
      );
  }
  for (const m of marks) if (shows(m.xMm, m.yMm, 6)) alignmentMark(doc, ...at(m.xMm, m.yMm));

  for (const hole of input.holes) {
    if (!shows(hole.xMm, hole.yMm, hole.diameterMm / 2 + CROSSHAIR_BEYOND_MM)) continue;
    const [cx, cy] = at(hole.xMm, hole.yMm);
    const r = (hole.diameterMm / 2) * K;
    const arm = r + CROSSHAIR_BEYOND_MM * K;
    doc.lineWidth(0.35).circle(cx, cy, r).stroke(INK);
    // One path: the horizontal arm, then the vertical one; their crossing is the hole centre.
    doc
      .lineWidth(0.25)
      .moveTo(cx - arm, cy)
      .lineTo(cx + arm, cy)
      .moveTo(cx, cy - arm)
      .lineTo(cx, cy + arm)
      .stroke(INK);
    doc
      .lineWidth(0.3)
      .circle(cx, cy, PUNCH_RING_MM * K)
      .stroke(INK);
    doc.circle(cx, cy, PUNCH_DOT_MM * K).fill(INK);
    if (shows(hole.xMm, hole.yMm))
      doc
        .font('regular')
        .fontSize(6)
        .fillColor(INK)
        .text(diameterLabel(hole.diameterMm, input.unit), cx + r * 0.72 + 1.5, cy - r * 0.72 - 8, { lineBreak: false });
  }
  doc.restore();
}

function seamLine(doc: Doc, sheet: Sheet, at: number, along: 'x' | 'y', label: string) {
  const w = sheet.window;
  doc.lineWidth(0.4).dash(3, { space: 2 });
  if (along === 'x') {
    const x = toPage(sheet, at, 0).x * K;
    doc
      .moveTo(x, w.top * K)
      .lineTo(x, (w.top + w.height) * K)
      .stroke(GUIDE);
    // The label sits on this sheet's side of the line, so the window's edge never cuts it.
    const own = label.startsWith('trim');
    doc
      .undash()
      .font('regular')
      .fontSize(6)
      .fillColor(GUIDE)
      .text(label, own ? x + 2 : x - 102, (w.top + w.height) * K - 10, {
        width: 100,
        align: own ? 'left' : 'right',
        lineBreak: false,
      });
  } else {
    const y = toPage(sheet, 0, at).y * K;
    doc
      .moveTo(w.left * K, y)
      .lineTo((w.left + w.width) * K, y)
      .stroke(GUIDE);
    const own = label.startsWith('trim');
    doc
      .undash()
      .font('regular')
      .fontSize(6)
      .fillColor(GUIDE)
      .text(label, w.left * K + 2, own ? y + 2 : y - 9, { lineBreak: false });
  }
  doc.undash();
}

function alignmentMark(doc: Doc, x: number, y: number) {
  const r = 3 * K;
  doc.lineWidth(0.4).circle(x, y, r).stroke(GUIDE);
  doc
    .lineWidth(0.4)
    .moveTo(x - r - 2 * K, y)
    .lineTo(x + r + 2 * K, y)
    .stroke(GUIDE);
  doc
    .lineWidth(0.4)
    .moveTo(x, y - r - 2 * K)
    .lineTo(x, y + r + 2 * K)
    .stroke(GUIDE);
}

/** A 100 mm bar (10 mm ticks) and a 4 in bar (½ in ticks), each one straight baseline path. */
function scaleBars(doc: Doc, layout: SheetLayout) {
  const left = PAGE_MARGIN_MM * K;
  const top = (layout.pageHeightMm - PAGE_MARGIN_MM - FOOTER_MM) * K;
  bar(doc, left, top + 8 * K, 100, 10, '100 mm — measure this bar before punching');
  bar(doc, left, top + 20 * K, 101.6, 12.7, '4 in (101.6 mm)');
}

function bar(doc: Doc, x: number, y: number, lengthMm: number, tickMm: number, label: string) {
  const length = lengthMm * K;
  doc
    .lineWidth(0.6)
    .moveTo(x, y)
    .lineTo(x + length, y)
    .stroke(INK);
  const ticks = Math.round(lengthMm / tickMm);
  for (let i = 0; i <= ticks; i++) {
    const major = i === 0 || i === ticks || (tickMm === 10 ? i % 5 === 0 : i % 2 === 0);
    const tx = x + i * tickMm * K;
    doc
      .lineWidth(0.4)
      .moveTo(tx, y)
      .lineTo(tx, y - (major ? 3 : 1.6) * K)
      .stroke(INK);
  }
  doc
    .font('regular')
    .fontSize(6)
    .fillColor(INK)
    .text('0', x - 1.5, y + 2, { lineBreak: false });
  doc
    .font('bold')
    .fontSize(7)
    .fillColor(INK)
    .text(label, x + length + 4, y - 4, { lineBreak: false });
}
