import { Box, Paper, Stack, Typography } from '@mui/material';
import { KIND_LABELS, type Machine } from '../types';

/** The machine's specification at a glance. */
export function MachineOverview({ machine }: { machine: Machine }) {
  const rows: [string, string][] = [
    ['Kind', KIND_LABELS[machine.kind]],
    ['Work area to cover', `${machine.workArea.x} × ${machine.workArea.y} mm`],
    ['Target set', machine.targetSet.name],
    ['Last activity', new Date(machine.lastActivityAt).toLocaleString()],
  ];
  return (
    <Paper sx={{ p: 2.5 }}>
      <Stack spacing={1.25}>
        {rows.map(([label, value]) => (
          <Box key={label} sx={{ display: 'flex', gap: 2, flexWrap: 'wrap' }}>
            <Typography sx={{ width: 180, color: 'text.secondary' }}>{label}</Typography>
            <Typography sx={{ fontWeight: 500 }}>{value}</Typography>
          </Box>
        ))}
        {machine.notes && (
          <Box sx={{ pt: 1 }}>
            <Typography sx={{ color: 'text.secondary', mb: 0.5 }}>Notes</Typography>
            <Typography sx={{ whiteSpace: 'pre-wrap' }}>{machine.notes}</Typography>
          </Box>
        )}
      </Stack>
    </Paper>
  );
}
