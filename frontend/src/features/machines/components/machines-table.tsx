import { useMemo, useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { Box, Chip, Link, Paper, Typography } from '@mui/material';
import { DataGrid, type GridColDef, type GridFilterModel } from '@mui/x-data-grid';
import { paths } from '../../../config/paths';
import { KIND_LABELS, STATE_LABELS, type MachineKind, type MachineListItem, type MachineState } from '../types';
import { MachineStateChip } from './machine-state-chip';

const kindOptions = (Object.keys(KIND_LABELS) as MachineKind[]).map((value) => ({ value, label: KIND_LABELS[value] }));
const stateOptions = (Object.keys(STATE_LABELS) as MachineState[]).map((value) => ({ value, label: STATE_LABELS[value] }));

/** Every machine file, sortable and filterable (by state too, e.g. "Re-check due"). */
export function MachinesTable({ machines }: { machines: MachineListItem[] }) {
  const [filterModel, setFilterModel] = useState<GridFilterModel>({ items: [] });
  const stateFilter = filterModel.items.length === 1 && filterModel.items[0].field === 'state' && filterModel.items[0].operator === 'is' ? (filterModel.items[0].value as MachineState) : null;
  const pickState = (state: MachineState | null) =>
    setFilterModel({ ...filterModel, items: state ? [{ id: 'state', field: 'state', operator: 'is', value: state }] : [] });
  const counts = new Map<MachineState, number>();
  for (const m of machines) counts.set(m.state, (counts.get(m.state) ?? 0) + 1);
  const columns = useMemo<GridColDef<MachineListItem>[]>(
    () => [
      {
        field: 'name',
        headerName: 'Name',
        flex: 1.4,
        minWidth: 180,
        renderCell: ({ row }) => (
          <Link component={RouterLink} to={paths.machine(row.id)} sx={{ fontWeight: 500 }}>
            {row.name}
          </Link>
        ),
      },
      { field: 'kind', headerName: 'Kind', type: 'singleSelect', valueOptions: kindOptions, flex: 0.8, minWidth: 120 },
      {
        field: 'state',
        headerName: 'State',
        type: 'singleSelect',
        valueOptions: stateOptions,
        flex: 0.9,
        minWidth: 150,
        renderCell: ({ row }) => <MachineStateChip state={row.state} />,
      },
      {
        field: 'checksWithin',
        headerName: 'Checks within target',
        type: 'number',
        flex: 0.9,
        minWidth: 170,
        align: 'left',
        headerAlign: 'left',
        valueGetter: (_v, row) => row.checks.within,
        renderCell: ({ row }) => `${row.checks.within} of ${row.checks.total}${row.checks.outside ? ` · ${row.checks.outside} outside` : ''}`,
      },
      {
        field: 'lastActivityAt',
        headerName: 'Last activity',
        type: 'dateTime',
        flex: 1,
        minWidth: 170,
        valueGetter: (v) => new Date(v as string),
        valueFormatter: (v: Date) => v.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' }),
      },
    ],
    [],
  );
  return (
    <Paper sx={{ width: '100%' }}>
      <Box role="group" aria-label="Filter by state" sx={{ display: 'flex', gap: 1, flexWrap: 'wrap', alignItems: 'center', px: 1.5, pt: 1.5 }}>
        <Typography variant="body2" color="text.secondary" sx={{ mr: 0.5 }}>
          State
        </Typography>
        <Chip label="All" size="small" color={stateFilter ? 'default' : 'primary'} variant={stateFilter ? 'outlined' : 'filled'} onClick={() => pickState(null)} aria-pressed={!stateFilter} />
        {stateOptions.map((o) => (
          <Chip
            key={o.value}
            size="small"
            label={`${o.label} (${counts.get(o.value) ?? 0})`}
            color={stateFilter === o.value ? 'primary' : 'default'}
            variant={stateFilter === o.value ? 'filled' : 'outlined'}
            onClick={() => pickState(stateFilter === o.value ? null : o.value)}
            aria-pressed={stateFilter === o.value}
          />
        ))}
      </Box>
      <DataGrid
        filterModel={filterModel}
        onFilterModelChange={setFilterModel}
        aria-label="Machines"
        rows={machines}
        columns={columns}
        autoHeight
        disableRowSelectionOnClick
        initialState={{ sorting: { sortModel: [{ field: 'lastActivityAt', sort: 'desc' }] } }}
        pageSizeOptions={[25, 50, 100]}
        showToolbar
        sx={{ border: 0 }}
      />
    </Paper>
  );
}
