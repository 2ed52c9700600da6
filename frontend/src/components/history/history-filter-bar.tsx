import { Button, MenuItem, Stack, TextField } from '@mui/material';
import { NO_FILTERS, type HistoryFilters } from './history-types';

/** What a history can be filtered by; `kinds` are [value, label] pairs. */
export function HistoryFilterBar({
  value,
  onChange,
  kinds,
}: {
  value: HistoryFilters;
  onChange: (f: HistoryFilters) => void;
  kinds: [string, string][];
}) {
  const set = (patch: Partial<HistoryFilters>) => onChange({ ...value, ...patch });
  const badRange = !!value.fromDay && !!value.toDay && value.fromDay > value.toDay;
  return (
    <Stack
      component="form"
      role="search"
      aria-label="Filter the history"
      direction={{ xs: 'column', sm: 'row' }}
      spacing={1.5}
      sx={{ mb: 2, flexWrap: 'wrap' }}
      useFlexGap
      onSubmit={(e) => e.preventDefault()}
    >
      <TextField
        select
        size="small"
        label="Kind"
        value={value.kind}
        onChange={(e) => set({ kind: e.target.value })}
        sx={{ minWidth: 190 }}
      >
        <MenuItem value="">All kinds</MenuItem>
        {kinds.map(([k, label]) => (
          <MenuItem key={k} value={k}>
            {label}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        size="small"
        label="Person"
        placeholder="Name"
        value={value.person}
        onChange={(e) => set({ person: e.target.value })}
        sx={{ minWidth: 170 }}
      />
      <TextField
        size="small"
        type="date"
        label="From"
        value={value.fromDay}
        onChange={(e) => set({ fromDay: e.target.value })}
        slotProps={{ inputLabel: { shrink: true } }}
      />
      <TextField
        size="small"
        type="date"
        label="To"
        value={value.toDay}
        onChange={(e) => set({ toDay: e.target.value })}
        error={badRange}
        helperText={badRange ? 'To must be on or after From' : undefined}
        slotProps={{ inputLabel: { shrink: true } }}
      />
      <Button onClick={() => onChange(NO_FILTERS)} disabled={JSON.stringify(value) === JSON.stringify(NO_FILTERS)}>
        Clear filters
      </Button>
    </Stack>
  );
}
