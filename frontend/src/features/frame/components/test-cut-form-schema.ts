import { z } from 'zod';
import { typedNumber, typedOptionalNumber } from '../../../lib/form-number';
import { LENGTH_UNITS } from '../../../lib/units';
import type { TestCutInput } from '../api/create-test-cut';

/** The sizes the part was programmed to, with the label each one's message names. */
export const NOMINAL_FIELDS = [
  ['nx', 'Programmed X'],
  ['ny', 'Programmed Y'],
  ['nc', 'Circle ⌀'],
] as const;
/** The sizes measured on the cut part. */
export const MEASURED_FIELDS = [
  ['mx', 'Measured X'],
  ['my', 'Measured Y'],
  ['d1', 'Diagonal 1'],
  ['d2', 'Diagonal 2'],
  ['cx', 'Circle ⌀ along X'],
  ['cy', 'Circle ⌀ along Y'],
] as const;
/** The optional numbers: their label and whether zero is a value (a kerf of 0: compensation was exact). */
const OPTIONAL_FIELDS = [
  ['kerf', 'Kerf', true],
  ['sx', 'Steps per mm X', false],
  ['sy', 'Steps per mm Y', false],
  ['plate', 'Plate thickness', false],
  ['res', 'Resolution', false],
] as const;

/** The test cut as typed, every size in `lengthUnit`; each message is shown under its field. */
export const testCutFormSchema = z
  .object({
    lengthUnit: z.enum(LENGTH_UNITS),
    circleKind: z.enum(['hole', 'disc']),
    nx: z.string(),
    ny: z.string(),
    nc: z.string(),
    mx: z.string(),
    my: z.string(),
    d1: z.string(),
    d2: z.string(),
    cx: z.string(),
    cy: z.string(),
    plate: z.string(),
    res: z.string(),
    kerf: z.string(),
    sx: z.string(),
    sy: z.string(),
    note: z.string(),
  })
  // Every check in one refinement, so that every field's problem shows at once.
  .superRefine((v, ctx) => {
    const fail = (path: keyof typeof v, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
    for (const [key, label] of [...NOMINAL_FIELDS, ...MEASURED_FIELDS])
      if (!(typedNumber(v[key]) > 0)) fail(key, `${label} must be a length greater than zero`);
    for (const [key, label, allowZero] of OPTIONAL_FIELDS) {
      if (!v[key].trim()) continue;
      const x = typedNumber(v[key]);
      if (!(allowZero ? x >= 0 : x > 0))
        fail(key, `${label} must be ${allowZero ? 'zero or more' : 'greater than zero'}, or left empty`);
    }
  });

export type TestCutFormValues = z.input<typeof testCutFormSchema>;

export const emptyTestCutForm: TestCutFormValues = {
  lengthUnit: 'mm',
  circleKind: 'hole',
  nx: '',
  ny: '',
  nc: '',
  mx: '',
  my: '',
  d1: '',
  d2: '',
  cx: '',
  cy: '',
  plate: '',
  res: '',
  kerf: '',
  sx: '',
  sy: '',
  note: '',
};

export function toTestCutInput(v: TestCutFormValues): TestCutInput {
  const n = typedNumber;
  const optional = (text: string) => typedOptionalNumber(text) ?? undefined;
  const sx = optional(v.sx);
  const sy = optional(v.sy);
  return {
    lengthUnit: v.lengthUnit,
    plateThickness: optional(v.plate),
    resolution: optional(v.res),
    nominal: { x: n(v.nx), y: n(v.ny), circle: n(v.nc) },
    measured: {
      x: n(v.mx),
      y: n(v.my),
      diagonal1: n(v.d1),
      diagonal2: n(v.d2),
      circleX: n(v.cx),
      circleY: n(v.cy),
      kerf: optional(v.kerf),
    },
    circleKind: v.circleKind,
    stepsPerMm: sx || sy ? { x: sx, y: sy } : undefined,
    note: v.note.trim() || undefined,
  };
}
