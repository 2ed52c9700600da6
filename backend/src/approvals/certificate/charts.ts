import type PDFKit from 'pdfkit';
import type { CheckSeries } from '../../records/readiness.js';
import type { BoardCheck } from '../snapshot.js';
import { num, targetText, unitLabel } from './format.js';
import { widthOf, write } from './pdf-text.js';
import { INK, MUTED, RULE, STATUS_COLOURS } from './palette.js';

type Doc = PDFKit.PDFDocument;
export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

const LINE_COLOURS = ['#1d4f4a', '#c8932a', '#7a5aa6', '#2e7d4f', '#b3261e'];

/**
 * One colour per measured line; a band edge takes the colour of the measured line its label
 * starts with ("Mean up + 2s" goes with "Mean up"), or of the line before it.
 */
function lineColours(s: CheckSeries): string[] {
  const out: string[] = [];
  let next = 0;
  s.lines.forEach((line, i) => {
    if (isBandEdge(line.label)) {
      const owner = s.lines.findIndex((l, j) => j !== i && !isBandEdge(l.label) && line.label.startsWith(l.label));
      out.push(
        owner >= 0 && owner < out.length
          ? out[owner]
          : owner >= 0
            ? LINE_COLOURS[s.lines.slice(0, owner).filter((l) => !isBandEdge(l.label)).length % LINE_COLOURS.length]
            : (out[i - 1] ?? LINE_COLOURS[0]),
      );
    } else out.push(LINE_COLOURS[next++ % LINE_COLOURS.length]);
  });
  return out;
}

/** Lines of the legend a series needs at a width (for the box height). */
export function legendRows(doc: Doc, s: CheckSeries, width: number): number {
  let rows = 1;
  let x = 0;
  for (const line of s.lines) {
    const w = 24 + widthOf(doc, 'regular', 6.5, line.label);
    if (x > 0 && x + w > width) {
      rows++;
      x = 0;
    }
    x += w;
  }
  return rows;
}

function niceStep(range: number, count: number): number {
  const raw = range / Math.max(1, count);
  const mag = 10 ** Math.floor(Math.log10(raw));
  const f = raw / mag;
  return (f <= 1 ? 1 : f <= 2 ? 2 : f <= 2.5 ? 2.5 : f <= 5 ? 5 : 10) * mag;
}

function ticks(min: number, max: number, count: number): number[] {
  const step = niceStep(max - min || 1, count);
  const out: number[] = [];
  for (let v = Math.ceil(min / step) * step; v <= max + step * 1e-9; v += step)
    out.push(Math.abs(v) < step * 1e-9 ? 0 : v);
  return out;
}

/**
 * Lines of a series that are the edges of a band (mean ± 2s of a repeat-and-reverse run) rather
 * than measured values: drawn thin and dashed in the colour of the line they belong to.
 */
export const isBandEdge = (label: string) => /(?:[±+\u2212-]\s*2\s*s\b)|\bband\b/i.test(label);

/**
 * A line chart of the snapshot's series: axes with ticks and units, each line with its points,
 * dashed limits. With `valueLabels` each point carries its value (for a handful of points, such as
 * backlash at the ends and middle of an axis).
 */
