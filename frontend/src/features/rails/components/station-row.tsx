import { memo } from 'react';
import { IconButton, InputAdornment, TableCell, TableRow, TextField, Tooltip } from '@mui/material';
import DeleteOutline from '@mui/icons-material/DeleteOutlined';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import type { StationDraft } from '../hooks/use-sweep-draft';

const DECIMALS: Record<LengthUnit, number> = { um: 1, mm: 4, in: 5, thou: 2 };

export interface StationRowProps {
  index: number;
  row: StationDraft;
  unit: LengthUnit;
  problem: string | undefined;
  residual: number | null | undefined;
  onRowChange: (index: number, patch: Partial<StationDraft>) => void;
  onEnter: (index: number) => void;
  onDrop: (index: number) => void;
  inputRef: (index: number, el: HTMLInputElement | null) => void;
}

/**
 * One station. Memoised with stable callbacks, so a keystroke re-renders the row being typed in,
 * not all forty of them: on a slow tablet that is the difference between instant and laggy.
 */
export const StationRow = memo(function StationRow({
  index: i,
  row: r,
  unit,
  problem,
  residual,
  onRowChange,
  onEnter,
  onDrop,
  inputRef,
}: StationRowProps) {
  return (
    <TableRow>
      <TableCell>{i + 1}</TableCell>
      <TableCell>
        <TextField
          value={r.position}
          onChange={(e) => onRowChange(i, { position: e.target.value })}
          variant="standard"
          slotProps={{
            htmlInput: { inputMode: 'decimal', 'aria-label': `Station ${i + 1} position (mm)`, tabIndex: -1 },
          }}
          sx={{ width: { xs: 60, sm: 80 } }}
        />
      </TableCell>
      <TableCell>
        <TextField
          value={r.reading}
          onChange={(e) => onRowChange(i, { reading: e.target.value })}
          onKeyDown={(e) => {
            if (e.key === 'Enter') {
              // Enter only ever moves on to the next station's reading; it never drops a row.
              e.preventDefault();
              onEnter(i);
            } else if (e.key === 'Delete' && (e.ctrlKey || e.metaKey)) {
              e.preventDefault();
              onDrop(i);
            }
          }}
          inputRef={(el: HTMLInputElement | null) => inputRef(i, el)}
          error={!!problem}
          helperText={problem}
          autoComplete="off"
          slotProps={{
            htmlInput: {
              inputMode: 'decimal',
              'aria-label': `Reading at ${r.position || '?'} mm`,
              'aria-keyshortcuts': 'Control+Delete',
              enterKeyHint: 'next',
              'data-indicator-cell': i,
            },
            input: { endAdornment: <InputAdornment position="end">{UNIT_LABELS[unit]}</InputAdornment> },
          }}
          sx={{ width: { xs: 124, sm: 130 } }}
        />
      </TableCell>
      <TableCell align="right" sx={{ color: 'text.secondary', fontVariantNumeric: 'tabular-nums' }}>
        {residual === null || residual === undefined
          ? ''
          : `${residual >= 0 ? '+' : ''}${residual.toFixed(DECIMALS[unit])}`}
      </TableCell>
      <TableCell>
        {/* Out of the tab order, so Tab goes from reading to reading; Ctrl+Delete in the reading drops it too. */}
        <Tooltip title="Drop this station (Ctrl+Delete in its reading)">
          <IconButton
            size="small"
            aria-label={`Drop station ${i + 1}`}
            aria-keyshortcuts="Control+Delete"
            tabIndex={-1}
            onClick={() => onDrop(i)}
          >
            <DeleteOutline fontSize="small" />
          </IconButton>
        </Tooltip>
      </TableCell>
    </TableRow>
  );
});
