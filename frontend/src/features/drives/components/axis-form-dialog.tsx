import { useState } from 'react';
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
  TextField,
  Typography,
} from '@mui/material';
import { useCreateAxis } from '../api/create-axis';
import { useUpdateAxis } from '../api/update-axis';
import { useDrivePreview, type DrivePreviewInput } from '../api/preview-drive';
import type { Axis, Drive } from '../types';
import { DriveFields, type DriveDraft } from './drive-fields';
import { NumberInput, numberOf } from './number-input';
import { useDebounced } from '../../../lib/use-debounced';
import { errorText } from '../utils/format';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';

const str = (v: number | null | undefined) => (v === null || v === undefined ? '' : String(v));

function draftOf(axis?: Axis) {
  const d = axis?.drive;
  return {
    name: axis?.name ?? '',
    lengthUnit: (axis?.lengthUnit ?? 'mm') as LengthUnit,
    drive: {
      type: d?.type ?? 'screw',
      leadAs: d?.threadsPerInch ? 'tpi' : 'length',
      lead: d?.threadsPerInch ? '' : str(d?.lead),
      threadsPerInch: str(d?.threadsPerInch),
      nominalDiameter: str(d?.nominalDiameter),
      rootDiameter: str(d?.rootDiameter),
      unsupportedLength: str(d?.unsupportedLength),
      mounting: d?.mounting ?? '',
      dnLimit: str(d?.dnLimit),
      beltPitch: str(d?.beltPitch),
      pulleyTeeth: str(d?.pulleyTeeth),
      pinionModule: str(d?.pinionModule),
      pinionTeeth: str(d?.pinionTeeth),
    } as DriveDraft,
    motorStepsPerRev: str(axis?.motorStepsPerRev ?? 200),
    microsteps: str(axis?.microsteps ?? 8),
    gearRatio: str(axis?.gearRatio ?? 1),
    stepsPerMm: str(axis?.stepsPerMm),
    maxFeedRate: str(axis?.maxFeedRate),
    measuredTravel: str(axis?.measuredTravel),
    notes: axis?.notes ?? '',
  };
}

