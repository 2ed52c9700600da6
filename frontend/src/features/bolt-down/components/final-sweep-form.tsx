import { useRef, useState, type FormEvent, type KeyboardEvent } from 'react';
import { positionIn, positionText } from '../utils/position-text';
import { Alert, Box, Button, MenuItem, Paper, Stack, Table, TableBody, TableCell, TableHead, TableRow, TextField, Typography } from '@mui/material';
import { ApiError } from '../../../lib/api-client';
import { UNIT_LABELS } from '../../../lib/units';
import { useBoltTorques } from '../api/get-bolt-torques';
import { useSaveFinalSweep, type FinalSweepInput } from '../api/save-final-sweep';
import type { BoltDown } from '../types';
import { parseReading } from '../utils/format';

interface Props {
  bd: BoltDown;
  typicalBoltSize: string | null;
  /** A final sweep of this bolt-down is kept on this device, waiting to be sent. */
  waiting: boolean;
}

const optionalNumber = (text: string) => (text.trim() === '' ? undefined : parseReading(text));

/**
 * The offer at the end of a bolt-down: one more pass of the carriage with a station at every
 * hole, pre-filled with the readings the holes were fixed at, saved as the rail's sweep.
 */
export function FinalSweepForm({ bd, typicalBoltSize, waiting }: Props) {
  const unit = UNIT_LABELS[bd.readingUnit];
  const [readings, setReadings] = useState(() => bd.holes.map((h) => (h.reading === null ? '' : String(h.reading))));
  const [instrument, setInstrument] = useState('Dial indicator on a carriage');
  const [resolution, setResolution] = useState('');
  const [temperature, setTemperature] = useState('');
  const [phase, setPhase] = useState<FinalSweepInput['phase']>('as-left');
  const [boltSize, setBoltSize] = useState(typicalBoltSize ?? '');
  const [torque, setTorque] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const torques = useBoltTorques();
  const save = useSaveFinalSweep(bd.id);
  const inputs = useRef<(HTMLInputElement | null)[]>([]);
  const submit = useRef<HTMLButtonElement>(null);
  const usual = torques.data?.bolts.find((b) => b.boltSize === boltSize)?.torqueNm;

  const onKey = (i: number) => (e: KeyboardEvent) => {
    if (e.key !== 'Enter') return;
    e.preventDefault();
    (inputs.current[i + 1] ?? submit.current)?.focus();
  };

  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    const bad = readings.findIndex((r) => parseReading(r) === null);
    if (bad >= 0) {
      setProblem(`The reading at ${positionText(bd.holes[bad].position, bd.lengthUnit)} is not a number`);
      inputs.current[bad]?.focus();
      return;
    }
    const numbers = { resolution: optionalNumber(resolution), temperatureC: optionalNumber(temperature), torqueNm: torque.trim() ? optionalNumber(torque) : usual };
    const badField = Object.entries(numbers).find(([, v]) => v === null);
    if (badField) return setProblem(`${badField[0]} must be a number`);
    setProblem(null);
    try {
      await save.mutateAsync({
        readingUnit: bd.readingUnit,
        // Hole positions are sent as kept, in mm.
        lengthUnit: 'mm',
        phase,
        stations: bd.holes.map((h, i) => ({ position: h.position, reading: parseReading(readings[i])! })),
        instrument: instrument.trim() || undefined,
        resolution: numbers.resolution ?? undefined,
        temperatureC: numbers.temperatureC ?? undefined,
        boltSize: boltSize || undefined,
        torqueNm: numbers.torqueNm ?? undefined,
      });
    } catch (err) {
      setProblem(err instanceof ApiError ? err.details.join('; ') || err.message : String(err));
    }
  }

  return (
    <Paper component="form" onSubmit={onSubmit} noValidate sx={{ p: { xs: 2, md: 3 } }} aria-label="Final sweep at every hole">
      <Typography variant="h2" component="h2" gutterBottom>
        Every hole is fixed: take the final sweep
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        Run the carriage along the rail once more with every bolt torqued and read the dial at each hole. The stations are filled in with the readings the holes were
        fixed at; correct any that changed. The sweep is saved as the rail&apos;s sweep and judged against the machine&apos;s straightness target.
      </Typography>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ mb: 2, flexWrap: 'wrap' }} useFlexGap>
        <TextField label="Instrument" value={instrument} onChange={(e) => setInstrument(e.target.value)} sx={{ minWidth: 240 }} />
        <TextField label={`Resolution (${unit})`} value={resolution} onChange={(e) => setResolution(e.target.value)} slotProps={{ htmlInput: { inputMode: 'decimal' } }} sx={{ width: 150 }} />
        <TextField label="Temperature (°C)" value={temperature} onChange={(e) => setTemperature(e.target.value)} slotProps={{ htmlInput: { inputMode: 'decimal' } }} sx={{ width: 150 }} />
        <TextField select label="Taken" value={phase} onChange={(e) => setPhase(e.target.value as FinalSweepInput['phase'])} sx={{ width: 160 }}>
          <MenuItem value="as-left">As left (final)</MenuItem>
          <MenuItem value="as-found">As found</MenuItem>
        </TextField>
        <TextField select label="Bolt size" value={boltSize} onChange={(e) => setBoltSize(e.target.value)} sx={{ width: 130 }}>
          <MenuItem value="">Not recorded</MenuItem>
          {(torques.data?.bolts ?? []).map((b) => (
            <MenuItem key={b.boltSize} value={b.boltSize}>
              {b.boltSize}
            </MenuItem>
          ))}
        </TextField>
        <TextField
          label="Torque (N·m)"
          value={torque}
          placeholder={usual !== undefined ? String(usual) : ''}
          onChange={(e) => setTorque(e.target.value)}
          slotProps={{ htmlInput: { inputMode: 'decimal' }, inputLabel: { shrink: true } }}
          sx={{ width: 150 }}
          helperText={usual !== undefined && !torque ? `usual for ${boltSize}: ${usual} N·m` : ' '}
        />
      </Stack>
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
            {bd.holes.map((h, i) => (
              <TableRow key={h.index}>
                <TableCell>{h.index + 1}</TableCell>
                <TableCell align="right">{positionIn(h.position, bd.lengthUnit)}</TableCell>
                <TableCell sx={{ py: 0.5 }}>
                  <TextField
                    inputRef={(el: HTMLInputElement | null) => {
                      inputs.current[i] = el;
                    }}
                    value={readings[i]}
                    onChange={(e) => setReadings((r) => r.map((v, k) => (k === i ? e.target.value : v)))}
                    onKeyDown={onKey(i)}
                    error={parseReading(readings[i]) === null}
                    slotProps={{ htmlInput: { inputMode: 'decimal', 'aria-label': `Final reading at ${positionText(h.position, bd.lengthUnit)}` } }}
                    sx={{ width: 140 }}
                  />
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </Box>
      {problem && (
        <Alert severity="error" sx={{ mt: 2 }}>
          {problem}
        </Alert>
      )}
      {waiting && !save.isPending && (
        <Alert severity="warning" sx={{ mt: 2 }}>
          The final sweep is waiting to send; it is kept on this device and saved once the connection is back.
        </Alert>
      )}
      <Button ref={submit} type="submit" variant="contained" size="large" disabled={save.isPending || waiting} sx={{ mt: 2 }}>
        Save the final sweep
      </Button>
    </Paper>
  );
}
