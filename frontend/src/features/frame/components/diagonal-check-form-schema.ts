import { z } from 'zod';
import { typedNumber, typedOptionalNumber } from '../../../lib/form-number';
import { LENGTH_UNITS } from '../../../lib/units';
import type { DiagonalCheckInput } from '../api/create-diagonal-check';

/** The four lengths of the marked rectangle, with the label each one's message names. */
export const DIAGONAL_FIELDS = [
  ['sideX', 'X side', undefined],
  ['sideY', 'Y side', undefined],
  ['diagonal1', 'Diagonal 1', 'X0 Y0 corner to the far corner'],
  ['diagonal2', 'Diagonal 2', 'X-far Y0 corner to X0 Y-far corner'],
] as const;

/** The diagonal check as typed, every length in `lengthUnit`; each message is shown under its field. */
export const diagonalCheckFormSchema = z
  .object({
    lengthUnit: z.enum(LENGTH_UNITS),
    sideX: z.string(),
    sideY: z.string(),
    diagonal1: z.string(),
    diagonal2: z.string(),
    gantrySpan: z.string(),
    resolution: z.string(),
    note: z.string(),
  })
  // Every check in one refinement, so that every field's problem shows at once.
  .superRefine((v, ctx) => {
    const fail = (path: keyof typeof v, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
    for (const [key, label] of DIAGONAL_FIELDS)
      if (!(typedNumber(v[key]) > 0)) fail(key, `${label} must be a length greater than zero`);
    if (v.gantrySpan.trim() && !(typedNumber(v.gantrySpan) > 0))
      fail('gantrySpan', 'Gantry span must be greater than zero, or left empty');
    if (v.resolution.trim() && !(typedNumber(v.resolution) > 0))
      fail('resolution', 'Resolution must be greater than zero, or left empty');
  });

export type DiagonalCheckFormValues = z.input<typeof diagonalCheckFormSchema>;

export const emptyDiagonalCheckForm: DiagonalCheckFormValues = {
  lengthUnit: 'mm',
  sideX: '',
  sideY: '',
  diagonal1: '',
  diagonal2: '',
  gantrySpan: '',
  resolution: '',
  note: '',
};

export function toDiagonalCheckInput(v: DiagonalCheckFormValues): DiagonalCheckInput {
  return {
    sideX: typedNumber(v.sideX),
    sideY: typedNumber(v.sideY),
    diagonal1: typedNumber(v.diagonal1),
    diagonal2: typedNumber(v.diagonal2),
    gantrySpan: typedOptionalNumber(v.gantrySpan) ?? undefined,
    resolution: typedOptionalNumber(v.resolution) ?? undefined,
    lengthUnit: v.lengthUnit,
    note: v.note.trim() || undefined,
  };
}
