import { useState } from 'react';
import {
  Alert,
  Box,
  Button,
  Checkbox,
  FormControlLabel,
  IconButton,
  Paper,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  TextField,
  Typography,
} from '@mui/material';
import AddOutlined from '@mui/icons-material/AddOutlined';
import DeleteOutline from '@mui/icons-material/DeleteOutlined';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { travelTrialsPath, useRecordTravelTrial } from '../api/record-travel-trial';
import { removeButtonProps, useUndoRemove } from './undo-remove';
import { WaitingEntries } from '../../../components/offline/waiting-entries';
import type { Axis, TravelTrial } from '../types';
import { errorText } from '../utils/format';
import { splitRows } from '../utils/parse-grid';
import { NumberInput, numberOf } from './number-input';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { blankConditions, ConditionsFields, conditionsOf } from './conditions-fields';

interface Row {
  /** Stable across removals, so a focused cell or button never slides onto another move. */
  id: number;
  commanded: string;
  measured: string;
}

let nextRowId = 0;
const blankRow = (): Row => ({ id: ++nextRowId, commanded: '', measured: '' });
const blankRows = (): Row[] => [blankRow(), blankRow(), blankRow()];

/**
 * Commanded-versus-measured moves: a small table. Enter goes to the next move's commanded cell
 * (adding a move after the last), Tab visits only the cells, a removed move can be put back, and
 * a pasted block fills the table.
 */
