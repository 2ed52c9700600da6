import { useState, type FormEvent } from 'react';
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
  TextField,
  Typography,
} from '@mui/material';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { useStartBoltDown } from '../api/start-bolt-down';
import { MODE_EXPLAINED, MODE_LABELS, type BoltDown, type BoltDownMode, type RailSummary } from '../types';
import { parseReading } from '../utils/format';

interface Props {
  rail: RailSummary;
  onStarted: (bd: BoltDown) => void;
}

/** Begins a bolt-down of the rail: how targets are referred, and the unit the dial reads in. */
export function StartBoltDownForm({ rail, onStarted }: Props) {
  const [mode, setMode] = useState<BoltDownMode>('line');
  const [unit, setUnit] = useState<LengthUnit>('thou');
  const [band, setBand] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const start = useStartBoltDown(rail.id);

  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    const value = band.trim() ? parseReading(band) : undefined;
    if (value === null || (value !== undefined && value < 0))
      return setProblem('The band must be a number that is not negative');
    setProblem(null);
    try {
      onStarted(await start.mutateAsync({ mode, readingUnit: unit, ...(value !== undefined ? { band: value } : {}) }));
    } catch (err) {
      setProblem(err instanceof Error ? err.message : String(err));
    }
  }

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
        <RadioGroup
          aria-labelledby="bolt-down-mode"
          value={mode}
          onChange={(e) => setMode(e.target.value as BoltDownMode)}
        >
          {(['line', 'face'] as const).map((m) => (
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
      </FormControl>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ mb: 2 }}>
        <TextField
          select
          label="Dial reads in"
          value={unit}
          onChange={(e) => setUnit(e.target.value as LengthUnit)}
          sx={{ width: 180 }}
        >
          {(Object.keys(UNIT_LABELS) as LengthUnit[]).map((u) => (
            <MenuItem key={u} value={u}>
              {UNIT_LABELS[u]}
            </MenuItem>
          ))}
        </TextField>
        <TextField
          label={`On-target band ± (${UNIT_LABELS[unit]})`}
          value={band}
          onChange={(e) => setBand(e.target.value)}
          helperText="Empty: half the rail straightness target of the machine's target set"
          slotProps={{ htmlInput: { inputMode: 'decimal' } }}
          sx={{ width: 320 }}
        />
      </Stack>
      {problem && (
        <Alert severity="error" sx={{ mb: 2 }}>
          {problem}
        </Alert>
      )}
      <Button type="submit" variant="contained" size="large" disabled={start.isPending}>
        Begin the bolt-down
      </Button>
    </Paper>
  );
}
