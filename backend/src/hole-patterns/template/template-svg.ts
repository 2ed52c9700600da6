import { BORDER_MM } from './sheet-layout.js';
import {
  CROSSHAIR_BEYOND_MM,
  diameterLabel,
  INSTRUCTION,
  PUNCH_DOT_MM,
  PUNCH_RING_MM,
  REFERENCE_LABELS,
  referenceLabelAt,
  referenceSegments,
  type TemplateInput,
} from './template-drawing.js';

const MARGIN_MM = 10;
const HEADER_MM = 22;
const FOOTER_MM = 28;
/** Room for the scale bars and their labels, whatever the pattern's width. */
const MIN_WIDTH_MM = 200;

const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const n = (v: number) => String(Number(v.toFixed(4)));

/**
 * The whole template on one drawing in millimetres (width and height in mm, one user unit per
 * mm), for drawing programs, plotters and laser or plasma marking; the PDF is the one to print.
 */
export function renderTemplateSvg(input: TemplateInput): string {
  const width = Math.max(MIN_WIDTH_MM, input.widthMm + 2 * BORDER_MM + 2 * MARGIN_MM);
  const height = HEADER_MM + input.heightMm + 2 * BORDER_MM + FOOTER_MM + 2 * MARGIN_MM;
  const originX = (width - input.widthMm) / 2;
  const originY = MARGIN_MM + HEADER_MM + BORDER_MM + input.heightMm;
  const X = (x: number) => n(originX + x);
  const Y = (y: number) => n(originY - y);
  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${n(width)}mm" height="${n(height)}mm" viewBox="0 0 ${n(width)} ${n(height)}" font-family="Roboto, Arial, sans-serif">`,
  );
  out.push(`<title>Drilling template — ${esc(input.title)}</title>`);
  out.push(`<text x="${MARGIN_MM}" y="${MARGIN_MM + 4}" font-size="4.2" font-weight="700">${esc(input.title)}</text>`);
  out.push(
    `<text x="${MARGIN_MM}" y="${MARGIN_MM + 9}" font-size="2.6" fill="#4d5855">${esc([input.machineName, ...input.details].join(' · '))}</text>`,
  );
  out.push(
    `<text x="${MARGIN_MM}" y="${MARGIN_MM + 14}" font-size="2.6" font-weight="700" fill="#8a1c14">${esc(INSTRUCTION)}</text>`,
  );
  out.push(
    `<rect class="outline" x="${X(0)}" y="${Y(input.heightMm)}" width="${n(input.widthMm)}" height="${n(input.heightMm)}" fill="none" stroke="#4d5855" stroke-width="0.18"/>`,
  );
  for (const s of referenceSegments(input.reference, input.widthMm, input.heightMm)) {
    out.push(
      `<line class="reference" x1="${X(s.x1)}" y1="${Y(s.y1)}" x2="${X(s.x2)}" y2="${Y(s.y2)}" stroke="#1d4f4a" stroke-width="0.7"/>`,
    );
  }
  const label = referenceLabelAt(input.reference, input.widthMm, input.heightMm);
  const anchor = label.vertical ? 'middle' : label.x === 0 ? 'start' : label.x >= input.widthMm ? 'end' : 'middle';
  const ly = label.vertical ? Number(Y(label.y)) : Number(Y(label.y)) + (label.y < 0 ? 2.4 : -0.8);
  const rotate = label.vertical ? ` transform="rotate(-90 ${X(label.x)} ${n(ly)})"` : '';
  out.push(
    `<text x="${X(label.x)}" y="${n(ly)}" font-size="2.3" font-weight="700" fill="#1d4f4a" text-anchor="${anchor}"${rotate}>REFERENCE: ${REFERENCE_LABELS[input.reference]}</text>`,
  );
  for (const h of input.holes) {
    const cx = originX + h.xMm;
    const cy = originY - h.yMm;
    const r = h.diameterMm / 2;
    const arm = r + CROSSHAIR_BEYOND_MM;
    out.push(
      `<g class="hole"><circle cx="${n(cx)}" cy="${n(cy)}" r="${n(r)}" fill="none" stroke="#000" stroke-width="0.12"/>` +
        `<path class="crosshair" d="M ${n(cx - arm)} ${n(cy)} H ${n(cx + arm)} M ${n(cx)} ${n(cy - arm)} V ${n(cy + arm)}" stroke="#000" stroke-width="0.09"/>` +
        `<circle class="punch" cx="${n(cx)}" cy="${n(cy)}" r="${PUNCH_RING_MM}" fill="none" stroke="#000" stroke-width="0.1"/>` +
        `<circle cx="${n(cx)}" cy="${n(cy)}" r="${PUNCH_DOT_MM}"/>` +
        `<text x="${n(cx + r * 0.72 + 0.5)}" y="${n(cy - r * 0.72 - 0.5)}" font-size="2.1">${esc(diameterLabel(h.diameterMm, input.unit))}</text></g>`,
    );
  }
  const barY = height - MARGIN_MM - FOOTER_MM + 9;
  out.push(bar(MARGIN_MM, barY, 100, 10, '100 mm — measure this bar before punching'));
  out.push(bar(MARGIN_MM, barY + 12, 101.6, 12.7, '4 in (101.6 mm)'));
  out.push('</svg>');
  return out.join('\n') + '\n';
}

function bar(x: number, y: number, lengthMm: number, tickMm: number, label: string): string {
  const ticks = Math.round(lengthMm / tickMm);
  const tickPath = Array.from({ length: ticks + 1 }, (_, i) => {
    const major = i === 0 || i === ticks || (tickMm === 10 ? i % 5 === 0 : i % 2 === 0);
    return `M ${n(x + i * tickMm)} ${n(y)} V ${n(y - (major ? 3 : 1.6))}`;
  }).join(' ');
  return (
    `<g class="scale-bar"><line class="bar" x1="${n(x)}" y1="${n(y)}" x2="${n(x + lengthMm)}" y2="${n(y)}" stroke="#000" stroke-width="0.2"/>` +
    `<path d="${tickPath}" stroke="#000" stroke-width="0.14"/>` +
    `<text x="${n(x + lengthMm + 2)}" y="${n(y)}" font-size="2.4" font-weight="700">${esc(label)}</text></g>`
  );
}
