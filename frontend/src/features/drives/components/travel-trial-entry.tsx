import { useEffect, useState } from 'react';
import { Alert, Box, Button, Checkbox, FormControlLabel, IconButton, Paper, Stack, Table, TableBody, TableCell, TableHead, TableRow, TextField, Typography } from '@mui/material';
import AddOutlined from '@mui/icons-material/AddOutlined';
import DeleteOutline from '@mui/icons-material/DeleteOutlined';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { useRecordTravelTrial } from '../api/record-travel-trial';
import type { Axis, TravelTrial } from '../types';
import { errorText } from '../utils/format';
import { splitRows } from '../utils/parse-grid';
import { NumberInput, numberOf } from './number-input';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { blankConditions, ConditionsFields, conditionsOf } from './conditions-fields';

interface Row {
  commanded: string;
  measured: string;
}

const blankRows = (): Row[] => [{ commanded: '', measured: '' }, { commanded: '', measured: '' }, { commanded: '', measured: '' }];

/** Commanded-versus-measured moves: a small table, Enter moves down, a pasted block fills the table. */
export function TravelTrialEntry({ axis, onRecorded }: { axis: Axis; onRecorded: (t: TravelTrial) => void }) {
  const [unit, setUnit] = useState<LengthUnit>(axis.lengthUnit);
  const [readingUnit, setReadingUnit] = useState<LengthUnit>(axis.lengthUnit === 'in' ? 'thou' : 'mm');
  const [conditions, setConditions] = useState(blankConditions);
  const [rows, setRows] = useState<Row[]>(blankRows);
  const [steps, setSteps] = useState(String(axis.stepsPerMm));
  const [throughOrigin, setThroughOrigin] = useState(false);
  const [notes, setNotes] = useState('');
  const record = useRecordTravelTrial(axis.id);
  // After a correction is applied the next (confirming) trial runs at the new value.
  useEffect(() => setSteps(String(axis.stepsPerMm)), [axis.stepsPerMm]);

  const filled = rows.filter((r) => r.commanded.trim() !== '' || r.measured.trim() !== '');
  const stepsOk = numberOf(steps) !== undefined && Number(steps) > 0;
  const complete = stepsOk && filled.length > 0 && filled.every((r) => numberOf(r.commanded) !== undefined && numberOf(r.measured) !== undefined);
  const setCell = (i: number, k: keyof Row, v: string) => setRows((rs) => rs.map((r, j) => (j === i ? { ...r, [k]: v } : r)));

  const onPaste = (i: number, k: keyof Row) => (e: React.ClipboardEvent) => {
    const text = e.clipboardData.getData('text');
    if (!/[\t\n]/.test(text.trim())) return;
    e.preventDefault();
    const block = splitRows(text);
    setRows((rs) => {
      const next = [...rs];
      block.forEach((cells, r) => {
        const at = i + r;
        while (next.length <= at) next.push({ commanded: '', measured: '' });
        if (k === 'commanded') next[at] = { commanded: cells[0] ?? '', measured: cells[1] ?? next[at].measured };
        else next[at] = { ...next[at], measured: cells[0] ?? '' };
      });
      return next;
    });
  };

  const onKeyDown = (i: number, k: keyof Row) => (e: React.KeyboardEvent) => {
    if (e.key !== 'Enter') return;
    e.preventDefault();
    const nextRow = e.shiftKey ? i - 1 : i + 1;
    if (nextRow >= rows.length) setRows((rs) => [...rs, { commanded: '', measured: '' }]);
    setTimeout(() => document.querySelector<HTMLInputElement>(`[data-trial-cell="${Math.max(0, nextRow)}-${k}"]`)?.focus());
  };

  const submit = () =>
    record.mutate(
      {
        lengthUnit: unit,
        readingUnit,
        ...conditionsOf(conditions),
        stepsPerMmUsed: numberOf(steps),
        moves: filled.map((r) => ({ commanded: Number(r.commanded), measured: Number(r.measured) })),
        throughOrigin: throughOrigin || undefined,
        notes: notes.trim() || undefined,
      },
      {
        onSuccess: (t) => {
          setRows(blankRows());
          setNotes('');
          onRecorded(t);
        },
      },
    );

  return (
    <Paper sx={{ p: 2.5 }}>
      <Typography variant="h4" component="h3" gutterBottom>
        Record a travel trial
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        Command moves from a fixed start and measure each one (rule, tape, calipers or indicator), commanded and measured in the same unit. The longer the moves, the better the correction.
      </Typography>
      <Stack spacing={2}>
        {record.error && <Alert severity="error">{errorText(record.error)}</Alert>}
        <Box sx={{ display: 'flex', gap: 2, flexWrap: 'wrap', alignItems: 'flex-start' }}>
          <UnitFamilySelect family="length" label="Moves in" value={unit} onChange={setUnit} units={['mm', 'in']} />
          <UnitFamilySelect family="reading" label="Errors shown in" value={readingUnit} onChange={setReadingUnit} />
          <NumberInput label="Steps per mm while measured" unit="steps/mm" value={steps} onChange={setSteps} sx={{ width: 260 }} />
          <FormControlLabel control={<Checkbox checked={throughOrigin} onChange={(e) => setThroughOrigin(e.target.checked)} />} label="Measured from a zeroed start (fit through zero)" />
        </Box>
        <Box sx={{ overflowX: 'auto' }}>
          <Table size="small" aria-label="Travel trial moves" sx={{ maxWidth: 560 }}>
            <TableHead>
              <TableRow>
                <TableCell sx={{ width: 40 }}>#</TableCell>
                <TableCell>Commanded ({UNIT_LABELS[unit]})</TableCell>
                <TableCell>Measured ({UNIT_LABELS[unit]})</TableCell>
                <TableCell sx={{ width: 48 }} />
              </TableRow>
            </TableHead>
            <TableBody>
              {rows.map((r, i) => (
                <TableRow key={i}>
                  <TableCell>{i + 1}</TableCell>
                  {(['commanded', 'measured'] as const).map((k) => (
                    <TableCell key={k}>
                      <TextField
                        value={r[k]}
                        onChange={(e) => setCell(i, k, e.target.value.replace(',', '.'))}
                        onPaste={onPaste(i, k)}
                        onKeyDown={onKeyDown(i, k)}
                        error={r[k].trim() !== '' && numberOf(r[k]) === undefined}
                        slotProps={{ htmlInput: { inputMode: 'decimal', 'data-trial-cell': `${i}-${k}`, 'aria-label': `${k === 'commanded' ? 'Commanded' : 'Measured'} move ${i + 1}` } }}
                        fullWidth
                      />
                    </TableCell>
                  ))}
                  <TableCell>
                    <IconButton aria-label={`Remove move ${i + 1}`} size="small" onClick={() => setRows((rs) => (rs.length > 1 ? rs.filter((_, j) => j !== i) : blankRows()))}>
                      <DeleteOutline fontSize="small" />
                    </IconButton>
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </Box>
        <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}>
          <Button startIcon={<AddOutlined />} onClick={() => setRows((rs) => [...rs, { commanded: '', measured: '' }])}>
            Add a move
          </Button>
          <Typography variant="body2" color="text.secondary" sx={{ alignSelf: 'center' }}>
            Enter goes to the next row; paste two columns from a spreadsheet into the first cell.
          </Typography>
        </Box>
 <ConditionsFields draft={conditions} onChange={setConditions} readingUnit={readingUnit} />
        <TextField label="Notes (instrument, where it was read)" value={notes} onChange={(e) => setNotes(e.target.value)} />
        <Box>
          <Button variant="contained" onClick={submit} disabled={!complete || record.isPending}>
            Record trial
          </Button>
        </Box>
      </Stack>
    </Paper>
  );
}
