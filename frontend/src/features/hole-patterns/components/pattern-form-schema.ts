import { z } from 'zod';
import { LENGTH_UNITS } from '../../../lib/units';
import { ENTRY_LABELS, REFERENCE_LABELS, type PatternEntry, type PatternReference } from '../types';
import { parseNumber, type PatternDraft } from '../utils/pattern-draft';

const text = z.string();

/**
 * The pattern form as typed (`PatternDraft`: numbers kept as typed, in the pattern's unit). It is
 * complete once it has a name and every number of the outline and of the chosen entry reads as one
 * (`parseNumber`, as `inputOf` builds the request); until then Save stays off and the drawing waits.
 */
export const patternFormSchema: z.ZodType<PatternDraft, PatternDraft> = z
  .object({
    name: text,
    reference: z.enum(Object.keys(REFERENCE_LABELS) as PatternReference[]),
    unit: z.enum(LENGTH_UNITS),
    width: text,
    height: text,
    entry: z.enum(Object.keys(ENTRY_LABELS) as PatternEntry[]),
    holes: z.array(z.object({ x: text, y: text, diameter: text })).min(1),
    grid: z.object({
      originX: text,
      originY: text,
      rows: text,
      columns: text,
      pitchX: text,
      pitchY: text,
      diameter: text,
    }),
    circle: z.object({
      centreX: text,
      centreY: text,
      circleDiameter: text,
      count: text,
      startAngleDeg: text,
      diameter: text,
    }),
    notes: text,
  })
  // Every check in one refinement, so that every field's problem is known at once.
  .superRefine((v, ctx) => {
    const needNumber = (value: string, path: (string | number)[]) => {
      if (parseNumber(value) === null) ctx.addIssue({ code: 'custom', path, message: 'A number' });
    };
    if (!v.name.trim()) ctx.addIssue({ code: 'custom', path: ['name'], message: 'Give the pattern a name' });
    needNumber(v.width, ['width']);
    needNumber(v.height, ['height']);
    if (v.entry === 'list')
      v.holes.forEach((h, i) => {
        for (const [k, value] of Object.entries(h)) needNumber(value, ['holes', i, k]);
      });
    else for (const [k, value] of Object.entries(v[v.entry])) needNumber(value, [v.entry, k]);
  });
