import { z } from 'zod';
import { typedNumber } from '../../../lib/form-number';
import { LENGTH_UNITS, toMm, UNIT_LABELS } from '../../../lib/units';
import type { CreateMachineInput } from '../api/create-machine';
import { KIND_LABELS, type Machine, type MachineKind } from '../types';

/**
 * The machine's specification as typed (the work area in `lengthUnit`) and its checks before
 * anything is sent (the server checks again). Each message is shown under its field.
 */
export const machineFormSchema = z
  .object({
    name: z.string(),
    kind: z.enum(Object.keys(KIND_LABELS) as MachineKind[]),
    lengthUnit: z.enum(LENGTH_UNITS),
    x: z.string(),
    y: z.string(),
    notes: z.string(),
    targetSetId: z.string(),
  })
  // Every check in one refinement, so that every field's problem shows at once.
  .superRefine((v, ctx) => {
    const fail = (path: keyof typeof v, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
    if (!v.name.trim()) fail('name', 'Give the machine a name');
    for (const k of ['x', 'y'] as const) {
      const n = typedNumber(v[k]);
      if (!Number.isFinite(n)) fail(k, `A number of ${UNIT_LABELS[v.lengthUnit]}`);
      else if (toMm(n, v.lengthUnit) < 1 || toMm(n, v.lengthUnit) > 100_000) fail(k, 'Between 1 mm and 100 m');
    }
  });

export type MachineFormValues = z.input<typeof machineFormSchema>;

export const emptyMachineForm: MachineFormValues = {
  name: '',
  kind: 'plasma',
  lengthUnit: 'mm',
  x: '',
  y: '',
  notes: '',
  targetSetId: '',
};

export const machineFormOf = (m: Machine): MachineFormValues => ({
  name: m.name,
  kind: m.kind,
  lengthUnit: m.lengthUnit,
  x: String(m.workAreaInLengthUnit.x),
  y: String(m.workAreaInLengthUnit.y),
  notes: m.notes,
  targetSetId: m.targetSet.id,
});

export function toMachineInput(v: MachineFormValues): CreateMachineInput {
  return {
    name: v.name.trim(),
    kind: v.kind,
    lengthUnit: v.lengthUnit,
    workArea: { x: typedNumber(v.x), y: typedNumber(v.y) },
    notes: v.notes,
    ...(v.targetSetId ? { targetSetId: v.targetSetId } : {}),
  };
}
