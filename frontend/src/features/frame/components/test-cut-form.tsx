import { useState, type FormEvent } from 'react';
import { Alert, Box, Button, MenuItem, Stack, TextField, Typography } from '@mui/material';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { useCreateTestCut } from '../api/create-test-cut';
import { WaitingEntries } from '../../../components/offline/waiting-entries';
import type { TestCut } from '../types';
import { NumberField, parseNumber } from './number-field';
import { UnitFamilySelect } from '../../../components/form/unit-select';

const NOMINAL = [
  ['nx', 'Programmed X'],
  ['ny', 'Programmed Y'],
  ['nc', 'Circle ⌀'],
] as const;
const MEASURED = [
  ['mx', 'Measured X'],
  ['my', 'Measured Y'],
  ['d1', 'Diagonal 1'],
  ['d2', 'Diagonal 2'],
  ['cx', 'Circle ⌀ along X'],
  ['cy', 'Circle ⌀ along Y'],
] as const;
type Key = (typeof NOMINAL)[number][0] | (typeof MEASURED)[number][0];

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
  const [unit, setUnit] = useState<LengthUnit>('mm');
  const [v, setV] = useState<Record<Key | 'kerf' | 'sx' | 'sy' | 'plate' | 'res', string>>({
    nx: '',
    ny: '',
    nc: '',
    mx: '',
    my: '',
    d1: '',
    d2: '',
    cx: '',
    cy: '',
    kerf: '',
    sx: '',
    sy: '',
    plate: '',
    res: '',
  });
  const [circleKind, setCircleKind] = useState<'hole' | 'disc'>('hole');
  const [note, setNote] = useState('');
  const [errors, setErrors] = useState<Partial<Record<string, string>>>({});
  const create = useCreateTestCut(machineId);
  const u = UNIT_LABELS[unit];
  const set = (k: keyof typeof v) => (e: { target: { value: string } }) =>
    setV((old) => ({ ...old, [k]: e.target.value }));

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const found: Record<string, string> = {};
    const n = {} as Record<Key, number>;
    for (const [k, label] of [...NOMINAL, ...MEASURED]) {
      const x = parseNumber(v[k]);
      if (x === null || x <= 0) found[k] = `${label} must be a length greater than zero`;
      else n[k] = x;
    }
    const optional = (k: 'kerf' | 'sx' | 'sy' | 'plate' | 'res', label: string, allowZero: boolean) => {
      if (!v[k].trim()) return undefined;
      const x = parseNumber(v[k]);
      if (x === null || x < 0 || (!allowZero && x === 0))
        found[k] = `${label} must be ${allowZero ? 'zero or more' : 'greater than zero'}, or left empty`;
      return x ?? undefined;
    };
    const kerf = optional('kerf', 'Kerf', true);
    const sx = optional('sx', 'Steps per mm X', false);
    const sy = optional('sy', 'Steps per mm Y', false);
    const plateThickness = optional('plate', 'Plate thickness', false);
    const resolution = optional('res', 'Resolution', false);
    setErrors(found);
    if (Object.keys(found).length) return;
    create.record(
      {
        lengthUnit: unit,
        plateThickness,
        resolution,
        nominal: { x: n.nx, y: n.ny, circle: n.nc },
        measured: { x: n.mx, y: n.my, diagonal1: n.d1, diagonal2: n.d2, circleX: n.cx, circleY: n.cy, kerf },
        circleKind,
        stepsPerMm: sx || sy ? { x: sx, y: sy } : undefined,
        note: note.trim() || undefined,
      },
      // Waiting for the connection: the sizes measured go with it (shown as waiting); the nominal ones stay for the next cut.
      {
        onRecorded: onSaved,
        onQueued: () => setV((old) => ({ ...old, mx: '', my: '', d1: '', d2: '', cx: '', cy: '', kerf: '' })),
      },
    );
  };

  const field = ([k, label]: readonly [Key, string]) => (
    <NumberField
      key={k}
      label={label}
      unit={u}
      value={v[k]}
      onChange={set(k)}
      error={!!errors[k]}
      helperText={errors[k]}
      required
    />
  );
  const grid = { display: 'grid', gap: 1.5, gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' } };
  return (
    <Box component="form" onSubmit={submit} noValidate aria-label="Test cut">
      <Stack spacing={1.5}>
        {create.error && <Alert severity="error">{(create.error as Error).message}</Alert>}
        <WaitingEntries path={`/machines/${machineId}/test-cuts`} />
        <Box sx={grid}>
          <UnitFamilySelect family="length" value={unit} onChange={setUnit} />
          <TextField
            select
            label="The circle is"
            value={circleKind}
            onChange={(e) => setCircleKind(e.target.value as 'hole' | 'disc')}
          >
            <MenuItem value="hole">a hole in the square</MenuItem>
            <MenuItem value="disc">a disc cut on its own</MenuItem>
          </TextField>
        </Box>
        <Typography variant="h5" component="h4">
          As programmed
        </Typography>
        <Box sx={grid}>{NOMINAL.map(field)}</Box>
        <Typography variant="h5" component="h4">
          As measured
        </Typography>
        <Box sx={grid}>
          {MEASURED.map(field)}
          <NumberField
            label="Plate thickness"
            unit={u}
            value={v.plate}
            onChange={set('plate')}
            error={!!errors.plate}
            helperText={
              errors.plate ??
              (machineKind === 'plasma'
                ? 'With each part size it picks the ISO 9013 tolerance band'
                : 'Material thickness, for the record')
            }
          />
          <NumberField
            label="Read to"
            unit={u}
            value={v.res}
            onChange={set('res')}
            error={!!errors.res}
            helperText={errors.res ?? 'Smallest step of the caliper or rule'}
          />
          <NumberField
            label="Kerf"
            unit={u}
            value={v.kerf}
            onChange={set('kerf')}
            error={!!errors.kerf}
            helperText={errors.kerf ?? 'Width the controller did not compensate; empty when compensation was on'}
          />
        </Box>
        <Typography variant="h5" component="h4">
          Steps per mm when cut (optional)
        </Typography>
        <Box sx={grid}>
          <NumberField
            label="Steps/mm X"
            unit="steps/mm"
            slotProps={{ inputLabel: { shrink: true } }}
            value={v.sx}
            onChange={set('sx')}
            error={!!errors.sx}
            helperText={errors.sx}
          />
          <NumberField
            label="Steps/mm Y"
            unit="steps/mm"
            slotProps={{ inputLabel: { shrink: true } }}
            value={v.sy}
            onChange={set('sy')}
            error={!!errors.sy}
            helperText={errors.sy}
          />
        </Box>
        <TextField
          label="Note"
          value={note}
          onChange={(e) => setNote(e.target.value)}
          placeholder="Material, thickness, current, speed"
        />
        <Box>
          <Button type="submit" variant="contained" disabled={create.busy}>
            {create.busy ? 'Working it out…' : 'Record test cut'}
          </Button>
        </Box>
      </Stack>
    </Box>
  );
}