/** Only the fields the drive type uses are sent. */
function driveOf(d: DriveDraft): Drive {
  const pick = (keys: (keyof DriveDraft)[]) =>
    Object.fromEntries(keys.map((k) => [k, numberOf(d[k])]).filter(([, v]) => v !== undefined));
  if (d.type === 'belt') return { type: 'belt', ...pick(['beltPitch', 'pulleyTeeth']) };
  if (d.type === 'rack') return { type: 'rack', ...pick(['pinionModule', 'pinionTeeth']) };
  const lead = d.leadAs === 'tpi' ? pick(['threadsPerInch']) : pick(['lead']);
  return {
    type: 'screw',
    ...lead,
    ...pick(['nominalDiameter', 'rootDiameter', 'unsupportedLength', 'dnLimit']),
    ...(d.mounting ? { mounting: d.mounting } : {}),
  };
}

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
  const [f, setF] = useState(() => draftOf(axis));
  // Opened (again) or given another axis: the form starts from that axis. Set while rendering, so
  // no render shows the previous draft.
  const [shownFor, setShownFor] = useState({ open, axis });
  if (shownFor.open !== open || shownFor.axis !== axis) {
    setShownFor({ open, axis });
    if (open) setF(draftOf(axis));
  }
  const create = useCreateAxis(machineId);
  const update = useUpdateAxis(axis?.id ?? '');
  const save = axis ? update : create;
  const set = (k: keyof typeof f) => (v: string) => setF((x) => ({ ...x, [k]: v }));

  const drive = driveOf(f.drive);
  const steps = numberOf(f.motorStepsPerRev);
  const micro = numberOf(f.microsteps);
  const { type, lead, threadsPerInch, beltPitch, pulleyTeeth, pinionModule, pinionTeeth } = drive;
  // Asked only while the dialog is open and the drive has the numbers that define it: a closed
  // dialog or a half-typed drive would only be refused.
  const defined =
    type === 'belt'
      ? beltPitch !== undefined && pulleyTeeth !== undefined
      : type === 'rack'
        ? pinionModule !== undefined && pinionTeeth !== undefined
        : lead !== undefined || threadsPerInch !== undefined;
  const previewInput: DrivePreviewInput | null =
    open && steps && micro && defined
      ? {
          type,
          lengthUnit: f.lengthUnit,
          motorStepsPerRev: steps,
          microsteps: micro,
          gearRatio: numberOf(f.gearRatio),
          lead,
          threadsPerInch,
          beltPitch,
          pulleyTeeth,
          pinionModule,
          pinionTeeth,
        }
      : null;
  const u = UNIT_LABELS[f.lengthUnit];
  const inches = f.lengthUnit === 'in' || f.lengthUnit === 'thou';
  const debounced = useDebounced(previewInput, 250);
  const preview = useDrivePreview(debounced);
  const theoretical = preview.isError ? null : preview.data?.stepsPerMm;

  const submit = () => {
    const input = {
      name: f.name.trim(),
      lengthUnit: f.lengthUnit,
      drive,
      motorStepsPerRev: numberOf(f.motorStepsPerRev) ?? NaN,
      microsteps: numberOf(f.microsteps) ?? NaN,
      gearRatio: numberOf(f.gearRatio) ?? 1,
      stepsPerMm: numberOf(f.stepsPerMm) ?? NaN,
      notes: f.notes,
    };
    const maxFeedRate = numberOf(f.maxFeedRate);
    const measuredTravel = numberOf(f.measuredTravel);
    const done = { onSuccess: () => close() };
    // An edit clears an emptied field with null; a new axis leaves it out.
    if (axis)
      update.mutate({ ...input, maxFeedRate: maxFeedRate ?? null, measuredTravel: measuredTravel ?? null }, done);
    else
      create.mutate(
        {
          ...input,
          ...(maxFeedRate === undefined ? {} : { maxFeedRate }),
          ...(measuredTravel === undefined ? {} : { measuredTravel }),
        },
        done,
      );
  };
  const close = () => {
    save.reset();
    onClose();
  };
  const grid = { display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr 1fr' }, gap: 2 } as const;

  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="md">
      <DialogTitle>{axis ? `Edit axis ${axis.name}` : 'Add an axis'}</DialogTitle>
      <DialogContent>
        <Stack spacing={2.5} sx={{ pt: 1 }}>
          {save.error && <Alert severity="error">{errorText(save.error)}</Alert>}
          <TextField
            label="Axis name"
            value={f.name}
            onChange={(e) => set('name')(e.target.value)}
            required
            autoFocus
            helperText="X, Y1, Y2, Z… — one record per motor; the first letter is the G-code axis"
            sx={{ maxWidth: 360 }}
          />
          <Box sx={{ display: 'flex', gap: 2, alignItems: 'center', flexWrap: 'wrap' }}>
            <UnitFamilySelect
              family="length"
              label="Axis set up in"
              value={f.lengthUnit}
              onChange={(lengthUnit) => setF((x) => ({ ...x, lengthUnit }))}
              units={['mm', 'in']}
            />
            <Typography variant="body2" color="text.secondary" sx={{ flex: '1 1 240px' }}>
              Lead, diameters, lengths, travel and feed rates below are in {u}
              {inches ? '; the test programs run in G20 (inches)' : ''}.
            </Typography>
          </Box>
          <DriveFields draft={f.drive} unit={f.lengthUnit} onChange={(drive) => setF((x) => ({ ...x, drive }))} />
          <Divider />
          <Box sx={grid}>
            <NumberInput
              label="Motor steps per revolution"
              value={f.motorStepsPerRev}
              onChange={set('motorStepsPerRev')}
              required
              helperText="200 for a 1.8° motor, 400 for 0.9°"
            />
            <NumberInput
              label="Microsteps"
              value={f.microsteps}
              onChange={set('microsteps')}
              required
              helperText="As set on the driver"
            />
            <NumberInput
              label="Gear ratio"
              value={f.gearRatio}
              onChange={set('gearRatio')}
              helperText="Motor turns per screw, pulley or pinion turn"
            />
          </Box>
          <Box sx={{ display: 'flex', gap: 2, alignItems: 'flex-start', flexWrap: 'wrap' }}>
            <NumberInput
              label="Steps per mm in the controller"
              unit="steps/mm"
              value={f.stepsPerMm}
              onChange={set('stepsPerMm')}
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
                onClick={() => set('stepsPerMm')(String(Number(theoretical.toFixed(4))))}
              >
                Use the theoretical value
              </Button>
            )}
          </Box>
          <Box sx={grid}>
            <NumberInput
              label="Fastest feed rate"
              unit={`${u}/min`}
              value={f.maxFeedRate}
              onChange={set('maxFeedRate')}
              helperText="The fastest it will be asked to move"
            />
            <NumberInput
              label="Measured travel"
              unit={u}
              value={f.measuredTravel}
              onChange={set('measuredTravel')}
              helperText="End to end, limit switch to limit switch"
            />
          </Box>
          <TextField
            label="Notes"
            value={f.notes}
            onChange={(e) => set('notes')(e.target.value)}
            multiline
            minRows={2}
          />
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button variant="contained" onClick={submit} disabled={!f.name.trim() || save.isPending}>
          {axis ? 'Save changes' : 'Add axis'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
