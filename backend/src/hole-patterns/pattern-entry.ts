import { toMm } from '../engine/units.js';
import type { StoredPatternEntry } from '../database/schema/hole-patterns.js';
import { boltCircleHoles, gridHoles, patternProblems, type Hole } from './geometry/pattern-holes.js';
import { MAX_HOLES, type HolePatternDto } from './dto/hole-pattern.dto.js';

/** Largest outline side, mm: a long rail or a gantry plate; more would not be printed in sheets anyway. */
export const MAX_SIDE_MM = 6000;

export interface ResolvedPattern {
  widthMm: number;
  heightMm: number;
  entry: StoredPatternEntry;
  holes: Hole[];
}

/**
 * Turns a pattern as entered (in mm or inches, as a list, grid or bolt circle) into its outline and
 * holes in mm, or the list of what is wrong, each message naming its field.
 */
export function resolvePattern(dto: HolePatternDto): { pattern: ResolvedPattern | null; problems: string[] } {
  const mm = (v: number) => toMm(v, dto.lengthUnit ?? 'mm');
  const problems: string[] = [];
  const widthMm = mm(dto.width);
  const heightMm = mm(dto.height);
  for (const [field, value] of [
    ['width', widthMm],
    ['height', heightMm],
  ] as const) {
    if (!(value > 0)) problems.push(`${field} must be greater than 0`);
    else if (value > MAX_SIDE_MM)
      problems.push(`${field} must be at most ${MAX_SIDE_MM} mm (${dto[field]} ${dto.lengthUnit ?? 'mm'} given)`);
  }
  for (const other of ['holes', 'grid', 'circle'] as const) {
    const owner = other === 'holes' ? 'list' : other;
    if (owner !== dto.entry && dto[other] !== undefined)
      problems.push(`${other} is only read when entry is ${owner}; leave it out for entry ${dto.entry}`);
  }
  if (problems.length) return { pattern: null, problems };

  let entry: StoredPatternEntry;
  let holes: Hole[];
  let field: (i: number) => string;
  if (dto.entry === 'list') {
    const list = dto.holes!;
    entry = { kind: 'list', holes: list.map((h) => ({ x: h.x, y: h.y, diameter: h.diameter })) };
    holes = list.map((h) => ({ xMm: mm(h.x), yMm: mm(h.y), diameterMm: mm(h.diameter) }));
    field = (i) => `holes[${i}]`;
  } else if (dto.entry === 'grid') {
    const g = dto.grid!;
    if (g.rows * g.columns > MAX_HOLES)
      return {
        pattern: null,
        problems: [`grid: rows × columns must be at most ${MAX_HOLES} holes (${g.rows * g.columns} asked)`],
      };
    entry = { kind: 'grid', ...pick(g, ['originX', 'originY', 'rows', 'columns', 'pitchX', 'pitchY', 'diameter']) };
    holes = gridHoles({
      originXMm: mm(g.originX),
      originYMm: mm(g.originY),
      rows: g.rows,
      columns: g.columns,
      pitchXMm: mm(g.pitchX),
      pitchYMm: mm(g.pitchY),
      diameterMm: mm(g.diameter),
    });
    field = (i) => `grid (row ${Math.floor(i / g.columns) + 1}, column ${(i % g.columns) + 1})`;
  } else {
    const c = dto.circle!;
    entry = {
      kind: 'circle',
      ...pick(c, ['centreX', 'centreY', 'circleDiameter', 'count', 'startAngleDeg', 'diameter']),
    };
    holes = boltCircleHoles({
      centreXMm: mm(c.centreX),
      centreYMm: mm(c.centreY),
      circleDiameterMm: mm(c.circleDiameter),
      count: c.count,
      startAngleDeg: c.startAngleDeg,
      diameterMm: mm(c.diameter),
    });
    field = () => 'circle';
  }
  const found = patternProblems(widthMm, heightMm, holes, field);
  return found.length
    ? { pattern: null, problems: found }
    : { pattern: { widthMm, heightMm, entry, holes }, problems: [] };
}

function pick<T extends object, K extends keyof T>(o: T, keys: K[]): Pick<T, K> {
  return Object.fromEntries(keys.map((k) => [k, o[k]])) as Pick<T, K>;
}
