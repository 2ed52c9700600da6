import type PDFKit from 'pdfkit';
import { needsMathFont, type FontName } from './fonts.js';

type Doc = PDFKit.PDFDocument;

/** Splits text into runs for the main font and the math font, keeping the order. */
export function runs(text: string): { math: boolean; text: string }[] {
  const out: { math: boolean; text: string }[] = [];
  for (const ch of text) {
    const math = needsMathFont(ch);
    const last = out[out.length - 1];
    if (last && last.math === math) last.text += ch;
    else out.push({ math, text: ch });
  }
  return out;
}

/**
 * doc.text with a fallback font: runs of ≤, ≥, Δ… are set in Roboto's math subset so they print
 * instead of turning into blanks. Position and options apply to the whole paragraph.
 */
export function write(
  doc: Doc,
  font: FontName,
  size: number,
  text: string,
  x?: number,
  y?: number,
  options: PDFKit.Mixins.TextOptions = {},
): void {
  const parts = runs(text);
  doc.fontSize(size);
  if (parts.length <= 1 && !parts[0]?.math) {
    doc.font(font);
    if (x === undefined) doc.text(text, options);
    else doc.text(text, x, y, options);
    return;
  }
  parts.forEach((p, i) => {
    const last = i === parts.length - 1;
    doc.font(p.math ? 'math' : font);
    const opts = { ...options, continued: !last };
    if (i === 0 && x !== undefined) doc.text(p.text, x, y, opts);
    else doc.text(p.text, opts);
  });
  doc.font(font);
}

/** Width of a one-line text with the same fallback. */
export function widthOf(doc: Doc, font: FontName, size: number, text: string): number {
  doc.fontSize(size);
  let w = 0;
  for (const p of runs(text)) {
    doc.font(p.math ? 'math' : font);
    w += doc.widthOfString(p.text);
  }
  doc.font(font);
  return w;
}
