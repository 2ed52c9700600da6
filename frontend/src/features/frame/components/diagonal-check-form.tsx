import { Alert, Box, Button, Stack } from '@mui/material';
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { UNIT_LABELS } from '../../../lib/units';
import { useCreateDiagonalCheck } from '../api/create-diagonal-check';
import { WaitingEntries } from '../../../components/offline/waiting-entries';
import type { DiagonalCheck } from '../types';
import { FormNumberField } from './form-number-field';
import { FormTextField } from '../../../components/form/form-text-field';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import {
  DIAGONAL_FIELDS,
  diagonalCheckFormSchema,
  emptyDiagonalCheckForm,
  toDiagonalCheckInput,
  type DiagonalCheckFormValues,
} from './diagonal-check-form-schema';

/** The four lengths of the marked rectangle, and the span over which one gantry end is moved. */
export function DiagonalCheckForm({ machineId, onSaved }: { machineId: string; onSaved: (c: DiagonalCheck) => void }) {
  const form = useForm<DiagonalCheckFormValues>({
    defaultValues: emptyDiagonalCheckForm,
    resolver: zodResolver(diagonalCheckFormSchema),
  });
  const create = useCreateDiagonalCheck(machineId);
  const u = UNIT_LABELS[useWatch({ control: form.control, name: 'lengthUnit' })];

  const submit = form.handleSubmit((values) =>
    create.record(toDiagonalCheckInput(values), {
      onRecorded: onSaved,
      // Waiting for the connection: the lengths go with it (shown as waiting); the span and resolution stay for the next check.
      onQueued: () => form.reset({ ...form.getValues(), sideX: '', sideY: '', diagonal1: '', diagonal2: '', note: '' }),
    }),
  );

  return (
    <Box component="form" onSubmit={submit} noValidate aria-label="Diagonal check">
      <Stack spacing={1.5}>
        {create.error && <Alert severity="error">{(create.error as Error).message}</Alert>}
        <WaitingEntries path={`/machines/${machineId}/diagonal-checks`} />
        <Box sx={{ display: 'grid', gap: 1.5, gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' } }}>
          <Controller
            name="lengthUnit"
            control={form.control}
            render={({ field }) => <UnitFamilySelect family="length" value={field.value} onChange={field.onChange} />}
          />
          <FormNumberField
            form={form}
            name="gantrySpan"
            label="Gantry span"
            unit={u}
            helperText="Between the two drives; the X side when empty"
          />
          {DIAGONAL_FIELDS.map(([key, label, help]) => (
            <FormNumberField key={key} form={form} name={key} label={label} unit={u} helperText={help} required />
          ))}
          <FormNumberField
            form={form}
            name="resolution"
            label="Read to"
            unit={u}
            helperText="Smallest step of the tape or rule (a tape: about 1/32 in)"
          />
        </Box>
        <FormTextField form={form} name="note" label="Note" placeholder="How the rectangle was marked and read" />
        <Box>
          <Button type="submit" variant="contained" disabled={create.busy}>
            {create.busy ? 'Working it out…' : 'Record diagonal check'}
          </Button>
        </Box>
      </Stack>
    </Box>
  );
}
