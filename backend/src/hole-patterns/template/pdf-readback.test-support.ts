import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { inflateSync } from 'node:zlib';

/**
 * Reads a template PDF back through poppler (pdftocairo → SVG, at the page's own size, neither
 * shrunk nor centred) so the tests measure what a printer would get, not what the code meant to
 * draw. Paths are classified by their shape and stroke width only:
 * - crosshair: one path of a horizontal then a vertical segment (stroke 0.25 pt);
 * - outline: a closed rectangle, stroke 0.5 pt; window frame: a closed rectangle, stroke 0.3 pt;
 * - scale bar baseline: one horizontal segment, stroke 0.6 pt.
 * Cairo keeps coordinates to 1/256 pt (0.0014 mm).
 */

export interface Rect {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}
export interface ReadPage {
  widthPt: number;
  heightPt: number;
  crosshairs: { x: number; y: number }[];
  outlines: Rect[];
  frames: Rect[];
  bars: { x0: number; x1: number; y: number }[];
}

const NUM = String.raw`(-?\d+(?:\.\d+)?)`;
const CROSS = new RegExp(`^M ${NUM} ${NUM} L ${NUM} ${NUM} M ${NUM} ${NUM} L ${NUM} ${NUM} ?$`);
const LINE = new RegExp(`^M ${NUM} ${NUM} L ${NUM} ${NUM} ?$`);
const RECT = new RegExp(`^M ${NUM} ${NUM} L ${NUM} ${NUM} L ${NUM} ${NUM} L ${NUM} ${NUM} Z`);

export function pageCount(pdf: Buffer): number {
  return Number(/Pages:\s+(\d+)/.exec(execFileSync('pdfinfo', ['-'], { input: pdf }).toString())![1]);
}

export function readPdfPages(pdf: Buffer): ReadPage[] {
  const dir = mkdtempSync(path.join(tmpdir(), 'rw-template-'));
  try {
    const file = path.join(dir, 't.pdf');
    writeFileSync(file, pdf);
    const pages: ReadPage[] = [];
    const count = pageCount(pdf);
    for (let p = 1; p <= count; p++) {
      const out = path.join(dir, `p${p}.svg`);
      execFileSync('pdftocairo', [
        '-svg',
        '-origpagesizes',
        '-noshrink',
        '-nocenter',
        '-f',
        String(p),
        '-l',
        String(p),
        file,
        out,
      ]);
      pages.push(parseCairoSvg(readFileSync(out, 'utf8')));
    }
    return pages;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

function parseCairoSvg(svg: string): ReadPage {
  const size = /<svg[^>]*width="([\d.]+)pt" height="([\d.]+)pt"/.exec(svg)!;
  const page: ReadPage = {
    widthPt: Number(size[1]),
    heightPt: Number(size[2]),
    crosshairs: [],
    outlines: [],
    frames: [],
    bars: [],
  };
  for (const m of svg.matchAll(/<path style="([^"]*)" d="([^"]*)"(?: transform="([^"]*)")?\/>/g)) {
    const [, style, d, transform] = m;
    if (style.includes('stroke:none') || !style.includes('stroke-width')) continue;
    if (transform) throw new Error(`unexpected transform ${transform}: the page was scaled`);
    const width = Number(/stroke-width:([\d.]+)/.exec(style)![1]);
    const path = d.trim();
    const cross = CROSS.exec(path);
    if (cross && width === 0.25) {
      const [_x1, y1, _x2, y2, x3, _y3, x4, _y4] = cross.slice(1).map(Number);
      if (y1 === y2 && x3 === x4) page.crosshairs.push({ x: x3, y: y1 });
      continue;
    }
    const rect = RECT.exec(path);
    if (rect) {
      const xs = [1, 3, 5, 7].map((i) => Number(rect[i]));
      const ys = [2, 4, 6, 8].map((i) => Number(rect[i]));
      const r = { x0: Math.min(...xs), x1: Math.max(...xs), y0: Math.min(...ys), y1: Math.max(...ys) };
      if (width === 0.5) page.outlines.push(r);
      if (width === 0.3) page.frames.push(r);
      continue;
    }
    const line = LINE.exec(path);
    if (line && width === 0.6 && line[2] === line[4])
      page.bars.push({ x0: Number(line[1]), x1: Number(line[3]), y: Number(line[2]) });
  }
  return page;
}

/** The page content streams as pdfkit wrote them (inflated), for numbers at full precision. */
export function contentStreams(pdf: Buffer): string[] {
  const text = pdf.toString('latin1');
  const out: string[] = [];
  for (const m of text.matchAll(/stream\r?\n/g)) {
    const start = m.index! + m[0].length;
    const end = text.indexOf('endstream', start);
    try {
      out.push(inflateSync(pdf.subarray(start, end)).toString('latin1'));
    } catch {
      // Font programs and other binary streams are not all deflated; they are not needed here.
    }
  }
  return out.filter((s) => / re\n| l\n/.test(s));
}
