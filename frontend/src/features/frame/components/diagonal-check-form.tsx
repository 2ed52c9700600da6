import { useState, type FormEvent } from 'react';
import { Alert, Box, Button, Stack, TextField } from '@mui/material';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { useCreateDiagonalCheck } from '../api/create-diagonal-check';
import { WaitingEntries } from '../../../components/offline/waiting-entries';
import type { DiagonalCheck } from '../types';
import { NumberField, parseNumber } from './number-field';
import { UnitFamilySelect } from '../../../components/form/unit-select';

const FIELDS = [
  ['sideX', 'X side', undefined],
  ['sideY', 'Y side', undefined],
  ['diagonal1', 'Diagonal 1', 'X0 Y0 corner to the far corner'],
  ['diagonal2', 'Diagonal 2', 'X-far Y0 corner to X0 Y-far corner'],
] as const;
type Field = (typeof FIELDS)[number][0];

/** The four lengths of the marked rectangle, and the span over which one gantry end is moved. */
export function DiagonalCheckForm({ machineId, onSaved }: { machineId: string; onSaved: (c: DiagonalCheck) => void }) {
  const [unit, setUnit] = useState<LengthUnit>('mm');
  const [values, setValues] = useState<Record<Field | 'gantrySpan' | 'resolution', string>>({
    sideX: '',
    sideY: '',
    diagonal1: '',
    diagonal2: '',
    gantrySpan: '',
    resolution: '',
  });
  const [note, setNote] = useState('');
  const [errors, setErrors] = useState<Partial<Record<Field | 'gantrySpan' | 'resolution', string>>>({});
  const create = useCreateDiagonalCheck(machineId);
  const u = UNIT_LABELS[unit];

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const found: typeof errors = {};
    const parsed = {} as Record<Field, number>;
    for (const [key, label] of FIELDS) {
      const v = parseNumber(values[key]);
      if (v === null || v <= 0) found[key] = `${label} must be a length greater than zero`;
      else parsed[key] = v;
    }
    const span = parseNumber(values.gantrySpan);
    if (values.gantrySpan.trim() && (span === null || span <= 0))
      found.gantrySpan = 'Gantry span must be greater than zero, or left empty';
    const resolution = parseNumber(values.resolution);
    if (values.resolution.trim() && (resolution === null || resolution <= 0))
      found.resolution = 'Resolution must be greater than zero, or left empty';
    setErrors(found);
    if (Object.keys(found).length) return;
    create.record(
      {
        ...parsed,
        gantrySpan: span ?? undefined,
        resolution: resolution ?? undefined,
        lengthUnit: unit,
        note: note.trim() || undefined,
      },
      {
        onRecorded: onSaved,
        // Waiting for the connection: the lengths go with it (shown as waiting); the span and resolution stay for the next check.
        onQueued: () => {
          setValues((v) => ({ ...v, sideX: '', sideY: '', diagonal1: '', diagonal2: '' }));
          setNote('');
        },
      },
    );
  };

  const set = (key: Field | 'gantrySpan' | 'resolution') => (e: { target: { value: string } }) =>
    setValues((v) => ({ ...v, [key]: e.target.value }));
  return (
    <Box component="form" onSubmit={submit} noValidate aria-label="Diagonal check">
      <Stack spacing={1.5}>
        {create.error && <Alert severity="error">{(create.error as Error).message}</Alert>}
        <WaitingEntries path={`/machines/${machineId}/diagonal-checks`} />
        <Box sx={{ display: 'grid', gap: 1.5, gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' } }}>
          <UnitFamilySelect family="length" value={unit} onChange={setUnit} />
          <NumberField
            label="Gantry span"
            unit={u}
            value={values.gantrySpan}
            onChange={set('gantrySpan')}
            error={!!errors.gantrySpan}
            helperText={errors.gantrySpan ?? 'Between the two drives; the X side when empty'}
          />
          {FIELDS.map(([key, label, help]) => (
            <NumberField
              key={key}
              label={label}
              unit={u}
              value={values[key]}
              onChange={set(key)}
              error={!!errors[key]}
              helperText={errors[key] ?? help}
              required
            />
          ))}
          <NumberField
            label="Read to"
            unit={u}
            value={values.resolution}
            onChange={set('resolution')}
            error={!!errors.resolution}
            helperText={errors.resolution ?? 'Smallest step of the tape or rule (a tape: about 1/32 in)'}
          />
        </Box>
        <TextField
          label="Note"
          value={note}
          onChange={(e) => setNote(e.target.value)}
          placeholder="How the rectangle was marked and read"
        />
        <Box>
          <Button type="submit" variant="contained" disabled={create.busy}>
            {create.busy ? 'Working it out…' : 'Record diagonal check'}
          </Button>
        </Box>
      </Stack>
    </Box>
  );
}
