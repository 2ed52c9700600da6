import { Autocomplete, InputAdornment, MenuItem, Stack, TextField } from '@mui/material';
import type { RailInput } from '../api/create-rail';
import type { Rail } from '../types';

export interface RailFormValues {
  label: string;
  axis: string;
  lengthMm: string;
  profileSize: string;
  holePitchMm: string;
  firstHoleMm: string;
  partnerRailId: string;
}

export const emptyRailForm: RailFormValues = { label: '', axis: '', lengthMm: '', profileSize: '20', holePitchMm: '60', firstHoleMm: '20', partnerRailId: '' };

export const railFormOf = (r: Rail): RailFormValues => ({
  label: r.label,
  axis: r.axis,
  lengthMm: String(r.lengthMm),
  profileSize: r.profileSize ? String(r.profileSize) : '',
  holePitchMm: String(r.holePitchMm),
  firstHoleMm: String(r.firstHoleMm),
  partnerRailId: r.partnerRailId ?? '',
});

const num = (s: string) => (s.trim() === '' ? NaN : Number(s));

export function railFormErrors(v: RailFormValues): Partial<Record<keyof RailFormValues, string>> {
  const e: Partial<Record<keyof RailFormValues, string>> = {};
  if (!v.label.trim()) e.label = 'Give the rail a label, e.g. "Y1 (left)"';
  if (!/^[A-Za-z][A-Za-z0-9]{0,5}$/.test(v.axis.trim())) e.axis = 'A short axis name: X, Y1, Y2, Z…';
  const length = num(v.lengthMm);
  if (!(length >= 10 && length <= 20000)) e.lengthMm = 'Between 10 and 20 000 mm';
  const pitch = num(v.holePitchMm);
  if (!(pitch >= 5 && pitch <= 1000)) e.holePitchMm = 'Between 5 and 1000 mm';
  const first = num(v.firstHoleMm);
  if (!(first >= 0)) e.firstHoleMm = 'A number of mm, 0 or more';
  else if (length >= 10 && first > length) e.firstHoleMm = 'Must lie on the rail (not beyond its length)';
  return e;
}

export function toRailInput(v: RailFormValues): RailInput {
  return {
    label: v.label.trim(),
    axis: v.axis.trim(),
    lengthMm: Number(v.lengthMm),
    ...(v.profileSize ? { profileSize: Number(v.profileSize) } : {}),
    holePitchMm: Number(v.holePitchMm),
    firstHoleMm: Number(v.firstHoleMm),
    partnerRailId: v.partnerRailId || null,
  };
}

const mm = { input: { endAdornment: <InputAdornment position="end">mm</InputAdornment> }, htmlInput: { inputMode: 'decimal' as const } };

export function RailFormFields({ values, onChange, others, showErrors }: { values: RailFormValues; onChange: (v: RailFormValues) => void; others: Rail[]; showErrors: boolean }) {
  const errors = showErrors ? railFormErrors(values) : {};
  const set = (p: Partial<RailFormValues>) => onChange({ ...values, ...p });
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
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
        <TextField label="Length" value={values.lengthMm} onChange={(e) => set({ lengthMm: e.target.value })} required slotProps={mm} error={!!errors.lengthMm} helperText={errors.lengthMm} fullWidth />
        <TextField select label="Profile size" value={values.profileSize} onChange={(e) => set({ profileSize: e.target.value })} fullWidth helperText="Rail width class">
          <MenuItem value="">Not given</MenuItem>
          {['12', '15', '20', '25', '30', '35'].map((s) => (
            <MenuItem key={s} value={s}>
              {s} mm
            </MenuItem>
          ))}
        </TextField>
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
        <TextField label="Hole pitch" value={values.holePitchMm} onChange={(e) => set({ holePitchMm: e.target.value })} required slotProps={mm} error={!!errors.holePitchMm} helperText={errors.holePitchMm ?? 'Centre to centre'} fullWidth />
        <TextField label="First hole" value={values.firstHoleMm} onChange={(e) => set({ firstHoleMm: e.target.value })} required slotProps={mm} error={!!errors.firstHoleMm} helperText={errors.firstHoleMm ?? "From the rail's start to the first hole centre"} fullWidth />
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