export function drawSeriesChart(doc: Doc, box: Box, s: CheckSeries, options: { valueLabels?: boolean } = {}): void {
  const pts = s.lines.flatMap((l) => l.points).filter(([x, y]) => Number.isFinite(x) && Number.isFinite(y));
  if (!pts.length) return drawNoData(doc, box, 'no chart data');
  const ys = [...pts.map((p) => p[1]), ...(s.limits ?? []).map((l) => l.value), 0];
  let [xMin, xMax] = [Math.min(...pts.map((p) => p[0])), Math.max(...pts.map((p) => p[0]))];
  let [yMin, yMax] = [Math.min(...ys), Math.max(...ys)];
  if (xMax === xMin) [xMin, xMax] = [xMin - 1, xMax + 1];
  const pad = (yMax - yMin || 1) * 0.1;
  [yMin, yMax] = [yMin - pad, yMax + pad];
  const legendExtra = (legendRows(doc, s, box.w - 56) - 1) * 9;
  const plot = { x: box.x + 46, y: box.y + 8, w: box.w - 56, h: box.h - 44 - legendExtra };
  const px = (x: number) => plot.x + ((x - xMin) / (xMax - xMin)) * plot.w;
  const py = (y: number) => plot.y + plot.h - ((y - yMin) / (yMax - yMin)) * plot.h;

  doc.save().lineWidth(0.4).strokeColor(RULE);
  for (const t of ticks(yMin, yMax, 4)) {
    doc
      .moveTo(plot.x, py(t))
      .lineTo(plot.x + plot.w, py(t))
      .stroke();
    write(doc, 'regular', 6.5, num(t), plot.x - 44, py(t) - 3, { width: 40, align: 'right', lineBreak: false });
  }
  // A count (check number) has no halves.
  const xTicks = ticks(xMin, xMax, 6).filter((t) => s.x.unit !== '#' || Number.isInteger(t));
  for (const t of xTicks)
    write(doc, 'regular', 6.5, num(t), px(t) - 20, plot.y + plot.h + 3, {
      width: 40,
      align: 'center',
      lineBreak: false,
    });
  doc.lineWidth(0.8).strokeColor(INK).rect(plot.x, plot.y, plot.w, plot.h).stroke();
  for (const l of s.limits ?? []) {
    if (l.value < yMin || l.value > yMax) continue;
    doc
      .lineWidth(0.8)
      .strokeColor(STATUS_COLOURS['outside-target'])
      .dash(3, { space: 2 })
      .moveTo(plot.x, py(l.value))
      .lineTo(plot.x + plot.w, py(l.value))
      .stroke()
      .undash();
    write(doc, 'regular', 6, l.label, plot.x + plot.w - 120, py(l.value) - 8, {
      width: 118,
      align: 'right',
      lineBreak: false,
    });
  }
  const colours = lineColours(s);
  s.lines.forEach((line, i) => {
    const colour = colours[i];
    const p = line.points.filter(([x, y]) => Number.isFinite(x) && Number.isFinite(y));
    if (!p.length) return;
    if (isBandEdge(line.label)) {
      doc.lineWidth(0.7).strokeColor(colour).dash(2, { space: 1.5 });
      p.forEach(([x, y], j) => (j ? doc.lineTo(px(x), py(y)) : doc.moveTo(px(x), py(y))));
      doc.stroke().undash();
      return;
    }
    doc.lineWidth(1.1).strokeColor(colour);
    p.forEach(([x, y], j) => (j ? doc.lineTo(px(x), py(y)) : doc.moveTo(px(x), py(y))));
    doc.stroke();
    doc.fillColor(colour);
    for (const [x, y] of p) doc.circle(px(x), py(y), 1.6).fill();
    // Value labels sit above their point, kept inside the plot at its edges.
    if (options.valueLabels)
      for (const [x, y] of p)
        write(
          doc,
          'medium',
          6.5,
          num(y),
          Math.min(Math.max(px(x) - 20, plot.x + 2), plot.x + plot.w - 42),
          py(y) - 10,
          { width: 40, align: 'center', lineBreak: false },
        );
  });
  doc.restore();
  const xLabel = `${s.x.label} (${unitLabel(s.x.unit)})`;
  write(doc, 'regular', 7, xLabel, plot.x, plot.y + plot.h + 13, { width: plot.w, align: 'center', lineBreak: false });
  doc.save().rotate(-90, { origin: [box.x + 6, plot.y + plot.h / 2] });
  write(doc, 'regular', 7, `${s.y.label} (${unitLabel(s.y.unit)})`, box.x + 6 - plot.h / 2, plot.y + plot.h / 2 - 3, {
    width: plot.h,
    align: 'center',
    lineBreak: false,
  });
  doc.restore();
  let lx = plot.x;
  let ly = box.y + box.h - 8 - legendExtra;
  s.lines.forEach((line, i) => {
    const w = 24 + widthOf(doc, 'regular', 6.5, line.label);
    // Legends that do not fit on one line wrap onto the next rather than running off the page.
    if (lx > plot.x && lx + w > plot.x + plot.w) {
      lx = plot.x;
      ly += 9;
    }
    const band = isBandEdge(line.label);
    doc
      .save()
      .lineWidth(band ? 0.7 : 1.5)
      .strokeColor(colours[i]);
    if (band) doc.dash(2, { space: 1.5 });
    doc
      .moveTo(lx, ly + 3)
      .lineTo(lx + 12, ly + 3)
      .stroke()
      .restore();
    write(doc, 'regular', 6.5, line.label, lx + 15, ly, { lineBreak: false });
    lx += w;
  });
  doc.fillColor(INK);
}

/**
 * Without a series, draw what there is: the result beside its target on one scale, and say so.
 */
