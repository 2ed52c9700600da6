import {
  Alert,
  Button,
  FormControl,
  FormControlLabel,
  FormLabel,
  MenuItem,
  Paper,
  Radio,
  RadioGroup,
  Stack,
  Typography,
} from '@mui/material';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { FormTextField } from '../../../components/form/form-text-field';
import { LENGTH_UNITS, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { useStartBoltDown, type StartBoltDownInput } from '../api/start-bolt-down';
import { MODE_EXPLAINED, MODE_LABELS, type BoltDown, type BoltDownMode, type RailSummary } from '../types';
import { parseReading } from '../utils/format';

const MODES = ['line', 'face'] as const satisfies readonly BoltDownMode[];

/** The band as typed, in the dial's unit; empty leaves it to the machine's target set. */
const typedBand = (text: string) => (text.trim() ? parseReading(text) : undefined);

const startBoltDownSchema = z.object({
  mode: z.enum(MODES),
  readingUnit: z.enum(LENGTH_UNITS),
  band: z.string().refine(
    (text) => {
      const value = typedBand(text);
      return value === undefined || (value !== null && value >= 0);
    },
    { message: 'The band must be a number that is not negative' },
  ),
});

type StartBoltDownValues = z.input<typeof startBoltDownSchema>;

const startBoltDownDefaults: StartBoltDownValues = { mode: 'line', readingUnit: 'thou', band: '' };

function toStartBoltDownInput(v: StartBoltDownValues): StartBoltDownInput {
  const band = typedBand(v.band);
  return { mode: v.mode, readingUnit: v.readingUnit, ...(typeof band === 'number' ? { band } : {}) };
}

interface Props {
  rail: RailSummary;
  onStarted: (bd: BoltDown) => void;
}

/** Begins a bolt-down of the rail: how targets are referred, and the unit the dial reads in. */
export function StartBoltDownForm({ rail, onStarted }: Props) {
  const form = useForm<StartBoltDownValues>({
    defaultValues: startBoltDownDefaults,
    resolver: zodResolver(startBoltDownSchema),
  });
  const unit = useWatch({ control: form.control, name: 'readingUnit' });
  const start = useStartBoltDown(rail.id);
  const onSubmit = form.handleSubmit(async (values) => {
    // Awaited rather than a callback of mutate: the form may be gone once the rail's list is read again.
    // A refusal shows from the mutation's error, above the button.
    const started = await start.mutateAsync(toStartBoltDownInput(values)).catch(() => null);
    if (started) onStarted(started);
  });

  return (
    <Paper
      component="form"
      onSubmit={onSubmit}
      noValidate
      sx={{ p: { xs: 2, md: 3 }, maxWidth: 760 }}
      aria-label="Begin a bolt-down"
    >
      <Typography variant="h2" component="h2" gutterBottom>
        Begin the bolt-down
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        {rail.label}: {rail.lengthMm} mm, {rail.holes.length} holes from {rail.holes[0]?.position ?? '—'} mm to{' '}
        {rail.holes.at(-1)?.position ?? '—'} mm. Snug every bolt, push the rail against its reference, then fix the
        holes one at a time in the order shown.
      </Typography>
      <FormControl sx={{ mb: 2 }}>
        <FormLabel id="bolt-down-mode">What each hole is aimed at</FormLabel>
        <Controller
          name="mode"
          control={form.control}
          render={({ field }) => (
            <RadioGroup
              aria-labelledby="bolt-down-mode"
              name={field.name}
              value={field.value}
              onChange={(e) => field.onChange(e.target.value as BoltDownMode)}
              onBlur={field.onBlur}
            >
              {MODES.map((m) => (
                <FormControlLabel
                  key={m}
                  value={m}
                  control={<Radio />}
                  label={
                    <span>
                      <strong>{MODE_LABELS[m]}</strong> — {MODE_EXPLAINED[m]}
                    </span>
                  }
                  sx={{ alignItems: 'flex-start', mb: 1, '& .MuiRadio-root': { pt: { md: 0.5 } } }}
                />
              ))}
            </RadioGroup>
          )}
        />
      </FormControl>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ mb: 2 }}>
        <FormTextField form={form} name="readingUnit" select label="Dial reads in" sx={{ width: 180 }}>
          {(Object.keys(UNIT_LABELS) as LengthUnit[]).map((u) => (
            <MenuItem key={u} value={u}>
              {UNIT_LABELS[u]}
            </MenuItem>
          ))}
        </FormTextField>
        <FormTextField
          form={form}
          name="band"
          label={`On-target band ± (${UNIT_LABELS[unit]})`}
          helperText="Empty: half the rail straightness target of the machine's target set"
          slotProps={{ htmlInput: { inputMode: 'decimal' } }}
          sx={{ width: 320 }}
        />
      </Stack>
      {start.error && (
        <Alert severity="error" sx={{ mb: 2 }}>
          {start.error.message}
        </Alert>
      )}
      <Button type="submit" variant="contained" size="large" disabled={start.isPending}>
        Begin the bolt-down
      </Button>
    </Paper>
  );
}
