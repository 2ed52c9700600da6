import { InputAdornment, MenuItem, Stack, TextField } from '@mui/material';
import type { TargetSetChoice } from '../api/get-target-set-choices';
import { KIND_LABELS, type MachineKind } from '../types';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { toMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';

export interface MachineFormValues {
  name: string;
  kind: MachineKind;
  lengthUnit: LengthUnit;
  x: string;
  y: string;
  notes: string;
  targetSetId: string;
}

export const emptyMachineForm: MachineFormValues = {
  name: '',
  kind: 'plasma',
  lengthUnit: 'mm',
  x: '',
  y: '',
  notes: '',
  targetSetId: '',
};

/** Field problems in words, checked before anything is sent (the server checks again). */
export function machineFormErrors(v: MachineFormValues): Partial<Record<keyof MachineFormValues, string>> {
  const errors: Partial<Record<keyof MachineFormValues, string>> = {};
  if (!v.name.trim()) errors.name = 'Give the machine a name';
  for (const k of ['x', 'y'] as const) {
    const n = Number(v[k]);
    if (v[k].trim() === '' || !Number.isFinite(n)) errors[k] = `A number of ${UNIT_LABELS[v.lengthUnit]}`;
    else if (toMm(n, v.lengthUnit) < 1 || toMm(n, v.lengthUnit) > 100_000) errors[k] = 'Between 1 mm and 100 m';
  }
  return errors;
}

export function toMachineInput(v: MachineFormValues) {
  return {
    name: v.name.trim(),
    kind: v.kind,
    lengthUnit: v.lengthUnit,
    workArea: { x: Number(v.x), y: Number(v.y) },
    notes: v.notes,
    ...(v.targetSetId ? { targetSetId: v.targetSetId } : {}),
  };
}

export function MachineFormFields({
  values,
  onChange,
  targetSets,
  showErrors,
  autoFocus,
}: {
  values: MachineFormValues;
  onChange: (v: MachineFormValues) => void;
  targetSets: TargetSetChoice[];
  showErrors: boolean;
  autoFocus?: boolean;
}) {
  const errors = showErrors ? machineFormErrors(values) : {};
  const set = (patch: Partial<MachineFormValues>) => onChange({ ...values, ...patch });
  const unitSlot = {
    input: { endAdornment: <InputAdornment position="end">{UNIT_LABELS[values.lengthUnit]}</InputAdornment> },
    htmlInput: { inputMode: 'decimal' as const },
  };
  return (
    <Stack spacing={2} sx={{ pt: 1 }}>
      <TextField
        label="Name"
        value={values.name}
        onChange={(e) => set({ name: e.target.value })}
        required
        autoFocus={autoFocus}
        error={!!errors.name}
        helperText={errors.name}
      />
      <TextField select label="Kind" value={values.kind} onChange={(e) => set({ kind: e.target.value as MachineKind })}>
        {(Object.keys(KIND_LABELS) as MachineKind[]).map((k) => (
          <MenuItem key={k} value={k}>
            {KIND_LABELS[k]}
          </MenuItem>
        ))}
      </TextField>
      <UnitFamilySelect
        family="length"
        label="Work area unit"
        value={values.lengthUnit}
        onChange={(lengthUnit) => set({ lengthUnit })}
        units={['mm', 'in']}
      />
      {/* One above the other on a phone: side by side, a label and its unit do not both fit. */}
      <Stack
        direction={{ xs: 'column', sm: 'row' }}
        spacing={{ xs: 2, sm: 1.5 }}
        sx={{ alignItems: { sm: 'flex-start' } }}
      >
        <TextField
          label="Work area X"
          value={values.x}
          onChange={(e) => set({ x: e.target.value })}
          required
          slotProps={unitSlot}
          error={!!errors.x}
          helperText={errors.x ?? 'Width to cover'}
          fullWidth
        />
        <TextField
          label="Work area Y"
          value={values.y}
          onChange={(e) => set({ y: e.target.value })}
          required
          slotProps={unitSlot}
          error={!!errors.y}
          helperText={errors.y ?? 'Length to cover'}
          fullWidth
        />
      </Stack>
      <TextField
        select
        label="Target set"
        value={values.targetSetId}
        onChange={(e) => set({ targetSetId: e.target.value })}
        helperText={
          values.targetSetId
            ? targetSets.find((t) => t.id === values.targetSetId)?.description
            : 'The default set for the kind of machine'
        }
      >
        <MenuItem value="">Default for the kind</MenuItem>
        {targetSets.map((t) => (
          <MenuItem key={t.id} value={t.id}>
            {t.name}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        label="Notes"
        value={values.notes}
        onChange={(e) => set({ notes: e.target.value })}
        multiline
        minRows={3}
      />
    </Stack>
  );
}