export function drawResultGauge(doc: Doc, box: Box, c: BoardCheck): void {
  if (!c.result || !c.target)
    return drawNoData(
      doc,
      box,
      c.result ? 'no chart data (no target to compare with)' : 'no chart data \u2014 not recorded',
    );
  drawNoData(doc, box, 'no chart data \u2014 the result against its target:');
  const max = Math.max(Math.abs(c.result.value), c.target.value, 1e-9) * 1.25;
  const bar = { x: box.x + 16, y: box.y + box.h / 2, w: box.w - 32 };
  const at = (v: number) => bar.x + (Math.min(Math.abs(v), max) / max) * bar.w;
  doc.save();
  doc
    .lineWidth(0.6)
    .strokeColor(RULE)
    .moveTo(bar.x, bar.y + 8)
    .lineTo(bar.x + bar.w, bar.y + 8)
    .stroke();
  doc
    .fillColor(STATUS_COLOURS[c.status] ?? INK)
    .rect(bar.x, bar.y, Math.max(1, at(c.result.value) - bar.x), 8)
    .fill();
  doc
    .lineWidth(1)
    .strokeColor(STATUS_COLOURS['outside-target'])
    .dash(2, { space: 2 })
    .moveTo(at(c.target.value), bar.y - 6)
    .lineTo(at(c.target.value), bar.y + 14)
    .stroke()
    .undash();
  doc.restore();
  const same = c.target.unit === c.result.unit;
  write(doc, 'regular', 7, `result ${num(c.result.value)} ${unitLabel(c.result.unit)}`, bar.x, bar.y + 12, {
    lineBreak: false,
  });
  const label = `target ${targetText(c)}${same ? '' : ' (other unit)'}`;
  const tx = Math.min(at(c.target.value) + 4, bar.x + bar.w - widthOf(doc, 'regular', 7, label));
  write(doc, 'regular', 7, label, tx, bar.y - 14, { lineBreak: false });
}

function drawNoData(doc: Doc, box: Box, text: string) {
  doc.save().lineWidth(0.5).strokeColor(RULE).rect(box.x, box.y, box.w, box.h).stroke().restore();
  doc.fillColor(MUTED);
  write(doc, 'italic', 7.5, text, box.x + 8, box.y + 6, { lineBreak: false });
  doc.fillColor(INK);
}

/**
 * A diagonal check without a series: the work area's rectangle beside the parallelogram its
 * measured out-of-square angle makes, the skew drawn exaggerated so it can be seen at all.
 */
export function drawSquarenessSketch(doc: Doc, box: Box, c: BoardCheck, workArea: { x: number; y: number }): void {
  if (!c.result || c.result.unit !== 'mm/m') return drawResultGauge(doc, box, c);
  drawNoData(doc, box, 'no chart data \u2014 sketch of the measured out-of-square, skew exaggerated:');
  const h = box.h - 34;
  const w = Math.min(box.w * 0.45, (h * workArea.x) / Math.max(1, workArea.y));
  const x0 = box.x + 24;
  const y0 = box.y + 22;
  // 0.1 mm/m leans by a tenth of the height (capped): visible, and labelled with the true value.
  const lean = Math.max(-0.35, Math.min(0.35, c.result.value)) * h;
  doc.save();
  doc.lineWidth(0.6).strokeColor(RULE).dash(2, { space: 2 }).rect(x0, y0, w, h).stroke().undash();
  doc.lineWidth(1.4).strokeColor(STATUS_COLOURS[c.status] ?? INK);
  doc
    .moveTo(x0, y0 + h)
    .lineTo(x0 + w, y0 + h)
    .lineTo(x0 + w + lean, y0)
    .lineTo(x0 + lean, y0)
    .closePath()
    .stroke();
  doc
    .lineWidth(0.6)
    .strokeColor(MUTED)
    .moveTo(x0, y0 + h)
    .lineTo(x0 + w + lean, y0)
    .moveTo(x0 + w, y0 + h)
    .lineTo(x0 + lean, y0)
    .stroke();
  doc.restore();
  const tx = x0 + w + Math.abs(lean) + 24;
  write(doc, 'medium', 8, `${num(c.result.value)} mm/m out of square`, tx, y0 + 4, { lineBreak: false });
  write(doc, 'regular', 7.5, `target ${targetText(c)}`, tx, y0 + 18, { lineBreak: false });
  doc.fillColor(MUTED);
  write(doc, 'regular', 7, c.result.summary, tx, y0 + 32, { width: box.x + box.w - tx - 8 });
  write(
    doc,
    'regular',
    7,
    `dashed: square; solid: as measured; diagonals drawn thin (work area ${workArea.x} \u00d7 ${workArea.y} mm)`,
    tx,
    y0 + h - 10,
    { width: box.x + box.w - tx - 8, lineBreak: false },
  );
  doc.fillColor(INK);
}
