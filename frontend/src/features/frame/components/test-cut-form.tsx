import { Alert, Box, Button, MenuItem, Stack, Typography } from '@mui/material';
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { UNIT_LABELS } from '../../../lib/units';
import { useCreateTestCut } from '../api/create-test-cut';
import { WaitingEntries } from '../../../components/offline/waiting-entries';
import type { TestCut } from '../types';
import { FormNumberField } from './form-number-field';
import { FormTextField } from '../../../components/form/form-text-field';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import {
  emptyTestCutForm,
  MEASURED_FIELDS,
  NOMINAL_FIELDS,
  testCutFormSchema,
  toTestCutInput,
  type TestCutFormValues,
} from './test-cut-form-schema';

type SizeKey = (typeof NOMINAL_FIELDS)[number][0] | (typeof MEASURED_FIELDS)[number][0];

/** Commanded and measured sizes of the acceptance cut: a large square with a circle. */
export function TestCutForm({
  machineId,
  machineKind,
  onSaved,
}: {
  machineId: string;
  machineKind: string;
  onSaved: (c: TestCut) => void;
}) {
  const form = useForm<TestCutFormValues>({
    defaultValues: emptyTestCutForm,
    resolver: zodResolver(testCutFormSchema),
  });
  const create = useCreateTestCut(machineId);
  const u = UNIT_LABELS[useWatch({ control: form.control, name: 'lengthUnit' })];

  const submit = form.handleSubmit((values) =>
    create.record(
      toTestCutInput(values),
      // Waiting for the connection: the sizes measured go with it (shown as waiting); the nominal ones stay for the next cut.
      {
        onRecorded: onSaved,
        onQueued: () => form.reset({ ...form.getValues(), mx: '', my: '', d1: '', d2: '', cx: '', cy: '', kerf: '' }),
      },
    ),
  );

  const field = ([k, label]: readonly [SizeKey, string]) => (
    <FormNumberField key={k} form={form} name={k} label={label} unit={u} required />
  );
  const grid = { display: 'grid', gap: 1.5, gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' } };
  return (
    <Box component="form" onSubmit={submit} noValidate aria-label="Test cut">
      <Stack spacing={1.5}>
        {create.error && <Alert severity="error">{(create.error as Error).message}</Alert>}
        <WaitingEntries path={`/machines/${machineId}/test-cuts`} />
        <Box sx={grid}>
          <Controller
            name="lengthUnit"
            control={form.control}
            render={({ field }) => <UnitFamilySelect family="length" value={field.value} onChange={field.onChange} />}
          />
          <FormTextField form={form} name="circleKind" select label="The circle is">
            <MenuItem value="hole">a hole in the square</MenuItem>
            <MenuItem value="disc">a disc cut on its own</MenuItem>
          </FormTextField>
        </Box>
        <Typography variant="h5" component="h4">
          As programmed
        </Typography>
        <Box sx={grid}>{NOMINAL_FIELDS.map(field)}</Box>
        <Typography variant="h5" component="h4">
          As measured
        </Typography>
        <Box sx={grid}>
          {MEASURED_FIELDS.map(field)}
          <FormNumberField
            form={form}
            name="plate"
            label="Plate thickness"
            unit={u}
            helperText={
              machineKind === 'plasma'
                ? 'With each part size it picks the ISO 9013 tolerance band'
                : 'Material thickness, for the record'
            }
          />
          <FormNumberField
            form={form}
            name="res"
            label="Read to"
            unit={u}
            helperText="Smallest step of the caliper or rule"
          />
          <FormNumberField
            form={form}
            name="kerf"
            label="Kerf"
            unit={u}
            helperText="Width the controller did not compensate; empty when compensation was on"
          />
        </Box>
        <Typography variant="h5" component="h4">
          Steps per mm when cut (optional)
        </Typography>
        <Box sx={grid}>
          <FormNumberField
            form={form}
            name="sx"
            label="Steps/mm X"
            unit="steps/mm"
            slotProps={{ inputLabel: { shrink: true } }}
          />
          <FormNumberField
            form={form}
            name="sy"
            label="Steps/mm Y"
            unit="steps/mm"
            slotProps={{ inputLabel: { shrink: true } }}
          />
        </Box>
        <FormTextField form={form} name="note" label="Note" placeholder="Material, thickness, current, speed" />
        <Box>
          <Button type="submit" variant="contained" disabled={create.busy}>
            {create.busy ? 'Working it out…' : 'Record test cut'}
          </Button>
        </Box>
      </Stack>
    </Box>
  );
}
