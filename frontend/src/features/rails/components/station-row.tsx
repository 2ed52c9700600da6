import { memo, useCallback, useLayoutEffect, useRef, type FormEvent, type ReactNode } from 'react';
import { IconButton, InputAdornment, TableCell, TableRow, TextField, Tooltip } from '@mui/material';
import DeleteOutline from '@mui/icons-material/DeleteOutlined';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { useDraft, type StationDraft, type SweepDraftStore } from '../hooks/use-sweep-draft';
import { useFieldLayoutBoundary } from '../hooks/use-field-layout-boundary';
import { readyStations } from '../utils/stations';

const DECIMALS: Record<LengthUnit, number> = { um: 1, mm: 4, in: 5, thou: 2 };

export interface StationRowProps {
  store: SweepDraftStore;
  index: number;
  unit: LengthUnit;
  /** The live fit's residual at each position, in `unit` (null while there is no fit). */
  residuals: ReadonlyMap<number, number> | null;
  onRowChange: (index: number, patch: Partial<StationDraft>) => void;
  onEnter: (index: number) => void;
  onDrop: (index: number) => void;
  inputRef: (index: number, el: HTMLInputElement | null) => void;
}

const keepHere = (e: FormEvent) => e.preventDefault();

/**
 * Each field sits in a form of its own. On every keystroke the browser's form filling looks over
 * all the fields of the form being typed in, and fields outside any form count as one form of the
 * whole page: with ninety fields in the grid that look costs more than the keystroke itself on a
 * slow tablet. Nothing is ever sent through these forms (Enter moves on, see the reading field).
 */
function FieldForm({ children }: { children: ReactNode }) {
  return (
    <form noValidate onSubmit={keepHere} style={{ display: 'contents' }}>
      {children}
    </form>
  );
}

/**
 * One station. The row and each of its fields read their own part of the draft, so a keystroke
 * in a reading re-renders that reading's field alone, not the row, the table or the other rows:
 * on a slow tablet that is the difference between instant and laggy.
 */
export const StationRow = memo(function StationRow({
  store,
  index: i,
  unit,
  residuals,
  onRowChange,
  onEnter,
  onDrop,
  inputRef,
}: StationRowProps) {
  const position = useDraft(store, (d) => d.stations[i]?.position ?? '');
  const residual = residuals ? (residuals.get(Number(position)) ?? null) : undefined;
  return (
    <TableRow>
      <TableCell>{i + 1}</TableCell>
      <TableCell>
        <PositionField index={i} value={position} onRowChange={onRowChange} />
      </TableCell>
      <TableCell>
        <ReadingField
          store={store}
          index={i}
          position={position}
          unit={unit}
          onRowChange={onRowChange}
          onEnter={onEnter}
          onDrop={onDrop}
          inputRef={inputRef}
        />
      </TableCell>
      <TableCell align="right" sx={{ color: 'text.secondary', fontVariantNumeric: 'tabular-nums' }}>
        {residual === null || residual === undefined
          ? ''
          : `${residual >= 0 ? '+' : ''}${residual.toFixed(DECIMALS[unit])}`}
      </TableCell>
      <TableCell>
        <DropButton index={i} onDrop={onDrop} />
      </TableCell>
    </TableRow>
  );
});

const PositionField = memo(function PositionField({
  index: i,
  value,
  onRowChange,
}: {
  index: number;
  value: string;
  onRowChange: StationRowProps['onRowChange'];
}) {
  return (
    <FieldForm>
      <TextField
        value={value}
        onChange={(e) => onRowChange(i, { position: e.target.value })}
        variant="standard"
        slotProps={{
          htmlInput: { inputMode: 'decimal', 'aria-label': `Station ${i + 1} position (mm)`, tabIndex: -1 },
        }}
        sx={{ width: { xs: 60, sm: 80 } }}
      />
    </FieldForm>
  );
});

const ReadingField = memo(function ReadingField({
  store,
  index: i,
  position,
  unit,
  onRowChange,
  onEnter,
  onDrop,
  inputRef,
}: Omit<StationRowProps, 'residuals'> & { position: string }) {
  const problem = useDraft(store, (d) => readyStations(d.stations).problems.get(i));
  const own = useRef<HTMLInputElement | null>(null);
  const ref = useCallback(
    (el: HTMLInputElement | null) => {
      own.current = el;
      inputRef(i, el);
    },
    [inputRef, i],
  );
  // The field keeps what is typed in it and writes it to the draft, so a keystroke re-renders
  // nothing unless the reading's problem changes: on a slow tablet re-rendering the field was a
  // third of the keystroke. A reading put in from elsewhere (an indicator, an imported file, an
  // undone drop, the readings cleared after saving) is written into the field here.
  useLayoutEffect(() => {
    const show = (reading: string) => {
      if (own.current && own.current.value !== reading) own.current.value = reading;
    };
    show(store.getState().stations[i]?.reading ?? '');
    return store.subscribe((d) => show(d.stations[i]?.reading ?? ''));
  }, [store, i]);
  const boundary = useFieldLayoutBoundary(!problem);
  return (
    <FieldForm>
      <TextField
        ref={boundary.field}
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
        inputRef={ref}
        error={!!problem}
        helperText={problem}
        autoComplete="off"
        slotProps={{
          htmlInput: {
            inputMode: 'decimal',
            'aria-label': `Reading at ${position || '?'} mm`,
            'aria-keyshortcuts': 'Control+Delete',
            enterKeyHint: 'next',
            'data-indicator-cell': i,
          },
          input: {
            ref: boundary.line,
            endAdornment: <InputAdornment position="end">{UNIT_LABELS[unit]}</InputAdornment>,
          },
        }}
        sx={{ width: { xs: 124, sm: 130 } }}
      />
    </FieldForm>
  );
});

const DropButton = memo(function DropButton({ index: i, onDrop }: { index: number; onDrop: (index: number) => void }) {
  return (
    // Out of the tab order, so Tab goes from reading to reading; Ctrl+Delete in the reading drops it too.
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
  );
});
