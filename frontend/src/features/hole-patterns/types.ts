import type { Schemas } from '../../lib/api/schemas';

export type HolePattern = Schemas['HolePatternResponse'];
export type PatternReference = HolePattern['reference'];
/** The length unit of the outline and every coordinate (the length family). */
export type PatternUnit = HolePattern['lengthUnit'];
export type PatternEntry = HolePattern['entry'];
export type Paper = 'a4' | 'letter';
export type HoleEntry = NonNullable<HolePattern['holesEntered']>[number];
export type GridEntry = NonNullable<HolePattern['grid']>;
export type CircleEntry = NonNullable<HolePattern['circle']>;
export type HoleMm = Schemas['StoredHole'];
export type PatternPreview = Schemas['PatternPreviewResponse'];

/** A pattern as sent (to save or preview): the outline and every coordinate in lengthUnit. */
export type PatternInput = Schemas['HolePatternDto'];

/** A rail as the templates tab needs it: the server derives its holes. */
export type RailForTemplate = Pick<Schemas['RailResponse'], 'id' | 'label' | 'axis' | 'lengthMm' | 'holes'>;

export const REFERENCE_LABELS: Record<PatternReference, string> = {
  'bottom-left': 'Lower-left corner',
  'bottom-right': 'Lower-right corner',
  'top-left': 'Upper-left corner',
  'top-right': 'Upper-right corner',
  left: 'Left edge',
  right: 'Right edge',
  bottom: 'Lower edge',
  top: 'Upper edge',
};

export const ENTRY_LABELS: Record<PatternEntry, string> = {
  list: 'List of holes',
  grid: 'Grid',
  circle: 'Bolt circle',
};

export const holePatternKeys = {
  all: ['hole-patterns'] as const,
  list: (machineId: string) => ['hole-patterns', 'list', machineId] as const,
  one: (id: string) => ['hole-patterns', 'one', id] as const,
  rails: (machineId: string) => ['hole-patterns', 'rails', machineId] as const,
  preview: (input: PatternInput | null) => ['hole-patterns', 'preview', input] as const,
};
