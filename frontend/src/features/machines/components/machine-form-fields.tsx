import { InputAdornment, MenuItem, Stack } from '@mui/material';
import { Controller, type UseFormReturn } from 'react-hook-form';
import type { TargetSetChoice } from '../api/get-target-set-choices';
import { KIND_LABELS, type MachineKind } from '../types';
import { FormTextField } from '../../../components/form/form-text-field';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { UNIT_LABELS } from '../../../lib/units';
import type { MachineFormValues } from './machine-form-schema';

/** The machine's fields, each with its error under it once the form has been sent (react-hook-form with the zod schema). */
export function MachineFormFields({
  form,
  targetSets,
  autoFocus,
}: {
  form: UseFormReturn<MachineFormValues>;
  targetSets: TargetSetChoice[];
  autoFocus?: boolean;
}) {
  const { control, formState, trigger, watch } = form;
  const unitSlot = {
    input: { endAdornment: <InputAdornment position="end">{UNIT_LABELS[watch('lengthUnit')]}</InputAdornment> },
    htmlInput: { inputMode: 'decimal' as const },
  };
  const targetSetId = watch('targetSetId');
  return (
    <Stack spacing={2} sx={{ pt: 1 }}>
      <FormTextField form={form} name="name" label="Name" required autoFocus={autoFocus} />
      <FormTextField form={form} name="kind" select label="Kind">
        {(Object.keys(KIND_LABELS) as MachineKind[]).map((k) => (
          <MenuItem key={k} value={k}>
            {KIND_LABELS[k]}
          </MenuItem>
        ))}
      </FormTextField>
      <Controller
        name="lengthUnit"
        control={control}
        render={({ field }) => (
          <UnitFamilySelect
            family="length"
            label="Work area unit"
            value={field.value}
            onChange={(unit) => {
              field.onChange(unit);
              // The work area's checks are in mm: once sent, a new unit checks them again.
              if (formState.isSubmitted) void trigger();
            }}
            units={['mm', 'in']}
          />
        )}
      />
      {/* One above the other on a phone: side by side, a label and its unit do not both fit. */}
      <Stack
        direction={{ xs: 'column', sm: 'row' }}
        spacing={{ xs: 2, sm: 1.5 }}
        sx={{ alignItems: { sm: 'flex-start' } }}
      >
        <FormTextField
          form={form}
          name="x"
          label="Work area X"
          required
          slotProps={unitSlot}
          helperText="Width to cover"
          fullWidth
        />
        <FormTextField
          form={form}
          name="y"
          label="Work area Y"
          required
          slotProps={unitSlot}
          helperText="Length to cover"
          fullWidth
        />
      </Stack>
      <FormTextField
        form={form}
        name="targetSetId"
        select
        label="Target set"
        helperText={
          targetSetId
            ? targetSets.find((t) => t.id === targetSetId)?.description
            : 'The default set for the kind of machine'
        }
      >
        <MenuItem value="">Default for the kind</MenuItem>
        {targetSets.map((t) => (
          <MenuItem key={t.id} value={t.id}>
            {t.name}
          </MenuItem>
        ))}
      </FormTextField>
      <FormTextField form={form} name="notes" label="Notes" multiline minRows={3} />
    </Stack>
  );
}
