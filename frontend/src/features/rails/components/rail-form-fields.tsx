import { Autocomplete, InputAdornment, MenuItem, Stack, TextField } from '@mui/material';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { toMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import type { RailInput } from '../api/create-rail';
import type { Rail } from '../types';

/** The rail form as typed: every length in `lengthUnit`. */
export interface RailFormValues {
  label: string;
  axis: string;
  lengthUnit: LengthUnit;
  length: string;
  profileSize: string;
  holePitch: string;
  firstHole: string;
  spacing: string;
  endDistance: string;
  partnerRailId: string;
}

export const emptyRailForm: RailFormValues = { label: '', axis: '', lengthUnit: 'mm', length: '', profileSize: '20', holePitch: '60', firstHole: '20', spacing: '', endDistance: '', partnerRailId: '' };

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

const num = (s: string) => (s.trim() === '' ? NaN : Number(s));

/** Quick checks in mm before the server's own (which names the same fields). */
export function railFormErrors(v: RailFormValues): Partial<Record<keyof RailFormValues, string>> {
  const e: Partial<Record<keyof RailFormValues, string>> = {};
  const u = v.lengthUnit;
  const inMm = (s: string) => toMm(num(s), u);
  if (!v.label.trim()) e.label = 'Give the rail a label, e.g. "Y1 (left)"';
  if (!/^[A-Za-z][A-Za-z0-9]{0,5}$/.test(v.axis.trim())) e.axis = 'A short axis name: X, Y1, Y2, Z…';
  const length = inMm(v.length);
  if (!(length >= 10 && length <= 20000)) e.length = 'Between 10 and 20 000 mm';
  const pitch = inMm(v.holePitch);
  if (!(pitch >= 5 && pitch <= 1000)) e.holePitch = 'Between 5 and 1000 mm';
  const first = inMm(v.firstHole);
  if (!(first >= 0)) e.firstHole = `A number of ${UNIT_LABELS[u]}, 0 or more`;
  else if (length >= 10 && first > length) e.firstHole = 'Must lie on the rail (not beyond its length)';
  if (v.spacing.trim() && !(inMm(v.spacing) >= 10)) e.spacing = 'At least 10 mm, or leave empty';
  if (v.endDistance.trim() && !(inMm(v.endDistance) >= 0)) e.endDistance = `A number of ${UNIT_LABELS[u]}, or leave empty`;
  return e;
}

export function toRailInput(v: RailFormValues): RailInput {
  return {
    label: v.label.trim(),
    axis: v.axis.trim(),
    lengthUnit: v.lengthUnit,
    length: Number(v.length),
    ...(v.profileSize ? { profileSize: Number(v.profileSize) } : {}),
    holePitch: Number(v.holePitch),
    firstHole: Number(v.firstHole),
    spacing: v.spacing.trim() ? Number(v.spacing) : null,
    endDistance: v.endDistance.trim() ? Number(v.endDistance) : null,
    partnerRailId: v.partnerRailId || null,
  };
}

export function RailFormFields({ values, onChange, others, showErrors }: { values: RailFormValues; onChange: (v: RailFormValues) => void; others: Rail[]; showErrors: boolean }) {
  const errors = showErrors ? railFormErrors(values) : {};
  const set = (p: Partial<RailFormValues>) => onChange({ ...values, ...p });
  const unit = { input: { endAdornment: <InputAdornment position="end">{UNIT_LABELS[values.lengthUnit]}</InputAdornment> }, htmlInput: { inputMode: 'decimal' as const } };
  return (
    <Stack spacing={2} sx={{ pt: 1 }}>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
        <TextField label="Label" value={values.label} onChange={(e) => set({ label: e.target.value })} required autoFocus error={!!errors.label} helperText={errors.label ?? 'How the rail is known, e.g. Y1 (left)'} fullWidth />
        <Autocomplete
          freeSolo
          options={['X', 'Y', 'Y1', 'Y2', 'Z']}
          inputValue={values.axis}
          onInputChange={(_, axis) => set({ axis })}
          renderInput={(p) => <TextField {...p} label="Axis" required error={!!errors.axis} helperText={errors.axis ?? 'X, Y1, Y2, Z…'} />}
          sx={{ minWidth: 160 }}
        />
      </Stack>
      <UnitFamilySelect family="length" value={values.lengthUnit} onChange={(lengthUnit) => set({ lengthUnit })} label="Unit of the rail's dimensions" />
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
        <TextField label="Length" value={values.length} onChange={(e) => set({ length: e.target.value })} required slotProps={unit} error={!!errors.length} helperText={errors.length} fullWidth />
        <TextField select label="Profile size" value={values.profileSize} onChange={(e) => set({ profileSize: e.target.value })} fullWidth helperText="Rail width class (catalogue size in mm)">
          <MenuItem value="">Not given</MenuItem>
          {['12', '15', '20', '25', '30', '35'].map((s) => (
            <MenuItem key={s} value={s}>
              {s} mm
            </MenuItem>
          ))}
        </TextField>
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
        <TextField label="Hole pitch" value={values.holePitch} onChange={(e) => set({ holePitch: e.target.value })} required slotProps={unit} error={!!errors.holePitch} helperText={errors.holePitch ?? 'Centre to centre'} fullWidth />
        <TextField label="First hole" value={values.firstHole} onChange={(e) => set({ firstHole: e.target.value })} required slotProps={unit} error={!!errors.firstHole} helperText={errors.firstHole ?? "From the rail's start to the first hole centre"} fullWidth />
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
        <TextField label="Spacing to partner" value={values.spacing} onChange={(e) => set({ spacing: e.target.value })} slotProps={unit} error={!!errors.spacing} helperText={errors.spacing ?? 'Centre to centre of the two rails: a in S = a × K'} fullWidth />
        <TextField label="End distance" value={values.endDistance} onChange={(e) => set({ endDistance: e.target.value })} slotProps={unit} error={!!errors.endDistance} helperText={errors.endDistance ?? 'Least hole centre to rail end; empty: half the bolt head'} fullWidth />
      </Stack>
      <TextField select label="Partner rail" value={values.partnerRailId} onChange={(e) => set({ partnerRailId: e.target.value })} helperText="The rail this one runs parallel to (Y1 with Y2, the two X rails)">
        <MenuItem value="">None</MenuItem>
        {others.map((r) => (
          <MenuItem key={r.id} value={r.id}>
            {r.label} ({r.axis})
          </MenuItem>
        ))}
      </TextField>
    </Stack>
  );
}
