import { useRef } from 'react';
import { IconButton, InputAdornment, Table, TableBody, TableCell, TableContainer, TableHead, TableRow, TextField, Tooltip } from '@mui/material';
import DeleteOutline from '@mui/icons-material/DeleteOutlined';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import type { StationDraft } from '../hooks/use-sweep-draft';

/**
 * One reading field per station, made for a hand that holds an indicator: Enter moves to the next
 * station's reading (and from the last one to Save).
 */
export function StationReadings({
  rows,
  unit,
  problems,
  residuals,
  onChange,
  onLastEnter,
}: {
  rows: StationDraft[];
  unit: LengthUnit;
  problems: Map<number, string>;
  /** Residual from the live fit per row, in the unit, when known. */
  residuals?: (number | null)[];
  onChange: (rows: StationDraft[]) => void;
  onLastEnter: () => void;
}) {
  const inputs = useRef<(HTMLInputElement | null)[]>([]);
  const set = (i: number, patch: Partial<StationDraft>) => onChange(rows.map((r, k) => (k === i ? { ...r, ...patch } : r)));
  const next = (i: number) => {
    const el = inputs.current[i + 1];
    if (el) {
      el.focus();
      el.select();
    } else onLastEnter();
  };
  return (
    <TableContainer sx={{ maxHeight: 520 }}>
      <Table size="small" stickyHeader aria-label="Stations and readings" sx={{ '& td, & th': { px: 1 } }}>
        <TableHead>
          <TableRow>
            <TableCell sx={{ width: 40 }}>#</TableCell>
            <TableCell sx={{ width: 100 }}>Station (mm)</TableCell>
            <TableCell>Reading ({UNIT_LABELS[unit]})</TableCell>
            <TableCell align="right" sx={{ width: 80 }}>
              Residual
            </TableCell>
            <TableCell sx={{ width: 40 }} />
          </TableRow>
        </TableHead>
        <TableBody>
          {rows.map((r, i) => {
            const problem = problems.get(i);
            const residual = residuals?.[i];
            return (
              <TableRow key={i}>
                <TableCell>{i + 1}</TableCell>
                <TableCell>
                  <TextField
                    value={r.position}
                    onChange={(e) => set(i, { position: e.target.value })}
                    variant="standard"
                    slotProps={{ htmlInput: { inputMode: 'decimal', 'aria-label': `Station ${i + 1} position (mm)`, tabIndex: -1 } }}
                    sx={{ width: 80 }}
                  />
                </TableCell>
                <TableCell>
                  <TextField
                    value={r.reading}
                    onChange={(e) => set(i, { reading: e.target.value })}
                    onKeyDown={(e) => {
                      if (e.key === 'Enter') {
                        e.preventDefault();
                        next(i);
                      }
                    }}
                    inputRef={(el: HTMLInputElement | null) => {
                      inputs.current[i] = el;
                    }}
                    error={!!problem}
                    helperText={problem}
                    autoComplete="off"
                    slotProps={{
                      htmlInput: { inputMode: 'decimal', 'aria-label': `Reading at ${r.position || '?'} mm`, enterKeyHint: 'next' },
                      input: { endAdornment: <InputAdornment position="end">{UNIT_LABELS[unit]}</InputAdornment> },
                    }}
                    sx={{ width: 130 }}
                  />
                </TableCell>
                <TableCell align="right" sx={{ color: 'text.secondary', fontVariantNumeric: 'tabular-nums' }}>
                  {residual === null || residual === undefined ? '' : `${residual >= 0 ? '+' : ''}${residual.toFixed(unit === 'um' ? 1 : unit === 'mm' ? 4 : unit === 'in' ? 5 : 2)}`}
                </TableCell>
                <TableCell>
                  <Tooltip title="Drop this station">
                    <IconButton size="small" aria-label={`Drop station ${i + 1}`} tabIndex={-1} onClick={() => onChange(rows.filter((_, k) => k !== i))}>
                      <DeleteOutline fontSize="small" />
                    </IconButton>
                  </Tooltip>
                </TableCell>
              </TableRow>
            );
          })}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
