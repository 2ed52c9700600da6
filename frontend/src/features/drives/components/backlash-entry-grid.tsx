import { useRef, useState, type KeyboardEvent } from 'react';
import { Alert, Box, Button, MenuItem, Paper, Stack, TextField, Typography } from '@mui/material';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { fromMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { useRecordCheck } from '../../../lib/check-records/use-record-check';
import { removeButtonProps, useUndoRemove } from './undo-remove';
import { WaitingEntries } from '../../../components/offline/waiting-entries';
import type { BacklashCheck } from '../backlash-types';
import { driveKeys, type Axis } from '../types';
import { errorText } from '../utils/format';
import { numberOf } from './number-input';

const cellSx = { width: 84, '& input': { textAlign: 'right', py: 0.75, px: 1 } };
const APPROACH_CHOICES = [3, 4, 5, 6, 8, 10];

/** Near the start, the middle and near the end of the measured travel, in the unit picked. */
function startPositions(axis: Axis, unit: LengthUnit): string[] {
  if (!axis.measuredTravelMm) return ['', '', ''];
  const step = unit === 'in' ? 0.1 : unit === 'thou' ? 100 : unit === 'um' ? 1000 : 1;
  return [0.05, 0.5, 0.95].map((f) =>
    String(+(Math.round(fromMm(axis.measuredTravelMm! * f, unit) / step) * step).toFixed(4)),
  );
}

const axisUnit = (axis: Axis): LengthUnit => axis.lengthUnit ?? 'mm';

/**
 * Backlash entry: one row per position (both ends and the middle), the readings approached moving
 * up and moving down across. Tab moves along a row (never onto a remove button); Enter moves to
 * the next row's first cell, adding a position after the last, and never clears or sends anything.
 * A removed position can be put back.
 */
export function BacklashEntryGrid({ axis, onRecorded }: { axis: Axis; onRecorded: (c: BacklashCheck) => void }) {
  const [lengthUnit, setLengthUnit] = useState<LengthUnit>(() => axisUnit(axis));
  const [readingUnit, setReadingUnit] = useState<LengthUnit>('mm');
  const [approaches, setApproaches] = useState(3);
  const [positions, setPositions] = useState<string[]>(() => startPositions(axis, axisUnit(axis)));
  const [cells, setCells] = useState<string[][]>(() => [0, 1, 2].map(() => Array(6).fill('')));
  const [resolution, setResolution] = useState('');
  const [notes, setNotes] = useState('');
  const grid = useRef<HTMLTableElement>(null);
  const record = useRecordCheck('/api/axes/{id}/backlash-checks', axis.id, {
    label: (input) => `Backlash check of axis ${axis.name} (${input.positions.length} positions)`,
    refresh: [driveKeys.all],
  });
  const undo = useUndoRemove();
  const width = approaches * 2;

  const setCell = (r: number, c: number, v: string) =>
    setCells((old) => old.map((row, i) => (i === r ? row.map((x, j) => (j === c ? v.replace(',', '.') : x)) : row)));
  // A side can narrow only down to its last typed reading: changing the count never drops one.
  const typedWidth = Math.max(
    0,
    ...cells.flatMap((row) =>
      [row.slice(0, row.length / 2), row.slice(row.length / 2)].map((side) =>
        side.reduce((last, v, i) => (v.trim() !== '' ? i + 1 : last), 0),
      ),
    ),
  );
  const changeApproaches = (n: number) => {
    if (n < typedWidth) return;
    setApproaches(n);
    const fit = (side: string[]) => [...side, ...Array(Math.max(0, n - side.length)).fill('')].slice(0, n);
    setCells((old) => old.map((row) => [...fit(row.slice(0, row.length / 2)), ...fit(row.slice(row.length / 2))]));
  };
  const addRow = () => {
    setPositions((p) => [...p, '']);
    setCells((c) => [...c, Array(width).fill('')]);
  };
  const focusRow = (r: number) =>
    setTimeout(() => {
      const next = grid.current?.querySelector<HTMLInputElement>(`input[data-backlash-cell="${r}-0"]`);
      next?.focus();
      next?.select();
    });
  const removeRow = (r: number) => {
    const position = positions[r];
    const row = cells[r];
    setPositions((p) => p.filter((_, i) => i !== r));
    setCells((c) => c.filter((_, i) => i !== r));
    undo.removed(`position ${r + 1}${position.trim() ? ` (${position} ${UNIT_LABELS[lengthUnit]})` : ''}`, () => {
      setPositions((p) => [...p.slice(0, r), position, ...p.slice(r)]);
      // Readings keep their side if the approach count changed meanwhile.
      setCells((c) => {
        const half = (c[0]?.length ?? row.length) / 2;
        const fit = (side: string[]) => [...side, ...Array(Math.max(0, half - side.length)).fill('')].slice(0, half);
        const back = [...fit(row.slice(0, row.length / 2)), ...fit(row.slice(row.length / 2))];
        return [...c.slice(0, r), back, ...c.slice(r)];
      });
    });
    focusRow(Math.min(r, positions.length - 2));
  };
  const onKey = (e: KeyboardEvent<HTMLInputElement>, r: number) => {
    if (e.key !== 'Enter') return;
    e.preventDefault();
    if (e.shiftKey) return r > 0 ? focusRow(r - 1) : undefined;
    if (r + 1 >= positions.length) addRow();
    focusRow(r + 1);
  };

  const rowWidth = (row: string[]) => row.length / 2;
  const values = cells.map((row) => ({
    up: row
      .slice(0, rowWidth(row))
      .filter((v) => v.trim() !== '')
      .map(Number),
    down: row
      .slice(rowWidth(row))
      .filter((v) => v.trim() !== '')
      .map(Number),
  }));
  const complete =
    positions.every((p) => numberOf(p) !== undefined) &&
    values.every((v) => v.up.length >= 3 && v.down.length >= 3 && [...v.up, ...v.down].every(Number.isFinite));
  const clear = () => {
    setCells((c) => c.map((row) => row.map(() => '')));
    setNotes('');
  };
  const submit = () =>
    record.record(
      {
        lengthUnit,
        readingUnit,
        positions: positions.map((p, i) => ({ position: Number(p), up: values[i].up, down: values[i].down })),
        ...(numberOf(resolution) !== undefined ? { resolution: numberOf(resolution) } : {}),
        ...(notes.trim() ? { notes: notes.trim() } : {}),
      },
      // Recorded: the readings stay, to be corrected and recorded again if need be. Waiting for the
      // connection: they go with the entry (shown as waiting) and the grid is free for the next check.
      { onQueued: clear, onRecorded },
    );

  const ru = UNIT_LABELS[readingUnit];
  const lu = UNIT_LABELS[lengthUnit];
  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Typography variant="body2" color="text.secondary">
          Hold the indicator against the moving part. At each position bring the axis to the same coordinate{' '}
          {approaches} times moving up (from below) and {approaches} times moving down (from above), reading the
          indicator each time. Read near both ends and in the middle of the travel. Keep clear of the gantry while it
          moves.
        </Typography>
        <Box sx={{ display: 'flex', gap: 2, flexWrap: 'wrap', alignItems: 'center' }}>
          <UnitFamilySelect family="length" label="Positions in" value={lengthUnit} onChange={setLengthUnit} />
          <UnitFamilySelect family="reading" label="Readings in" value={readingUnit} onChange={setReadingUnit} />
          <TextField
            select
            label="Approaches each way"
            value={approaches}
            onChange={(e) => changeApproaches(Number(e.target.value))}
            sx={{ minWidth: 170 }}
          >
            {APPROACH_CHOICES.map((n) => (
              <MenuItem key={n} value={n} disabled={n < typedWidth}>
                {n}
              </MenuItem>
            ))}
          </TextField>
          <TextField
            label="Indicator resolution"
            value={resolution}
            onChange={(e) => setResolution(e.target.value.replace(',', '.'))}
            helperText={`Smallest step it reads, ${ru} (optional)`}
            sx={{ maxWidth: 200 }}
            slotProps={{ htmlInput: { inputMode: 'decimal' } }}
          />
        </Box>
        <Box sx={{ overflowX: 'auto' }}>
          <Box
            component="table"
            ref={grid}
            sx={{ borderCollapse: 'collapse', '& th, & td': { px: 0.5, py: 0.25, textAlign: 'center' } }}
            aria-label="Backlash readings"
          >
            <thead>
              <tr>
                <th scope="col">Position ({lu})</th>
                {Array.from({ length: approaches }, (_, i) => (
                  <th scope="col" key={`u${i}`}>
                    Up {i + 1} ({ru})
                  </th>
                ))}
                {Array.from({ length: approaches }, (_, i) => (
                  <th scope="col" key={`d${i}`}>
                    Down {i + 1} ({ru})
                  </th>
                ))}
                <th />
              </tr>
            </thead>
            <tbody>
              {positions.map((p, r) => (
                <tr key={r}>
                  <td>
                    <TextField
                      size="small"
                      sx={cellSx}
                      value={p}
                      onChange={(e) =>
                        setPositions((old) => old.map((x, i) => (i === r ? e.target.value.replace(',', '.') : x)))
                      }
                      slotProps={{
                        htmlInput: {
                          'aria-label': `Position ${r + 1}`,
                          'data-backlash-cell': `${r}-0`,
                          inputMode: 'decimal',
                          onKeyDown: (e: KeyboardEvent<HTMLInputElement>) => onKey(e, r),
                        },
                      }}
                    />
                  </td>
                  {cells[r].map((v, c) => {
                    const side = c < rowWidth(cells[r]) ? 'Up' : 'Down';
                    const n = side === 'Up' ? c + 1 : c - rowWidth(cells[r]) + 1;
                    return (
                      <td key={c}>
                        <TextField
                          size="small"
                          sx={cellSx}
                          value={v}
                          error={v.trim() !== '' && !Number.isFinite(Number(v))}
                          onChange={(e) => setCell(r, c, e.target.value)}
                          slotProps={{
                            htmlInput: {
                              'aria-label': `${side} ${n} at position ${r + 1}`,
                              'data-backlash-cell': `${r}-${c + 1}`,
                              inputMode: 'decimal',
                              onKeyDown: (e: KeyboardEvent<HTMLInputElement>) => onKey(e, r),
                            },
                          }}
                        />
                      </td>
                    );
                  })}
                  <td>
                    {positions.length > 3 && (
                      <Button
                        size="small"
                        {...removeButtonProps}
                        onClick={() => removeRow(r)}
                        aria-label={`Remove position ${r + 1}`}
                      >
                        Remove
                      </Button>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </Box>
        </Box>
        <Box>
          <Button size="small" onClick={addRow}>
            Add a position
          </Button>
        </Box>
        <TextField
          label="Notes"
          value={notes}
          onChange={(e) => setNotes(e.target.value)}
          multiline
          minRows={1}
          slotProps={{ htmlInput: { maxLength: 2000 } }}
        />
        {!complete && (
          <Typography variant="body2" color="text.secondary">
            Fill every position and at least 3 readings each way on every row to record the check.
          </Typography>
        )}
        {record.error && <Alert severity="error">{errorText(record.error)}</Alert>}
        <WaitingEntries path={record.path} />
        <Box>
          <Button variant="contained" onClick={submit} disabled={!complete || record.busy}>
            {record.busy ? 'Recording…' : 'Record backlash check'}
          </Button>
        </Box>
      </Stack>
      {undo.snackbar}
    </Paper>
  );
}
