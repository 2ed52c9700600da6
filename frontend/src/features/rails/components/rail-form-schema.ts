import { z } from 'zod';
import { typedNumber as num } from '../../../lib/form-number';
import { LENGTH_UNITS, toMm, UNIT_LABELS } from '../../../lib/units';
import type { RailInput } from '../api/create-rail';
import type { Rail } from '../types';

/**
 * The rail form as typed (every length in `lengthUnit`) and its quick checks in mm, before the
 * server's own (which names the same fields). Each message is shown under its field.
 */
export const railFormSchema = z
  .object({
    label: z.string(),
    axis: z.string(),
    lengthUnit: z.enum(LENGTH_UNITS),
    length: z.string(),
    profileSize: z.string(),
    holePitch: z.string(),
    firstHole: z.string(),
    spacing: z.string(),
    endDistance: z.string(),
    partnerRailId: z.string(),
  })
  // Every check in one refinement, so that every field's problem shows at once.
  .superRefine((v, ctx) => {
    const u = v.lengthUnit;
    const inMm = (s: string) => toMm(num(s), u);
    const fail = (path: keyof typeof v, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
    if (!v.label.trim()) fail('label', 'Give the rail a label, e.g. "Y1 (left)"');
    if (!/^[A-Za-z][A-Za-z0-9]{0,5}$/.test(v.axis.trim())) fail('axis', 'A short axis name: X, Y1, Y2, Z…');
    const length = inMm(v.length);
    if (!(length >= 10 && length <= 20000)) fail('length', 'Between 10 and 20 000 mm');
    const pitch = inMm(v.holePitch);
    if (!(pitch >= 5 && pitch <= 1000)) fail('holePitch', 'Between 5 and 1000 mm');
    const first = inMm(v.firstHole);
    if (!(first >= 0)) fail('firstHole', `A number of ${UNIT_LABELS[u]}, 0 or more`);
    else if (length >= 10 && first > length) fail('firstHole', 'Must lie on the rail (not beyond its length)');
    if (v.spacing.trim() && !(inMm(v.spacing) >= 10)) fail('spacing', 'At least 10 mm, or leave empty');
    if (v.endDistance.trim() && !(inMm(v.endDistance) >= 0))
      fail('endDistance', `A number of ${UNIT_LABELS[u]}, or leave empty`);
  });

export type RailFormValues = z.input<typeof railFormSchema>;

export const emptyRailForm: RailFormValues = {
  label: '',
  axis: '',
  lengthUnit: 'mm',
  length: '',
  profileSize: '20',
  holePitch: '60',
  firstHole: '20',
  spacing: '',
  endDistance: '',
  partnerRailId: '',
};

export const railFormOf = (r: Rail): RailFormValues => ({
  label: r.label,
  axis: r.axis,
  lengthUnit: r.lengthUnit,
  length: String(r.length),
  profileSize: r.profileSize ? String(r.profileSize) : '',
  holePitch: String(r.holePitch),
  firstHole: String(r.firstHole),
  spacing: r.spacing === null ? '' : String(r.spacing),
  endDistance: r.endDistanceIsDefault ? '' : String(r.endDistance),
  partnerRailId: r.partnerRailId ?? '',
});

export function toRailInput(v: RailFormValues): RailInput {
  return {
    label: v.label.trim(),
    axis: v.axis.trim(),
    lengthUnit: v.lengthUnit,
    length: num(v.length),
    ...(v.profileSize ? { profileSize: Number(v.profileSize) } : {}),
    holePitch: num(v.holePitch),
    firstHole: num(v.firstHole),
    spacing: v.spacing.trim() ? num(v.spacing) : null,
    endDistance: v.endDistance.trim() ? num(v.endDistance) : null,
    partnerRailId: v.partnerRailId || null,
  };
}
