import { useRef, useState, type ClipboardEvent, type FormEvent, type KeyboardEvent } from 'react';
import {
  Alert,
  Box,
  Button,
  InputBase,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  TextField,
  Typography,
} from '@mui/material';
import { IndicatorPanel } from '../../../components/indicator-input/indicator-panel';
import { useIndicatorInput } from '../../../components/indicator-input/use-indicator-input';
import { fromMm, toMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { useCreateBedGrid } from '../api/create-bed-grid';
import { WaitingEntries } from '../../../components/offline/waiting-entries';
import type { BedGrid } from '../types';
import { evenPositions } from '../utils/grid-labels';
import { NumberField, parseNumber } from './number-field';
import { pastedHeights } from '../utils/pasted-heights';

const MAX = 20;
const cellSx = {
  width: '100%',
  fontSize: 14,
  '& input': { textAlign: 'right', py: 0.75, px: 1 },
  border: '1px solid #d8d3c7',
  borderRadius: 1,
  bgcolor: '#fff',
};

const resize = <T,>(list: T[], n: number, fill: (i: number) => T) =>
  Array.from({ length: n }, (_, i) => list[i] ?? fill(i));

/**
 * Heights over the bed on a rows × columns grid. Enter moves to the next cell, the arrow keys move
 * between rows, and a block pasted from a spreadsheet fills the grid from the cell it lands in.
 */
export function BedGridEntry({
  machineId,
  workArea,
  onSaved,
}: {
  machineId: string;
  workArea: { x: number; y: number };
  onSaved: (g: BedGrid) => void;
}) {
  const [unit, setUnit] = useState<LengthUnit>('mm');
  const [lengthUnit, setLengthUnit] = useState<LengthUnit>('mm');
  const [resolution, setResolution] = useState('');
  const [rows, setRows] = useState(3);
  const [columns, setColumns] = useState(4);
  const [xs, setXs] = useState<string[]>(() => evenPositions(4, workArea.x).map(String));
  const [ys, setYs] = useState<string[]>(() => evenPositions(3, workArea.y).map(String));
  const lu = UNIT_LABELS[lengthUnit];
  // Even positions over the work area in the chosen position unit (whole mm, or 0.01 in).
  const spread = (n: number, lengthMm: number, u = lengthUnit) =>
    evenPositions(n, lengthMm).map((mm) => String(Number(fromMm(mm, u).toFixed(u === 'in' ? 2 : 0))));
  // Positions typed so far keep their place on the bed when the unit changes.
  const changeLengthUnit = (next: LengthUnit) => {
    const convert = (list: string[]) =>
      list.map((t) => {
        const v = parseNumber(t);
        return v === null
          ? t
          : String(Number(fromMm(toMm(v, lengthUnit), next).toFixed(next === 'in' ? 3 : next === 'mm' ? 1 : 0)));
      });
    setXs(convert);
    setYs(convert);
    setLengthUnit(next);
  };
  const [z, setZ] = useState<string[][]>(() => Array.from({ length: 3 }, () => Array(4).fill('')));
  const [problem, setProblem] = useState<string | null>(null);
  const [note, setNote] = useState('');
  const cells = useRef(new Map<string, HTMLInputElement>());
  const create = useCreateBedGrid(machineId);

  const setSize = (r: number, c: number) => {
    const nr = Math.max(1, Math.min(MAX, r || 1));
    const nc = Math.max(1, Math.min(MAX, c || 1));
    setRows(nr);
    setColumns(nc);
    if (nc !== columns) setXs(spread(nc, workArea.x));
    if (nr !== rows) setYs(spread(nr, workArea.y));
    setZ((old) => resize(old, nr, () => []).map((row) => resize(row, nc, () => '')));
  };

  const setHeight = (r: number, c: number, v: string) =>
    setZ((old) => old.map((row, i) => (i === r ? row.map((x, k) => (k === c ? v : x)) : row)));
  // An indicator's reading goes to the cell it was typed in, or else the first empty one, row by row (the Enter order).
  const indicator = useIndicatorInput({
    unit,
    place: (text, cell) => {
      const empty = Array.from({ length: rows * columns }, (_, k) => [Math.floor(k / columns), k % columns]).find(
        ([r, c]) => !z[r]?.[c]?.trim(),
      );
      const [r, c] = cell ? cell.split('-').map(Number) : (empty ?? [-1, -1]);
      if (r < 0) return null;
      setHeight(r, c, text);
      return {
        cell: `${r}-${c}`,
        label: `row ${r + 1}, column ${c + 1} (X ${xs[c]}, Y ${ys[r]} ${lu})`,
        undo: () => setHeight(r, c, ''),
      };
    },
  });

  const focus = (r: number, c: number) => cells.current.get(`${r}-${c}`)?.select();
  const onKey = (r: number, c: number) => (e: KeyboardEvent<HTMLInputElement>) => {
    const next = r * columns + c + 1;
    if (e.key === 'Enter') {
      e.preventDefault();
      if (next < rows * columns) focus(Math.floor(next / columns), next % columns);
    } else if (e.key === 'ArrowDown' && r + 1 < rows) {
      e.preventDefault();
      focus(r + 1, c);
    } else if (e.key === 'ArrowUp' && r > 0) {
      e.preventDefault();
      focus(r - 1, c);
    }
  };
  const onPaste = (r: number, c: number) => (e: ClipboardEvent<HTMLInputElement>) => {
    // A block from a spreadsheet fills the grid row by row from this cell, blank cells included.
    const values = pastedHeights(e.clipboardData.getData('text'));
    if (values.length < 2) return;
    e.preventDefault();
    setZ((old) => {
      const copy = old.map((row) => [...row]);
      values.forEach((v, k) => {
        const i = r * columns + c + k;
        if (i < rows * columns) copy[Math.floor(i / columns)][i % columns] = v;
      });
      return copy;
    });
  };

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const px = xs.map(parseNumber);
    const py = ys.map(parseNumber);
    const bad = px.findIndex((v) => v === null);
    if (bad >= 0) return setProblem(`X position of column ${bad + 1} must be a number of ${lu}`);
    const badY = py.findIndex((v) => v === null);
    if (badY >= 0) return setProblem(`Y position of row ${badY + 1} must be a number of ${lu}`);
    const res = parseNumber(resolution);
    if (resolution.trim() && (res === null || res <= 0))
      return setProblem('Gauge resolution must be greater than zero, or left empty');
    const points = [];
    for (let r = 0; r < rows; r++) {
      for (let c = 0; c < columns; c++) {
        const v = parseNumber(z[r][c] ?? '');
        if (v === null) {
          focus(r, c);
          return setProblem(`Height at row ${r + 1}, column ${c + 1} is missing or not a number`);
        }
        points.push({ x: px[c]!, y: py[r]!, z: v });
      }
    }
    setProblem(null);
    create.record(
      {
        lengthUnit,
        readingUnit: unit,
        resolution: res ?? undefined,
        rows,
        columns,
        points,
        note: note.trim() || undefined,
      },
      {
        onRecorded: onSaved,
        // Waiting for the connection: the heights go with it (shown as waiting); the grid's shape stays for the next one.
        onQueued: () => {
          setZ((old) => old.map((row) => row.map(() => '')));
          setNote('');
        },
      },
    );
  };

  return (
    <Box
      ref={indicator.containerRef}
      component="form"
      onSubmit={submit}
      noValidate
      aria-label="Bed grid"
      sx={{ minWidth: 0 }}
    >
      <Stack spacing={1.5}>
        <Box sx={{ display: 'flex', gap: 1.5, flexWrap: 'wrap' }}>
          <TextField
            label="Rows"
            type="number"
            value={rows}
            onChange={(e) => setSize(Number(e.target.value), columns)}
            slotProps={{ htmlInput: { min: 1, max: MAX } }}
            sx={{ width: 96 }}
          />
          <TextField
            label="Columns"
            type="number"
            value={columns}
            onChange={(e) => setSize(rows, Number(e.target.value))}
            slotProps={{ htmlInput: { min: 1, max: MAX } }}
            sx={{ width: 96 }}
          />
          <UnitFamilySelect family="length" label="Position unit" value={lengthUnit} onChange={changeLengthUnit} />
          <UnitFamilySelect family="reading" label="Height unit" value={unit} onChange={setUnit} />
          <NumberField
            label="Gauge reads to"
            unit={UNIT_LABELS[unit]}
            value={resolution}
            onChange={(e) => setResolution(e.target.value)}
            sx={{ width: 170 }}
            slotProps={{ inputLabel: { shrink: true } }}
            placeholder="optional"
          />
        </Box>
        <Typography variant="body2" color="text.secondary">
          Positions in {lu}; heights in {UNIT_LABELS[unit]}, read from a gauge or indicator carried by the gantry (in
          the torch or spindle holder), any zero. Enter moves on, ↑ ↓ move between rows, a pasted block fills the grid.
        </Typography>
        <IndicatorPanel indicator={indicator} />
        <TableContainer sx={{ maxWidth: '100%' }}>
          <Table
            size="small"
            aria-label="Bed grid heights"
            sx={{ '& td, & th': { px: 0.5, py: 0.5, borderBottom: 0 } }}
          >
            <TableHead>
              <TableRow>
                <TableCell sx={{ minWidth: 92 }}>
                  <Typography variant="caption" color="text.secondary">
                    Y ↓ · X →
                  </Typography>
                </TableCell>
                {xs.map((x, c) => (
                  <TableCell key={c} sx={{ minWidth: 72 }}>
                    <InputBase
                      value={x}
                      onChange={(e) => setXs((v) => v.map((old, i) => (i === c ? e.target.value : old)))}
                      inputProps={{ 'aria-label': `X position of column ${c + 1} (${lu})`, inputMode: 'decimal' }}
                      sx={{ ...cellSx, bgcolor: '#f1eee6' }}
                    />
                  </TableCell>
                ))}
              </TableRow>
            </TableHead>
            <TableBody>
              {ys.map((y, r) => (
                <TableRow key={r}>
                  <TableCell>
                    <InputBase
                      value={y}
                      onChange={(e) => setYs((v) => v.map((old, i) => (i === r ? e.target.value : old)))}
                      inputProps={{ 'aria-label': `Y position of row ${r + 1} (${lu})`, inputMode: 'decimal' }}
                      sx={{ ...cellSx, bgcolor: '#f1eee6' }}
                    />
                  </TableCell>
                  {xs.map((_, c) => (
                    <TableCell key={c}>
                      <InputBase
                        value={z[r]?.[c] ?? ''}
                        onChange={(e) => setHeight(r, c, e.target.value)}
                        onKeyDown={onKey(r, c)}
                        onPaste={onPaste(r, c)}
                        inputRef={(el: HTMLInputElement | null) => {
                          if (el) cells.current.set(`${r}-${c}`, el);
                          else cells.current.delete(`${r}-${c}`);
                        }}
                        inputProps={{
                          'aria-label': `Height at row ${r + 1}, column ${c + 1}`,
                          inputMode: 'decimal',
                          'data-indicator-cell': `${r}-${c}`,
                        }}
                        sx={cellSx}
                      />
                    </TableCell>
                  ))}
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </TableContainer>
        {(problem || create.error) && <Alert severity="error">{problem ?? (create.error as Error).message}</Alert>}
        <WaitingEntries path={`/machines/${machineId}/bed-grids`} />
        <TextField
          label="Note"
          value={note}
          onChange={(e) => setNote(e.target.value)}
          placeholder="Instrument, slats, where the zero is"
        />
        <Box>
          <Button type="submit" variant="contained" disabled={create.busy}>
            {create.busy ? 'Fitting the plane…' : 'Record bed grid'}
          </Button>
        </Box>
      </Stack>
    </Box>
  );
}
