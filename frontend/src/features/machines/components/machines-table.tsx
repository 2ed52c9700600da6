import { useMemo, useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import {
  Box,
  Chip,
  InputAdornment,
  Link,
  Paper,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  TableSortLabel,
  TextField,
  Typography,
} from '@mui/material';
import SearchOutlined from '@mui/icons-material/SearchOutlined';
import { paths } from '../../../config/paths';
import type { MachineState } from '../../../lib/machine-state';
import { KIND_LABELS, STATE_LABELS, type MachineListItem } from '../types';
import { MachineStateChip } from './machine-state-chip';
import { sortMachines, type MachineSort } from '../utils/sort-machines';
import { formatDateTime } from '../../../lib/format-time';

const STATES = Object.keys(STATE_LABELS) as MachineState[];
const COLUMNS: { key: MachineSort['by']; label: string; narrow: boolean }[] = [
  { key: 'name', label: 'Name', narrow: true },
  { key: 'kind', label: 'Kind', narrow: false },
  { key: 'state', label: 'State', narrow: true },
  { key: 'checks', label: 'Checks within target', narrow: false },
  { key: 'lastActivityAt', label: 'Last activity', narrow: false },
];
// Columns that give way on a phone: the kind moves under the name, the rest waits for a wider screen.
const wideOnly = { display: { xs: 'none', sm: 'table-cell' } };

const showTime = formatDateTime;

/** Every machine file, sortable by any column and filtered by state (e.g. "Re-check due") or name. */
export function MachinesTable({ machines }: { machines: MachineListItem[] }) {
  const [stateFilter, setStateFilter] = useState<MachineState | null>(null);
  const [text, setText] = useState('');
  const [sort, setSort] = useState<MachineSort>({ by: 'lastActivityAt', direction: 'desc' });
  const counts = useMemo(() => {
    const c = new Map<MachineState, number>();
    for (const m of machines) c.set(m.state, (c.get(m.state) ?? 0) + 1);
    return c;
  }, [machines]);
  const shown = useMemo(() => {
    const needle = text.trim().toLowerCase();
    const kept = machines.filter(
      (m) => (!stateFilter || m.state === stateFilter) && (!needle || m.name.toLowerCase().includes(needle)),
    );
    return sortMachines(kept, sort);
  }, [machines, stateFilter, text, sort]);
  const sortBy = (by: MachineSort['by']) =>
    setSort((s) => ({ by, direction: s.by === by && s.direction === 'asc' ? 'desc' : 'asc' }));

  return (
    <Paper sx={{ width: '100%' }}>
      <Box sx={{ display: 'flex', gap: 1.5, flexWrap: 'wrap', alignItems: 'center', px: 1.5, pt: 1.5 }}>
        <Box
          role="group"
          aria-label="Filter by state"
          sx={{ display: 'flex', gap: 1, flexWrap: 'wrap', alignItems: 'center', flex: '1 1 420px' }}
        >
          <Typography variant="body2" color="text.secondary" sx={{ mr: 0.5 }}>
            State
          </Typography>
          <Chip
            label="All"
            size="small"
            color={stateFilter ? 'default' : 'primary'}
            variant={stateFilter ? 'outlined' : 'filled'}
            onClick={() => setStateFilter(null)}
            aria-pressed={!stateFilter}
          />
          {STATES.map((s) => (
            <Chip
              key={s}
              size="small"
              label={`${STATE_LABELS[s]} (${counts.get(s) ?? 0})`}
              color={stateFilter === s ? 'primary' : 'default'}
              variant={stateFilter === s ? 'filled' : 'outlined'}
              onClick={() => setStateFilter(stateFilter === s ? null : s)}
              aria-pressed={stateFilter === s}
            />
          ))}
        </Box>
        <TextField
          size="small"
          label="Find by name"
          value={text}
          onChange={(e) => setText(e.target.value)}
          sx={{ width: { xs: '100%', sm: 220 } }}
          slotProps={{
            input: {
              startAdornment: (
                <InputAdornment position="start">
                  <SearchOutlined fontSize="small" />
                </InputAdornment>
              ),
            },
          }}
        />
      </Box>
      <TableContainer>
        <Table aria-label="Machines" sx={{ '& td, & th': { px: { xs: 1.5, sm: 2 } } }}>
          <TableHead>
            <TableRow>
              {COLUMNS.map((c) => (
                <TableCell
                  key={c.key}
                  sortDirection={sort.by === c.key ? sort.direction : false}
                  sx={c.narrow ? undefined : wideOnly}
                >
                  <TableSortLabel
                    active={sort.by === c.key}
                    direction={sort.by === c.key ? sort.direction : 'asc'}
                    onClick={() => sortBy(c.key)}
                  >
                    {c.label}
                  </TableSortLabel>
                </TableCell>
              ))}
            </TableRow>
          </TableHead>
          <TableBody>
            {shown.map((m) => (
              <TableRow key={m.id} hover>
                <TableCell>
                  <Link
                    component={RouterLink}
                    to={paths.machine(m.id)}
                    sx={{
                      fontWeight: 500,
                      display: 'inline-flex',
                      alignItems: 'center',
                      minHeight: { xs: 44, md: 'auto' },
                    }}
                  >
                    {m.name}
                  </Link>
                  <Typography variant="body2" color="text.secondary" sx={{ display: { sm: 'none' } }}>
                    {KIND_LABELS[m.kind]} · {m.checks.within} of {m.checks.total} checks within target
                  </Typography>
                </TableCell>
                <TableCell sx={wideOnly}>{KIND_LABELS[m.kind]}</TableCell>
                <TableCell>
                  <MachineStateChip state={m.state} />
                </TableCell>
                <TableCell sx={wideOnly}>
                  {m.checks.within} of {m.checks.total}
                  {m.checks.outside ? ` · ${m.checks.outside} outside` : ''}
                </TableCell>
                <TableCell sx={{ ...wideOnly, whiteSpace: 'nowrap' }}>{showTime(m.lastActivityAt)}</TableCell>
              </TableRow>
            ))}
            {shown.length === 0 && (
              <TableRow>
                <TableCell colSpan={COLUMNS.length} sx={{ color: 'text.secondary', py: 3 }}>
                  No machine matches{stateFilter ? ` “${STATE_LABELS[stateFilter]}”` : ''}
                  {text.trim() ? ` “${text.trim()}”` : ''}.
                </TableCell>
              </TableRow>
            )}
          </TableBody>
        </Table>
      </TableContainer>
    </Paper>
  );
}
