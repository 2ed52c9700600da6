import { useRef, useState } from 'react';
import { Alert, Box, Button, MenuItem, Paper, Stack, TextField, Typography } from '@mui/material';
import UploadFileOutlined from '@mui/icons-material/UploadFileOutlined';
import { IndicatorPanel } from '../../../components/indicator-input/indicator-panel';
import { useIndicatorInput } from '../../../components/indicator-input/use-indicator-input';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { positioningRunsPath, useRecordPositioningRun } from '../api/record-positioning-run';
import { useTestTargets, type TestTargets } from '../api/test-program-targets';
import { WaitingEntries } from '../../../components/offline/waiting-entries';
import type { Axis, PositioningRun } from '../types';
import { errorText } from '../utils/format';
import { parseRunsCsv, splitRows } from '../utils/parse-grid';
import { parseNumberCell } from '../../../lib/tabular-input';
import { pasteBlock, resize, rowLabel, type RowOrder } from '../utils/run-grid';
import { numberOf } from './number-input';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { fromMm } from '../../../lib/units';
import { blankConditions, ConditionsFields, conditionsOf } from './conditions-fields';

const cellSx = { width: 92, '& input': { textAlign: 'right', py: 0.75, px: 1 } };

/** The server's targets (those the downloaded program reads at) in the grid's unit; blanks until they come or when there are none. */
function serverTargetsIn(st: TestTargets | undefined, unit: LengthUnit): string[] {
  if (!st?.targets.length) return ['', '', '', '', ''];
  if (st.lengthUnit === unit) return st.targets.map(String);
  return st.targetsMm.map((mm) => String(Number(fromMm(mm, unit).toFixed(unit === 'in' ? 4 : 3))));
}

/**
 * Repeat-and-reverse entry: targets as columns, runs as rows (up and down). The targets are the
 * server's (GET /axes/:id/test-targets, the list the downloaded program uses) until the person
 * types their own. Tab goes along a row and Enter to the next row's first cell; a block pasted
 * from a spreadsheet fills from the cell it lands in; a CSV file may carry a "target" header row
 * and "up"/"down" at the start of each row.
 */
