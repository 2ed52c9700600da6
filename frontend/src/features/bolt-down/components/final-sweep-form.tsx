import { useMemo, useRef, useState, type KeyboardEvent } from 'react';
import { positionIn, positionText } from '../utils/position-text';
import {
  Alert,
  Box,
  Button,
  InputAdornment,
  MenuItem,
  Paper,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  TextField,
  Typography,
} from '@mui/material';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { FormTextField } from '../../../components/form/form-text-field';
import { useMe } from '../../../lib/session/get-me';
import { UNIT_LABELS } from '../../../lib/units';
import { useBoltTorques } from '../api/get-bolt-torques';
import { useSaveFinalSweep } from '../api/save-final-sweep';
import type { BoltDown } from '../types';
import type { GuideHole } from '../utils/guide-state';
import { parseReading } from '../utils/format';
import {
  finalSweepFormOf,
  finalSweepFormSchema,
  toFinalSweepInput,
  type FinalSweepFormValues,
} from './final-sweep-form-schema';

interface Props {
  bd: BoltDown;
  /** The holes as the guide shows them (readings still waiting on this device included). */
  holes: GuideHole[];
  typicalBoltSize: string | null;
}

/**
 * The offer at the end of a bolt-down: one more pass of the carriage with a station at every
 * hole, pre-filled with the readings the holes were fixed at, saved as the rail's sweep with the
 * same details as any sweep (datum included, so the rail can be compared with its partner).
 * Only what the person typed or accepted is sent: the usual torque is offered, never assumed.
 */
