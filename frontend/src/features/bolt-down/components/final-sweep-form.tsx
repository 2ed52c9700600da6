import { useRef, useState, type FormEvent, type KeyboardEvent } from 'react';
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
import { useMe } from '../../../lib/session/get-me';
import { UNIT_LABELS } from '../../../lib/units';
import { useBoltTorques } from '../api/get-bolt-torques';
import { useSaveFinalSweep, type FinalSweepInput } from '../api/save-final-sweep';
import type { BoltDown } from '../types';
import type { GuideHole } from '../utils/guide-state';
import { parseReading } from '../utils/format';

interface Props {
  bd: BoltDown;
  /** The holes as the guide shows them (readings still waiting on this device included). */
  holes: GuideHole[];
  typicalBoltSize: string | null;
}

const optionalNumber = (text: string) => (text.trim() === '' ? undefined : parseReading(text));

/**
 * The offer at the end of a bolt-down: one more pass of the carriage with a station at every
 * hole, pre-filled with the readings the holes were fixed at, saved as the rail's sweep with the
 * same details as any sweep (datum included, so the rail can be compared with its partner).
 * Only what the person typed or accepted is sent: the usual torque is offered, never assumed.
 */
export function FinalSweepForm({ bd, holes, typicalBoltSize }: Props) {
  const unit = UNIT_LABELS[bd.readingUnit];
  const me = useMe();
  const [readings, setReadings] = useState(() => holes.map((h) => (h.reading === null ? '' : String(h.reading))));
  const [instrument, setInstrument] = useState('');
  const [resolution, setResolution] = useState('');
  const [temperature, setTemperature] = useState('');
  const [phase, setPhase] = useState<FinalSweepInput['phase']>('as-left');
  const [takenBy, setTakenBy] = useState('');
  const [datum, setDatum] = useState('');
  const [boltSize, setBoltSize] = useState(typicalBoltSize ?? '');
  const [torque, setTorque] = useState('');
  const [notes, setNotes] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const torques = useBoltTorques();
  const save = useSaveFinalSweep(bd, setProblem);
  const inputs = useRef<(HTMLInputElement | null)[]>([]);
  const submit = useRef<HTMLButtonElement>(null);
  const usual = torques.data?.bolts.find((b) => b.boltSize === boltSize)?.torqueNm;

  // Enter goes to the next hole's reading, and from the last one to Save.
  const onKey = (i: number) => (e: KeyboardEvent) => {
    if (e.key !== 'Enter') return;
    e.preventDefault();
    (inputs.current[i + 1] ?? submit.current)?.focus();
  };

  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const bad = readings.findIndex((r) => parseReading(r) === null);
    if (bad >= 0) {
      setProblem(`The reading at ${positionText(holes[bad].position, bd.lengthUnit)} is not a number`);
      inputs.current[bad]?.focus();
      return;
    }
    const numbers = {
      resolution: optionalNumber(resolution),
      temperature: optionalNumber(temperature),
      torque: optionalNumber(torque),
    };
    const badField = Object.entries(numbers).find(([, v]) => v === null);
    if (badField) return setProblem(`The ${badField[0]} must be a number`);
    setProblem(null);
    save({
      readingUnit: bd.readingUnit,
      // Hole positions are sent as kept, in mm.
      lengthUnit: 'mm',
      phase,
      stations: holes.map((h, i) => ({ position: h.position, reading: parseReading(readings[i])! })),
      instrument: instrument.trim() || undefined,
      resolution: numbers.resolution ?? undefined,
      temperatureC: numbers.temperature ?? undefined,
      takenBy: takenBy.trim() || undefined,
      datum: datum.trim() || undefined,
      boltSize: boltSize || undefined,
      torqueNm: numbers.torque ?? undefined,
      notes: notes.trim() || undefined,
    });
  }

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
        <TextField
          label="Instrument"
          value={instrument}
          onChange={(e) => setInstrument(e.target.value)}
          placeholder="Dial indicator on a carriage"
        />
        <TextField
          label="Resolution"
          value={resolution}
          onChange={(e) => setResolution(e.target.value)}
          slotProps={{
            htmlInput: { inputMode: 'decimal' },
            input: { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> },
          }}
        />
        <TextField
          label="Temperature"
          value={temperature}
          onChange={(e) => setTemperature(e.target.value)}
          slotProps={{
            htmlInput: { inputMode: 'decimal' },
            input: { endAdornment: <InputAdornment position="end">°C</InputAdornment> },
          }}
        />
        <TextField
          select
          label="Phase"
          value={phase}
          onChange={(e) => setPhase(e.target.value as FinalSweepInput['phase'])}
        >
          <MenuItem value="as-left">As left (final)</MenuItem>
          <MenuItem value="as-found">As found</MenuItem>
        </TextField>
        <TextField
          label="Datum"
          value={datum}
          onChange={(e) => setDatum(e.target.value)}
          helperText="Name the common datum, the same as on the partner rail, to compare the two"
          sx={{ gridColumn: { sm: '1 / -1', md: 'auto' } }}
        />
        <TextField
          label="Taken by"
          value={takenBy}
          onChange={(e) => setTakenBy(e.target.value)}
          placeholder={me.data?.name}
          helperText={takenBy.trim() ? ' ' : 'You, when left empty'}
        />
        <TextField select label="Bolt size" value={boltSize} onChange={(e) => setBoltSize(e.target.value)}>
          <MenuItem value="">Not recorded</MenuItem>
          {(torques.data?.bolts ?? []).map((b) => (
            <MenuItem key={b.boltSize} value={b.boltSize}>
              {b.boltSize}
            </MenuItem>
          ))}
        </TextField>
        <TextField
          label="Torque"
          value={torque}
          onChange={(e) => setTorque(e.target.value)}
          slotProps={{
            htmlInput: { inputMode: 'decimal', 'data-testid': 'final-torque' },
            input: {
              endAdornment: (
                <InputAdornment position="end">
                  {usual !== undefined && torque.trim() !== String(usual) && (
                    <Button size="small" onClick={() => setTorque(String(usual))} sx={{ mr: 1 }}>
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
        <TextField
          label="Notes"
          value={notes}
          onChange={(e) => setNotes(e.target.value)}
          multiline
          minRows={1}
          sx={{ gridColumn: '1 / -1' }}
        />
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
                  <TextField
                    inputRef={(el: HTMLInputElement | null) => {
                      inputs.current[i] = el;
                    }}
                    value={readings[i]}
                    onChange={(e) => setReadings((r) => r.map((v, k) => (k === i ? e.target.value : v)))}
                    onKeyDown={onKey(i)}
                    error={parseReading(readings[i]) === null}
                    slotProps={{
                      htmlInput: {
                        inputMode: 'decimal',
                        enterKeyHint: 'next',
                        'aria-label': `Final reading at ${positionText(h.position, bd.lengthUnit)}`,
                      },
                    }}
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
      <Button ref={submit} type="submit" variant="contained" size="large" sx={{ mt: 2 }}>
        Save the final sweep
      </Button>
    </Paper>
  );
}
