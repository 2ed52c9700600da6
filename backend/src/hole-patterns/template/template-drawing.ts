import type { PatternReference, PatternUnit } from '../../database/schema/hole-patterns.js';
import type { Hole } from '../geometry/pattern-holes.js';

/** What a template shows, whichever format draws it. Lengths in mm, pattern coordinates. */
export interface TemplateInput {
  title: string;
  machineName: string;
  /** Short lines under the title (outline, pitch, bolt notes). */
  details: string[];
  widthMm: number;
  heightMm: number;
  reference: PatternReference;
  /** Unit the pattern was entered in; diameters are labelled in it. */
  unit: PatternUnit;
  holes: Hole[];
}

export const INSTRUCTION =
  'Print at actual size (100 %, scaling off — not “fit to page”). Measure the 100 mm bar before you punch: it must read exactly 100 mm.';
export const TILING_NOTE =
  'Trim each sheet along its dashed line, lay it over its neighbour so the round marks meet, and tape it down.';

export const REFERENCE_LABELS: Record<PatternReference, string> = {
  'bottom-left': 'lower-left corner',
  'bottom-right': 'lower-right corner',
  'top-left': 'upper-left corner',
  'top-right': 'upper-right corner',
  left: 'left edge',
  right: 'right edge',
  bottom: 'lower edge',
  top: 'upper edge',
};

export interface Segment {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}

/** The outline's edges that make up the reference: one edge, or the two edges meeting at a corner. */
export function referenceSegments(reference: PatternReference, w: number, h: number): Segment[] {
  const left = { x1: 0, y1: 0, x2: 0, y2: h };
  const right = { x1: w, y1: 0, x2: w, y2: h };
  const bottom = { x1: 0, y1: 0, x2: w, y2: 0 };
  const top = { x1: 0, y1: h, x2: w, y2: h };
  switch (reference) {
    case 'left':
      return [left];
    case 'right':
      return [right];
    case 'bottom':
      return [bottom];
    case 'top':
      return [top];
    case 'bottom-left':
      return [left, bottom];
    case 'bottom-right':
      return [right, bottom];
    case 'top-left':
      return [left, top];
    case 'top-right':
      return [right, top];
  }
}

/** Where the word "REFERENCE" goes: just outside the reference edge or corner, mm. */
export function referenceLabelAt(
  reference: PatternReference,
  w: number,
  h: number,
): { x: number; y: number; vertical: boolean } {
  const outside = 3;
  if (reference === 'left') return { x: -outside, y: h / 2, vertical: true };
  if (reference === 'right') return { x: w + outside, y: h / 2, vertical: true };
  if (reference === 'top') return { x: w / 2, y: h + outside, vertical: false };
  if (reference === 'bottom') return { x: w / 2, y: -outside, vertical: false };
  const x = reference.endsWith('left') ? 0 : w;
  const y = reference.startsWith('bottom') ? -outside : h + outside;
  return { x, y, vertical: false };
}

const trim = (n: number, places: number) => String(Number(n.toFixed(places)));

export function diameterLabel(diameterMm: number, unit: PatternUnit): string {
  return unit === 'in' ? `Ø ${trim((diameterMm * 10) / 254, 4)} in` : `Ø ${trim(diameterMm, 2)}`;
}

/** Arm of a crosshair beyond the hole's edge, mm, so the centre lines can be found on the part. */
export const CROSSHAIR_BEYOND_MM = 3;
export const PUNCH_RING_MM = 0.8;
export const PUNCH_DOT_MM = 0.25;