export function TravelTrialEntry({ axis, onRecorded }: { axis: Axis; onRecorded: (t: TravelTrial) => void }) {
  const [unit, setUnit] = useState<LengthUnit>(axis.lengthUnit);
  const [readingUnit, setReadingUnit] = useState<LengthUnit>(axis.lengthUnit === 'in' ? 'thou' : 'mm');
  const [conditions, setConditions] = useState(blankConditions);
  const [rows, setRows] = useState<Row[]>(blankRows);
  const [steps, setSteps] = useState(String(axis.stepsPerMm));
  const [throughOrigin, setThroughOrigin] = useState(false);
  const [notes, setNotes] = useState('');
  const record = useRecordTravelTrial(axis.id, axis.name);
  const undo = useUndoRemove();
  // After a correction is applied the next (confirming) trial runs at the new value.
  const [stepsFor, setStepsFor] = useState(axis.stepsPerMm);
  if (axis.stepsPerMm !== stepsFor) {
    setStepsFor(axis.stepsPerMm);
    setSteps(String(axis.stepsPerMm));
  }

  const filled = rows.filter((r) => r.commanded.trim() !== '' || r.measured.trim() !== '');
  const stepsOk = numberOf(steps) !== undefined && Number(steps) > 0;
  const complete =
    stepsOk &&
    filled.length > 0 &&
    filled.every((r) => numberOf(r.commanded) !== undefined && numberOf(r.measured) !== undefined);
  const setCell = (i: number, k: 'commanded' | 'measured', v: string) =>
    setRows((rs) => rs.map((r, j) => (j === i ? { ...r, [k]: v } : r)));

  const onPaste = (i: number, k: 'commanded' | 'measured') => (e: React.ClipboardEvent) => {
    const text = e.clipboardData.getData('text');
    if (!/[\t\n]/.test(text.trim())) return;
    e.preventDefault();
    const block = splitRows(text);
    setRows((rs) => {
      const next = [...rs];
      block.forEach((cells, r) => {
        const at = i + r;
        while (next.length <= at) next.push(blankRow());
        if (k === 'commanded')
          next[at] = { id: next[at].id, commanded: cells[0] ?? '', measured: cells[1] ?? next[at].measured };
        else next[at] = { ...next[at], measured: cells[0] ?? '' };
      });
      return next;
    });
  };

  const focusRow = (i: number) =>
    setTimeout(() =>
      document.querySelector<HTMLInputElement>(`[data-trial-cell="${Math.max(0, i)}-commanded"]`)?.focus(),
    );
  // Enter reads along a move and on to the next: the next move's first cell, a new move after the last.
  const onKeyDown = (i: number) => (e: React.KeyboardEvent) => {
    if (e.key !== 'Enter') return;
    e.preventDefault();
    const nextRow = e.shiftKey ? i - 1 : i + 1;
    if (nextRow >= rows.length) setRows((rs) => [...rs, blankRow()]);
    focusRow(nextRow);
  };
  const remove = (i: number) => {
    const row = rows[i];
    setRows((rs) => (rs.length > 1 ? rs.filter((r) => r.id !== row.id) : [blankRow()]));
    const onlyRow = rows.length === 1;
    undo.removed(`move ${i + 1}`, () =>
      setRows((rs) => {
        if (rs.some((r) => r.id === row.id)) return rs;
        // The blank move that stood in for the only one removed gives way to it again.
        const rest = onlyRow && rs.length === 1 && !rs[0].commanded && !rs[0].measured ? [] : rs;
        return [...rest.slice(0, i), row, ...rest.slice(i)];
      }),
    );
    focusRow(Math.min(i, rows.length - 2));
  };

  const clear = () => {
    setRows(blankRows());
    setNotes('');
  };
  const submit = () =>
    record.record(
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
        onQueued: clear,
        onRecorded: (t) => {
          clear();
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
        Command moves from a fixed start and measure each one (rule, tape, calipers or indicator), commanded and
        measured in the same unit. The longer the moves, the better the correction.
      </Typography>
      <Stack spacing={2}>
        {record.error && <Alert severity="error">{errorText(record.error)}</Alert>}
        <WaitingEntries path={travelTrialsPath(axis.id)} />
        <Box sx={{ display: 'flex', gap: 2, flexWrap: 'wrap', alignItems: 'flex-start' }}>
          <UnitFamilySelect family="length" label="Moves in" value={unit} onChange={setUnit} units={['mm', 'in']} />
          <UnitFamilySelect family="reading" label="Errors shown in" value={readingUnit} onChange={setReadingUnit} />
          <NumberInput
            label="Steps per mm while measured"
            unit="steps/mm"
            value={steps}
            onChange={setSteps}
            sx={{ width: 260 }}
          />
          <FormControlLabel
            control={<Checkbox checked={throughOrigin} onChange={(e) => setThroughOrigin(e.target.checked)} />}
            label="Measured from a zeroed start (fit through zero)"
          />
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
                <TableRow key={r.id}>
                  <TableCell>{i + 1}</TableCell>
                  {(['commanded', 'measured'] as const).map((k) => (
                    <TableCell key={k}>
                      <TextField
                        value={r[k]}
                        onChange={(e) => setCell(i, k, e.target.value.replace(',', '.'))}
                        onPaste={onPaste(i, k)}
                        onKeyDown={onKeyDown(i)}
                        error={r[k].trim() !== '' && numberOf(r[k]) === undefined}
                        slotProps={{
                          htmlInput: {
                            inputMode: 'decimal',
                            'data-trial-cell': `${i}-${k}`,
                            'aria-label': `${k === 'commanded' ? 'Commanded' : 'Measured'} move ${i + 1}`,
                          },
                        }}
                        fullWidth
                      />
                    </TableCell>
                  ))}
                  <TableCell>
                    <IconButton
                      aria-label={`Remove move ${i + 1}`}
                      size="small"
                      {...removeButtonProps}
                      onClick={() => remove(i)}
                    >
                      <DeleteOutline fontSize="small" />
                    </IconButton>
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </Box>
        <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}>
          <Button startIcon={<AddOutlined />} onClick={() => setRows((rs) => [...rs, blankRow()])}>
            Add a move
          </Button>
          <Typography variant="body2" color="text.secondary" sx={{ alignSelf: 'center' }}>
            Enter goes to the next move (a new one after the last); paste two columns from a spreadsheet into the first
            cell.
          </Typography>
        </Box>
        <ConditionsFields draft={conditions} onChange={setConditions} readingUnit={readingUnit} />
        <TextField
          label="Notes (instrument, where it was read)"
          value={notes}
          onChange={(e) => setNotes(e.target.value)}
        />
        <Box>
          <Button variant="contained" onClick={submit} disabled={!complete || record.busy}>
            Record trial
          </Button>
        </Box>
      </Stack>
      {undo.snackbar}
    </Paper>
  );
}
