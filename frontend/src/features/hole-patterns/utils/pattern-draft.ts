import type { HolePattern, PatternEntry, PatternInput, PatternReference, PatternUnit } from '../types';

/** The form's state: numbers kept as typed so a half-typed "12," is not lost. */
export interface PatternDraft {
  name: string;
  reference: PatternReference;
  unit: PatternUnit;
  width: string;
  height: string;
  entry: PatternEntry;
  holes: { x: string; y: string; diameter: string }[];
  grid: Record<'originX' | 'originY' | 'rows' | 'columns' | 'pitchX' | 'pitchY' | 'diameter', string>;
  circle: Record<'centreX' | 'centreY' | 'circleDiameter' | 'count' | 'startAngleDeg' | 'diameter', string>;
  notes: string;
}

export const emptyDraft = (): PatternDraft => ({
  name: '',
  reference: 'bottom-left',
  unit: 'mm',
  width: '100',
  height: '80',
  entry: 'circle',
  holes: [{ x: '10', y: '10', diameter: '5.5' }],
  grid: { originX: '10', originY: '10', rows: '2', columns: '2', pitchX: '80', pitchY: '60', diameter: '5.5' },
  circle: { centreX: '50', centreY: '40', circleDiameter: '50', count: '4', startAngleDeg: '45', diameter: '5.5' },
  notes: '',
});

const s = (n: number) => String(n);

export function draftOf(p: HolePattern): PatternDraft {
  const d = emptyDraft();
  return {
    ...d,
    name: p.name,
    reference: p.reference,
    unit: p.lengthUnit,
    width: s(p.width),
    height: s(p.height),
    entry: p.entry,
    holes: p.holesEntered ? p.holesEntered.map((h) => ({ x: s(h.x), y: s(h.y), diameter: s(h.diameter) })) : d.holes,
    grid: p.grid
      ? (Object.fromEntries(Object.entries(p.grid).map(([k, v]) => [k, s(v)])) as PatternDraft['grid'])
      : d.grid,
    circle: p.circle
      ? (Object.fromEntries(Object.entries(p.circle).map(([k, v]) => [k, s(v)])) as PatternDraft['circle'])
      : d.circle,
    notes: p.notes,
  };
}

/** A number as people type it: point or comma decimals; null when it is not one yet. */
export function parseNumber(text: string): number | null {
  const t = text.trim().replace(',', '.');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(t)) return null;
  return Number(t);
}

function numbers<K extends string>(rec: Record<K, string>): Record<K, number> | null {
  const out = {} as Record<K, number>;
  for (const [k, v] of Object.entries(rec) as [K, string][]) {
    const n = parseNumber(v);
    if (n === null) return null;
    out[k] = n;
  }
  return out;
}

/** The request body, or null while a number is missing or half-typed. */
export function inputOf(d: PatternDraft): PatternInput | null {
  const width = parseNumber(d.width);
  const height = parseNumber(d.height);
  if (width === null || height === null || !d.name.trim()) return null;
  const base = {
    name: d.name.trim(),
    reference: d.reference,
    lengthUnit: d.unit,
    width,
    height,
    entry: d.entry,
    notes: d.notes,
  };
  if (d.entry === 'list') {
    const holes = d.holes.map((h) => numbers(h));
    return holes.every((h) => h !== null) && holes.length
      ? { ...base, holes: holes as NonNullable<(typeof holes)[number]>[] }
      : null;
  }
  if (d.entry === 'grid') {
    const grid = numbers(d.grid);
    return grid ? { ...base, grid } : null;
  }
  const circle = numbers(d.circle);
  return circle ? { ...base, circle } : null;
}
