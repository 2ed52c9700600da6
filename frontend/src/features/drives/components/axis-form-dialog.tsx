import { useLayoutEffect } from 'react';
import {
  Alert,
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Divider,
  Stack,
  Typography,
} from '@mui/material';
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { useCreateAxis } from '../api/create-axis';
import { useUpdateAxis } from '../api/update-axis';
import { useDrivePreview } from '../api/preview-drive';
import type { Axis } from '../types';
import {
  axisFormOf,
  axisFormSchema,
  drivePreviewOf,
  toAxisUpdate,
  toNewAxis,
  type AxisFormValues,
} from './axis-form-schema';
import { DriveFields } from './drive-fields';
import { FormNumberInput } from './form-number-input';
import { useDebounced } from '../../../lib/use-debounced';
import { errorText } from '../utils/format';
import { FormTextField } from '../../../components/form/form-text-field';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { UNIT_LABELS } from '../../../lib/units';

/** Adds an axis to a machine, or edits one. */
export function AxisFormDialog({
  machineId,
  axis,
  open,
  onClose,
}: {
  machineId: string;
  axis?: Axis;
  open: boolean;
  onClose: () => void;
}) {
  const form = useForm<AxisFormValues>({ defaultValues: axisFormOf(axis), resolver: zodResolver(axisFormSchema) });
  // Opened (again) or given another axis: the form starts from that axis, before the dialog is
  // drawn, so it never shows the previous draft.
  useLayoutEffect(() => {
    if (open) form.reset(axisFormOf(axis));
  }, [open, axis, form]);
  const create = useCreateAxis(machineId);
  const update = useUpdateAxis(axis?.id ?? '');
  const save = axis ? update : create;

  // The calculator's request, recomputed only when what it depends on changes (a note or the
  // name typed leaves it as it is) and asked only while the dialog is open: a closed dialog or a
  // half-typed drive would only be refused.
  const drivePreview = useWatch({ control: form.control, compute: drivePreviewOf });
  const debounced = useDebounced(open ? drivePreview : null, 250);
  const preview = useDrivePreview(debounced);
  const theoretical = preview.isError ? null : preview.data?.stepsPerMm;
  const [name, lengthUnit] = useWatch({ control: form.control, name: ['name', 'lengthUnit'] });
  const u = UNIT_LABELS[lengthUnit];
  const inches = lengthUnit === 'in' || lengthUnit === 'thou';

  const close = () => {
    save.reset();
    onClose();
  };
  const done = { onSuccess: close };
  const submit = form.handleSubmit((values) =>
    axis ? update.mutate(toAxisUpdate(values), done) : create.mutate(toNewAxis(values), done),
  );
  const grid = { display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr 1fr' }, gap: 2 } as const;

  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="md">
      <DialogTitle>{axis ? `Edit axis ${axis.name}` : 'Add an axis'}</DialogTitle>
      <DialogContent>
        <Stack spacing={2.5} sx={{ pt: 1 }}>
          {save.error && <Alert severity="error">{errorText(save.error)}</Alert>}
          <FormTextField
            form={form}
            name="name"
            label="Axis name"
            required
            autoFocus
            helperText="X, Y1, Y2, Z… — one record per motor; the first letter is the G-code axis"
            sx={{ maxWidth: 360 }}
          />
          <Box sx={{ display: 'flex', gap: 2, alignItems: 'center', flexWrap: 'wrap' }}>
            <Controller
              name="lengthUnit"
              control={form.control}
              render={({ field }) => (
                <UnitFamilySelect
                  family="length"
                  label="Axis set up in"
                  value={field.value}
                  onChange={field.onChange}
                  units={['mm', 'in']}
                />
              )}
            />
            <Typography variant="body2" color="text.secondary" sx={{ flex: '1 1 240px' }}>
              Lead, diameters, lengths, travel and feed rates below are in {u}
              {inches ? '; the test programs run in G20 (inches)' : ''}.
            </Typography>
          </Box>
          <DriveFields form={form} />
          <Divider />
          <Box sx={grid}>
            <FormNumberInput
              form={form}
              name="motorStepsPerRev"
              label="Motor steps per revolution"
              required
              helperText="200 for a 1.8° motor, 400 for 0.9°"
            />
            <FormNumberInput
              form={form}
              name="microsteps"
              label="Microsteps"
              required
              helperText="As set on the driver"
            />
            <FormNumberInput
              form={form}
              name="gearRatio"
              label="Gear ratio"
              helperText="Motor turns per screw, pulley or pinion turn"
            />
          </Box>
          <Box sx={{ display: 'flex', gap: 2, alignItems: 'flex-start', flexWrap: 'wrap' }}>
            <FormNumberInput
              form={form}
              name="stepsPerMm"
              label="Steps per mm in the controller"
              unit="steps/mm"
              required
              sx={{ width: 300 }}
            />
            <Box sx={{ pt: 0.5 }}>
              <Typography variant="body2" color="text.secondary">
                Theoretical from the drive
              </Typography>
              <Typography sx={{ fontWeight: 600 }} data-testid="theoretical-steps">
                {theoretical
                  ? `${Number(theoretical.toFixed(4))} steps/mm${inches ? ` · ${Number((theoretical * 25.4).toFixed(3))} steps/in` : ''}`
                  : '—'}
              </Typography>
            </Box>
            {theoretical && (
              <Button
                size="small"
                sx={{ mt: 1 }}
                onClick={() =>
                  form.setValue('stepsPerMm', String(Number(theoretical.toFixed(4))), { shouldDirty: true })
                }
              >
                Use the theoretical value
              </Button>
            )}
          </Box>
          <Box sx={grid}>
            <FormNumberInput
              form={form}
              name="maxFeedRate"
              label="Fastest feed rate"
              unit={`${u}/min`}
              helperText="The fastest it will be asked to move"
            />
            <FormNumberInput
              form={form}
              name="measuredTravel"
              label="Measured travel"
              unit={u}
              helperText="End to end, limit switch to limit switch"
            />
          </Box>
          <FormTextField form={form} name="notes" label="Notes" multiline minRows={2} />
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button variant="contained" onClick={submit} disabled={!name.trim() || save.isPending}>
          {axis ? 'Save changes' : 'Add axis'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
