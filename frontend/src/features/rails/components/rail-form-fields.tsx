import { Autocomplete, InputAdornment, MenuItem, Stack, TextField } from '@mui/material';
import { FormTextField } from '../../../components/form/form-text-field';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { Controller, type UseFormReturn } from 'react-hook-form';
import { UNIT_LABELS } from '../../../lib/units';
import type { Rail } from '../types';
import type { RailFormValues } from './rail-form-schema';

type TextName = Exclude<keyof RailFormValues, 'lengthUnit' | 'axis' | 'profileSize' | 'partnerRailId'>;

/** The rail's fields, each with its error under it once the form has been sent (react-hook-form with the zod schema). */
export function RailFormFields({ form, others }: { form: UseFormReturn<RailFormValues>; others: Rail[] }) {
  const { control, formState, watch, trigger } = form;
  const errors = formState.errors;
  // Once the form has been sent, every change checks the whole form again: the checks run across
  // fields (the first hole against the length, every length against the unit).
  const recheck = () => {
    if (formState.isSubmitted) void trigger();
  };
  const change = (onChange: (value: string) => void) => (value: string) => {
    onChange(value);
    recheck();
  };
  const unitLabel = UNIT_LABELS[watch('lengthUnit')];
  const unit = {
    input: { endAdornment: <InputAdornment position="end">{unitLabel}</InputAdornment> },
    htmlInput: { inputMode: 'decimal' as const },
  };
  const text = (
    name: TextName,
    label: string,
    hint: string | undefined,
    extra: { required?: boolean; autoFocus?: boolean; withUnit?: boolean } = {},
  ) => (
    <FormTextField
      form={form}
      name={name}
      label={label}
      helperText={hint}
      required={extra.required}
      autoFocus={extra.autoFocus}
      slotProps={extra.withUnit ? unit : undefined}
      fullWidth
    />
  );
  return (
    <Stack spacing={2} sx={{ pt: 1 }}>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
        {text('label', 'Label', 'How the rail is known, e.g. Y1 (left)', { required: true, autoFocus: true })}
        <Controller
          name="axis"
          control={control}
          render={({ field }) => (
            <Autocomplete
              freeSolo
              options={['X', 'Y', 'Y1', 'Y2', 'Z']}
              inputValue={field.value}
              onInputChange={(_, axis) => change(field.onChange)(axis)}
              renderInput={(p) => (
                <TextField
                  {...p}
                  label="Axis"
                  required
                  error={!!errors.axis}
                  helperText={errors.axis?.message ?? 'X, Y1, Y2, Z…'}
                />
              )}
              sx={{ minWidth: 160 }}
            />
          )}
        />
      </Stack>
      <Controller
        name="lengthUnit"
        control={control}
        render={({ field }) => (
          <UnitFamilySelect
            family="length"
            value={field.value}
            onChange={change(field.onChange)}
            label="Unit of the rail's dimensions"
          />
        )}
      />
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
        {text('length', 'Length', undefined, { required: true, withUnit: true })}
        <FormTextField
          form={form}
          name="profileSize"
          select
          label="Profile size"
          fullWidth
          helperText="Rail width class (catalogue size in mm)"
        >
          <MenuItem value="">Not given</MenuItem>
          {['12', '15', '20', '25', '30', '35'].map((s) => (
            <MenuItem key={s} value={s}>
              {s} mm
            </MenuItem>
          ))}
        </FormTextField>
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
        {text('holePitch', 'Hole pitch', 'Centre to centre', { required: true, withUnit: true })}
        {text('firstHole', 'First hole', "From the rail's start to the first hole centre", {
          required: true,
          withUnit: true,
        })}
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
        {text('spacing', 'Spacing to partner', 'Centre to centre of the two rails: a in S = a × K', { withUnit: true })}
        {text('endDistance', 'End distance', 'Least hole centre to rail end; empty: half the bolt head', {
          withUnit: true,
        })}
      </Stack>
      <FormTextField
        form={form}
        name="partnerRailId"
        select
        label="Partner rail"
        helperText="The rail this one runs parallel to (Y1 with Y2, the two X rails)"
      >
        <MenuItem value="">None</MenuItem>
        {others.map((r) => (
          <MenuItem key={r.id} value={r.id}>
            {r.label} ({r.axis})
          </MenuItem>
        ))}
      </FormTextField>
    </Stack>
  );
}
