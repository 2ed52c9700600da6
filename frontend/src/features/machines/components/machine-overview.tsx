import { UNIT_LABELS } from '../../../lib/units';
import { useState } from 'react';
import { Box, Button, Paper, Stack, Typography } from '@mui/material';
import EditOutlined from '@mui/icons-material/EditOutlined';
import { useMe } from '../../../lib/session/get-me';
import { canRecord } from '../../../lib/session/roles';
import { KIND_LABELS, type Machine } from '../types';
import { EditMachineDialog } from './edit-machine-dialog';
import { formatDateTime } from '../../../lib/format-time';

/** The machine's specification at a glance; recorders edit it. */
export function MachineOverview({ machine }: { machine: Machine }) {
  const me = useMe();
  const [editing, setEditing] = useState(false);
  const rows: [string, string][] = [
    ['Name', machine.name],
    ['Kind', KIND_LABELS[machine.kind]],
    [
      'Work area to cover',
      `${machine.workAreaInLengthUnit.x} × ${machine.workAreaInLengthUnit.y} ${UNIT_LABELS[machine.lengthUnit]}`,
    ],
    ['Target set', machine.targetSet.name],
    ['Last activity', formatDateTime(machine.lastActivityAt)],
  ];
  return (
    <Paper sx={{ p: 2.5 }}>
      <Box sx={{ display: 'flex', alignItems: 'center', mb: 1.5 }}>
        <Typography variant="h3" component="h2" sx={{ flex: 1 }}>
          Specification
        </Typography>
        {canRecord(me.data?.role) && (
          <Button startIcon={<EditOutlined />} onClick={() => setEditing(true)}>
            Edit specification
          </Button>
        )}
      </Box>
      <Stack spacing={1.25}>
        {rows.map(([label, value]) => (
          <Box key={label} sx={{ display: 'flex', gap: 2, flexWrap: 'wrap' }}>
            <Typography sx={{ width: 180, color: 'text.secondary' }}>{label}</Typography>
            <Typography sx={{ fontWeight: 500 }}>{value}</Typography>
          </Box>
        ))}
        <Box sx={{ pt: 1 }}>
          <Typography sx={{ color: 'text.secondary', mb: 0.5 }}>Notes</Typography>
          <Typography sx={{ whiteSpace: 'pre-wrap' }}>{machine.notes || '—'}</Typography>
        </Box>
      </Stack>
      <EditMachineDialog machine={machine} open={editing} onClose={() => setEditing(false)} />
    </Paper>
  );
}