export function PositioningGrid({ axis, onRecorded }: { axis: Axis; onRecorded: (r: PositioningRun) => void }) {
  const [unit, setUnit] = useState<LengthUnit>(axis.lengthUnit === 'in' ? 'thou' : 'mm');
  const [lengthUnit, setLengthUnit] = useState<LengthUnit>(axis.lengthUnit);
  // Kept from one run to the next: the conditions of a session of runs rarely change between them.
  const [conditions, setConditions] = useState(blankConditions);
  const serverTargets = useTestTargets(axis.id);
  const [chosenRuns, setRuns] = useState<number | null>(null);
  const runs = chosenRuns ?? serverTargets.data?.runs ?? 5;
  const [order, setOrder] = useState<RowOrder>('alternate');
  // null: the server's targets, in the unit picked; a list once the person types, pastes or loads their own.
  const [typedTargets, setTypedTargets] = useState<string[] | null>(null);
  const targets = typedTargets ?? serverTargetsIn(serverTargets.data, lengthUnit);
  const setTargets = (next: string[] | ((old: string[]) => string[])) =>
    setTypedTargets((old) => (typeof next === 'function' ? next(old ?? targets) : next));
  const [typedCells, setCells] = useState<string[][]>([]);
  const [notes, setNotes] = useState('');
  const [problems, setProblems] = useState<string[]>([]);
  const file = useRef<HTMLInputElement>(null);
  const record = useRecordPositioningRun(axis.id, axis.name);
  const cols = targets.length;
  const rows = runs * 2;
  // What is typed, in the grid's current shape (the server's targets may come after typing began).
  const cells = resize(typedCells, rows, cols);

  const setRunCount = (n: number) => {
    setRuns(n);
    setCells((c) => resize(c, n * 2, cols));
  };
  const setColCount = (n: number) => {
    setTargets((t) => Array.from({ length: n }, (_, i) => t[i] ?? ''));
    setCells((c) => resize(c, rows, n));
  };

  const setCell = (r: number, c: number, v: string) =>
    setCells((x) =>
      resize(x, rows, cols).map((line, i) => (i === r ? line.map((old, j) => (j === c ? v : old)) : line)),
    );
  // An indicator's reading goes to the cell it was typed in, or else the first empty one along the rows (the Enter order).
  const indicator = useIndicatorInput({
    unit,
    place: (text, cell) => {
      const empty = Array.from({ length: rows * cols }, (_, k) => [Math.floor(k / cols), k % cols]).find(
        ([r, c]) => !cells[r]?.[c]?.trim(),
      );
      const [r, c] = cell ? cell.split('-').map(Number) : (empty ?? [-1, -1]);
      if (r < 0) return null;
      setCell(r, c, text);
      const { direction, run } = rowLabel(r, runs, order);
      return {
        cell: `${r}-${c}`,
        label: `${direction} ${run}, target ${c + 1} at ${targets[c] || '?'} mm`,
        undo: () => setCell(r, c, ''),
      };
    },
  });

  const focusCell = (r: number, c: number) =>
    setTimeout(() => document.querySelector<HTMLInputElement>(`[data-cell="${r}-${c}"]`)?.focus());
  // Enter: the next row's first cell (from the targets row, the first run's); Shift+Enter the row before.
  // With "From an indicator" on, every reading ends in an Enter: it moves along the row, as the
  // readings are taken (target after target), and on to the next row after the last target.
  const onKeyDown = (r: number, c: number) => (e: React.KeyboardEvent) => {
    if (e.key !== 'Enter') return;
    e.preventDefault();
    if (indicator.capture && r >= 0 && !e.shiftKey) {
      if (c + 1 < cols) focusCell(r, c + 1);
      else if (r + 1 < rows) focusCell(r + 1, 0);
      return;
    }
    const next = e.shiftKey ? r - 1 : r + 1;
    if (next >= -1 && next < rows) focusCell(next, 0);
  };

  const onPaste = (r: number, c: number) => (e: React.ClipboardEvent) => {
    const text = e.clipboardData.getData('text');
    // A single number ("0,5" too) goes into the cell as typed; a block fills the grid.
    if (!/[\t\n;,]/.test(text.trim()) || parseNumberCell(text).ok) return;
    e.preventDefault();
    const block = splitRows(text);
    if (r === -1) {
      // Pasted into the targets row: the first line is targets, any further lines are runs.
      const [head, ...rest] = block;
      const t = [...targets];
      head.forEach((v, i) => (t[c + i] = v));
      setTargets(t);
      if (rest.length) applyBlock(rest, 0, c, t.length);
      else setCells((x) => resize(x, rows, t.length));
      return;
    }
    applyBlock(block, r, c, cols);
  };

  const applyBlock = (block: string[][], r: number, c: number, colCount: number) => {
    const next = pasteBlock(resize(cells, rows, colCount), block, r, c);
    const runCount = Math.ceil(next.length / 2);
    if (next[0].length > colCount) setTargets((t) => Array.from({ length: next[0].length }, (_, i) => t[i] ?? ''));
    setRuns(runCount);
    setCells(resize(next, runCount * 2, next[0].length));
  };

  const onFile = async (f: File | undefined) => {
    if (!f) return;
    const parsed = parseRunsCsv(await f.text());
    setProblems(parsed.problems);
    if (parsed.problems.length) return;
    const t = parsed.targets?.map(String) ?? targets;
    const ups = parsed.rows.filter((x) => x.direction === 'up');
    const downs = parsed.rows.filter((x) => x.direction === 'down');
    const directed = ups.length + downs.length === parsed.rows.length && ups.length > 0;
    const runCount = directed ? Math.max(ups.length, downs.length) : Math.ceil(parsed.rows.length / 2);
    const width = Math.max(t.length, ...parsed.rows.map((x) => x.values.length));
    const grid = resize([], runCount * 2, width);
    if (directed) {
      for (let i = 0; i < runCount * 2; i++) {
        const { direction, run } = rowLabel(i, runCount, order);
        const src = (direction === 'up' ? ups : downs)[run - 1];
        if (src)
          grid[i] = Array.from({ length: width }, (_, c) =>
            src.values[c] === null || src.values[c] === undefined ? '' : String(src.values[c]),
          );
      }
    } else
      parsed.rows.forEach(
        (x, i) => (grid[i] = Array.from({ length: width }, (_, c) => (x.values[c] == null ? '' : String(x.values[c])))),
      );
    setTargets(Array.from({ length: width }, (_, i) => t[i] ?? ''));
    setRuns(runCount);
    setCells(grid);
  };

  const allNumbers =
    targets.every((t) => numberOf(t) !== undefined) &&
    cells.every((row) => row.every((v) => numberOf(v) !== undefined));
  const clear = () => {
    setCells([]);
    setNotes('');
  };
  const submit = () => {
    setProblems([]);
    record.record(
      {
        lengthUnit,
        readingUnit: unit,
        ...conditionsOf(conditions),
        targets: targets.map(Number),
        runs: cells.map((row, i) => ({ direction: rowLabel(i, runs, order).direction, deviations: row.map(Number) })),
        notes: notes.trim() || undefined,
      },
      {
        onQueued: clear,
        onRecorded: (r) => {
          clear();
          onRecorded(r);
        },
      },
    );
  };
  const empty = cells.flat().filter((v) => v.trim() === '').length;

  return (
    <Paper ref={indicator.containerRef} sx={{ p: 2.5 }}>
      <Typography variant="h4" component="h3" gutterBottom>
        Record a repeat-and-reverse run
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        Approach every target {runs} times moving up and {runs} times moving down (ISO 230-2 asks for five each way) and
        enter the deviation, actual − target, read at each.
      </Typography>
      <Stack spacing={2}>
        <Box sx={{ display: 'flex', gap: 2, flexWrap: 'wrap', alignItems: 'center' }}>
          <UnitFamilySelect
            family="length"
            label="Targets in"
            value={lengthUnit}
            onChange={setLengthUnit}
            units={['mm', 'in']}
          />
          <UnitFamilySelect family="reading" label="Deviations in" value={unit} onChange={setUnit} />
          <TextField
            select
            label="Runs each way"
            value={runs}
            onChange={(e) => setRunCount(Number(e.target.value))}
            sx={{ width: 140 }}
          >
            {[2, 3, 4, 5, 6, 7, 8, 9, 10].map((n) => (
              <MenuItem key={n} value={n}>
                {n}
              </MenuItem>
            ))}
          </TextField>
          <TextField
            select
            label="Targets"
            value={cols}
            onChange={(e) => setColCount(Number(e.target.value))}
            sx={{ width: 110 }}
          >
            {Array.from({ length: 20 }, (_, i) => i + 2).map((n) => (
              <MenuItem key={n} value={n}>
                {n}
              </MenuItem>
            ))}
          </TextField>
          <TextField
            select
            label="Row order"
            value={order}
            onChange={(e) => setOrder(e.target.value as RowOrder)}
            sx={{ width: 230 }}
          >
            <MenuItem value="alternate">Up, down, up… (as run)</MenuItem>
            <MenuItem value="grouped">All up, then all down</MenuItem>
          </TextField>
          <Button startIcon={<UploadFileOutlined />} onClick={() => file.current?.click()}>
            Load a CSV file
          </Button>
          <input
            ref={file}
            type="file"
            accept=".csv,.txt,text/csv,text/plain"
            hidden
            aria-label="CSV file of runs"
            onChange={(e) => onFile(e.target.files?.[0]).finally(() => (e.target.value = ''))}
          />
        </Box>
        <Typography variant="body2" color="text.secondary" data-testid="targets-source">
          {typedTargets
            ? 'Targets as typed: download the test program with the same targets.'
            : (serverTargets.data?.reason ??
              (serverTargets.data
                ? 'Targets: the same list the downloaded test program moves to.'
                : 'Loading the targets of the test program…'))}
        </Typography>
        <IndicatorPanel indicator={indicator} />
        {problems.length > 0 && <Alert severity="error">{problems.join('; ')}</Alert>}
        {record.error && <Alert severity="error">{errorText(record.error)}</Alert>}
        <WaitingEntries path={positioningRunsPath(axis.id)} />
        <Box sx={{ overflowX: 'auto', pb: 1 }}>
          <Box
            component="table"
            role="grid"
            aria-label="Repeat-and-reverse readings"
            sx={{
              borderCollapse: 'collapse',
              '& th, & td': { p: 0.25 },
              '& th': { fontWeight: 500, color: 'text.secondary', textAlign: 'left', whiteSpace: 'nowrap', pr: 1 },
            }}
          >
            <thead>
              <tr>
                {/* The row names stay in view while a phone scrolls along the targets. */}
                <Box
                  component="th"
                  scope="col"
                  sx={{ position: 'sticky', left: 0, zIndex: 1, bgcolor: 'background.paper' }}
                >
                  Target ({UNIT_LABELS[lengthUnit]})
                </Box>
                {targets.map((t, c) => (
                  <th key={c} scope="col">
                    <TextField
                      value={t}
                      onChange={(e) =>
                        setTargets((x) => x.map((v, i) => (i === c ? e.target.value.replace(',', '.') : v)))
                      }
                      onPaste={onPaste(-1, c)}
                      onKeyDown={onKeyDown(-1, c)}
                      error={t.trim() !== '' && numberOf(t) === undefined}
                      sx={{ ...cellSx, '& input': { ...cellSx['& input'], fontWeight: 600 } }}
                      slotProps={{
                        htmlInput: {
                          inputMode: 'decimal',
                          'data-cell': `-1-${c}`,
                          'aria-label': `Target ${c + 1} (${UNIT_LABELS[lengthUnit]})`,
                        },
                      }}
                    />
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {cells.map((row, r) => {
                const { direction, run } = rowLabel(r, runs, order);
                return (
                  <tr key={r}>
                    <Box
                      component="th"
                      scope="row"
                      sx={{
                        color: direction === 'up' ? '#1d4f4a' : '#a4522f',
                        position: 'sticky',
                        left: 0,
                        zIndex: 1,
                        bgcolor: 'background.paper',
                      }}
                    >
                      {direction === 'up' ? '↑ Up' : '↓ Down'} {run} ({UNIT_LABELS[unit]})
                    </Box>
                    {row.map((v, c) => (
                      <td key={c}>
                        <TextField
                          value={v}
                          onChange={(e) => setCell(r, c, e.target.value.replace(',', '.'))}
                          onPaste={onPaste(r, c)}
                          onKeyDown={onKeyDown(r, c)}
                          error={v.trim() !== '' && numberOf(v) === undefined}
                          sx={cellSx}
                          slotProps={{
                            htmlInput: {
                              inputMode: 'decimal',
                              'data-cell': `${r}-${c}`,
                              'data-indicator-cell': `${r}-${c}`,
                              'aria-label': `${direction === 'up' ? 'Up' : 'Down'} ${run}, target ${c + 1}`,
                            },
                          }}
                        />
                      </td>
                    ))}
                  </tr>
                );
              })}
            </tbody>
          </Box>
        </Box>
        <Typography variant="body2" color="text.secondary">
          Tab goes along a row and Enter to the next row's first cell (with “From an indicator” on, each reading moves
          on to the next target). Paste a block copied from a spreadsheet into the first cell; a CSV may start with a
          row of targets and each row with up or down.
        </Typography>
        <ConditionsFields draft={conditions} onChange={setConditions} readingUnit={unit} of="runs" />
        <TextField
          label="Notes (instrument, where it was read)"
          value={notes}
          onChange={(e) => setNotes(e.target.value)}
        />
        <Box sx={{ display: 'flex', gap: 2, alignItems: 'center', flexWrap: 'wrap' }}>
          <Button variant="contained" onClick={submit} disabled={!allNumbers || record.busy}>
            Record run
          </Button>
          {!allNumbers && (
            <Typography variant="body2" color="text.secondary">
              {empty ? `${empty} reading${empty === 1 ? '' : 's'} still to enter` : 'Every cell needs a number'}
            </Typography>
          )}
        </Box>
      </Stack>
    </Paper>
  );
}