export function FinalSweepForm({ bd, holes, typicalBoltSize }: Props) {
  const unit = UNIT_LABELS[bd.readingUnit];
  const me = useMe();
  const schema = useMemo(
    () => finalSweepFormSchema(holes.map((h) => positionText(h.position, bd.lengthUnit))),
    [holes, bd.lengthUnit],
  );
  const form = useForm<FinalSweepFormValues>({
    defaultValues: finalSweepFormOf(holes, typicalBoltSize),
    resolver: zodResolver(schema),
    shouldFocusError: false,
  });
  const [takenBy, boltSize, torque] = useWatch({ control: form.control, name: ['takenBy', 'boltSize', 'torque'] });
  // The server's refusal of a sent sweep (a problem with what was typed shows under its field).
  const [refused, setRefused] = useState<string | null>(null);
  const torques = useBoltTorques();
  const save = useSaveFinalSweep(bd, setRefused);
  const inputs = useRef<(HTMLInputElement | null)[]>([]);
  const submit = useRef<HTMLButtonElement>(null);
  const usual = torques.data?.bolts.find((b) => b.boltSize === boltSize)?.torqueNm;

  // Enter goes to the next hole's reading, and from the last one to Save.
  const onKey = (i: number) => (e: KeyboardEvent) => {
    if (e.key !== 'Enter') return;
    e.preventDefault();
    (inputs.current[i + 1] ?? submit.current)?.focus();
  };

  // Nothing is sent until every field reads; each bad one is named under itself. The first bad
  // reading is focused, else the first bad detail: the readings are what the sweep is for.
  const onSubmit = form.handleSubmit(
    (values) => {
      setRefused(null);
      save(toFinalSweepInput(values, bd, holes));
    },
    (errors) => {
      const bad = holes.findIndex((_, i) => errors.readings?.[i]);
      if (bad >= 0) inputs.current[bad]?.focus();
      else if (errors.resolution) form.setFocus('resolution');
      else if (errors.temperature) form.setFocus('temperature');
      else if (errors.torque) form.setFocus('torque');
    },
  );

  return (
    <Paper
      component="form"
      onSubmit={onSubmit}
      noValidate
      sx={{ p: { xs: 2, md: 3 } }}
      aria-label="Final sweep at every hole"
    >
      <Typography variant="h2" component="h2" gutterBottom>
        Every hole is fixed: take the final sweep
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        Run the carriage along the rail once more with every bolt torqued and read the dial at each hole. The stations
        are filled in with the readings the holes were fixed at; correct any that changed. The sweep is saved as the
        rail&apos;s sweep and judged against the machine&apos;s straightness target.
      </Typography>
      <Box
        sx={{ display: 'grid', gap: 2, mb: 2, gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr', md: '2fr 1fr 1fr' } }}
      >
        <FormTextField form={form} name="instrument" label="Instrument" placeholder="Dial indicator on a carriage" />
        <FormTextField
          form={form}
          name="resolution"
          label="Resolution"
          slotProps={{
            htmlInput: { inputMode: 'decimal' },
            input: { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> },
          }}
        />
        <FormTextField
          form={form}
          name="temperature"
          label="Temperature"
          slotProps={{
            htmlInput: { inputMode: 'decimal' },
            input: { endAdornment: <InputAdornment position="end">°C</InputAdornment> },
          }}
        />
        <FormTextField form={form} name="phase" select label="Phase">
          <MenuItem value="as-left">As left (final)</MenuItem>
          <MenuItem value="as-found">As found</MenuItem>
        </FormTextField>
        <FormTextField
          form={form}
          name="datum"
          label="Datum"
          helperText="Name the common datum, the same as on the partner rail, to compare the two"
          sx={{ gridColumn: { sm: '1 / -1', md: 'auto' } }}
        />
        <FormTextField
          form={form}
          name="takenBy"
          label="Taken by"
          placeholder={me.data?.name}
          helperText={takenBy.trim() ? ' ' : 'You, when left empty'}
        />
        <FormTextField form={form} name="boltSize" select label="Bolt size">
          <MenuItem value="">Not recorded</MenuItem>
          {(torques.data?.bolts ?? []).map((b) => (
            <MenuItem key={b.boltSize} value={b.boltSize}>
              {b.boltSize}
            </MenuItem>
          ))}
        </FormTextField>
        <FormTextField
          form={form}
          name="torque"
          label="Torque"
          slotProps={{
            htmlInput: { inputMode: 'decimal', 'data-testid': 'final-torque' },
            input: {
              endAdornment: (
                <InputAdornment position="end">
                  {usual !== undefined && torque.trim() !== String(usual) && (
                    <Button
                      size="small"
                      onClick={() =>
                        form.setValue('torque', String(usual), { shouldValidate: form.formState.isSubmitted })
                      }
                      sx={{ mr: 1 }}
                    >
                      Use {usual}
                    </Button>
                  )}
                  N·m
                </InputAdornment>
              ),
            },
          }}
          helperText={
            usual !== undefined
              ? torque.trim()
                ? ' '
                : `Usual for ${boltSize}: ${usual} N·m — not recorded unless typed or used`
              : 'Type the torque used, if measured'
          }
          sx={{ gridColumn: { sm: '1 / -1', md: 'span 2' } }}
        />
        <FormTextField form={form} name="notes" label="Notes" multiline minRows={1} sx={{ gridColumn: '1 / -1' }} />
      </Box>
      {torques.data && (
        <Typography variant="body2" color="text.secondary" sx={{ mb: 2 }}>
          Torques offered: {torques.data.source}
        </Typography>
      )}
      <Box sx={{ maxHeight: 420, overflow: 'auto', border: 1, borderColor: 'divider', borderRadius: 1 }}>
        <Table size="small" stickyHeader aria-label="Final sweep stations">
          <TableHead>
            <TableRow>
              <TableCell>Hole</TableCell>
              <TableCell align="right">Station ({UNIT_LABELS[bd.lengthUnit]})</TableCell>
              <TableCell>Reading ({unit})</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {holes.map((h, i) => (
              <TableRow key={h.index}>
                <TableCell>{h.index + 1}</TableCell>
                <TableCell align="right">{positionIn(h.position, bd.lengthUnit)}</TableCell>
                <TableCell sx={{ py: 0.5 }}>
                  <Controller
                    name={`readings.${i}`}
                    control={form.control}
                    render={({ field, fieldState }) => (
                      <TextField
                        name={field.name}
                        inputRef={(el: HTMLInputElement | null) => {
                          field.ref(el);
                          inputs.current[i] = el;
                        }}
                        value={field.value}
                        onChange={(e) => field.onChange(e.target.value)}
                        onBlur={field.onBlur}
                        onKeyDown={onKey(i)}
                        // Flagged as it is typed; named once the sweep has been sent.
                        error={parseReading(field.value) === null}
                        helperText={fieldState.error?.message}
                        slotProps={{
                          htmlInput: {
                            inputMode: 'decimal',
                            enterKeyHint: 'next',
                            'aria-label': `Final reading at ${positionText(h.position, bd.lengthUnit)}`,
                          },
                        }}
                        sx={{ width: 140 }}
                      />
                    )}
                  />
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </Box>
      {refused && (
        <Alert severity="error" sx={{ mt: 2 }}>
          {refused}
        </Alert>
      )}
      <Button ref={submit} type="submit" variant="contained" size="large" sx={{ mt: 2 }}>
        Save the final sweep
      </Button>
    </Paper>
  );
}
