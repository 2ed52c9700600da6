import { useState } from 'react';
import { Box, MenuItem, Paper, TextField, Typography } from '@mui/material';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { useTestCuts } from '../api/get-test-cuts';
import { showDate } from '../utils/format';
import { TestCutForm } from './test-cut-form';
import { TestCutResults } from './test-cut-results';
import { DeleteRecordButton } from './delete-record-button';

/** The acceptance cut: entry for technicians, results for everyone, earlier cuts to compare. */
export function TestCutSection({
  machineId,
  machineKind,
  canRecord,
}: {
  machineId: string;
  machineKind: string;
  canRecord: boolean;
}) {
  const cuts = useTestCuts(machineId);
  const [selectedId, setSelectedId] = useState<string | null>(null);
  if (cuts.isPending) return <LoadingState label="Loading test cuts…" />;
  if (cuts.isError) return <ErrorState error={cuts.error} onRetry={() => cuts.refetch()} />;
  const list = cuts.data;
  const cut = list.find((c) => c.id === selectedId) ?? list[0];
  return (
    <Paper sx={{ p: { xs: 2, md: 2.5 } }} component="section" aria-labelledby="test-cut-title">
      <Typography variant="h3" id="test-cut-title" gutterBottom>
        Test cut
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        Cut a large square with a circle in it and measure it: the outside sizes give each axis's scale (steps per mm),
        the diagonals squareness, and the circle's two diameters show an oval from backlash or unequal scale.{' '}
        {machineKind === 'plasma'
          ? ' Each part size is judged by its ISO 9013 class 2 band: the tolerance grows with the part size and the plate thickness, scaled by the target set’s value for 35–125 mm parts in 3.15–6.3 mm plate.'
          : ' Part sizes are judged against the ± tolerance of the target set.'}
      </Typography>
      <Box
        sx={{
          display: 'grid',
          gap: 3,
          gridTemplateColumns: {
            xs: 'minmax(0, 1fr)',
            lg: canRecord ? 'minmax(320px, 5fr) minmax(0, 7fr)' : 'minmax(0, 1fr)',
          },
        }}
      >
        {canRecord && (
          <Box data-print="hide">
            <TestCutForm machineId={machineId} machineKind={machineKind} onSaved={(c) => setSelectedId(c.id)} />
          </Box>
        )}
        <Box sx={{ minWidth: 0 }}>
          {cut ? (
            <TestCutResults
              cut={cut}
              actions={
                canRecord && !cut.locked ? (
                  <DeleteRecordButton
                    machineId={machineId}
                    kind="test-cuts"
                    id={cut.id}
                    what="this test cut"
                    onDeleted={() => setSelectedId(null)}
                  />
                ) : undefined
              }
            />
          ) : (
            <Typography color="text.secondary">No test cut yet.</Typography>
          )}
          {list.length > 1 && (
            <TextField
              select
              label="Earlier cuts"
              value={cut?.id ?? ''}
              onChange={(e) => setSelectedId(e.target.value)}
              sx={{ mt: 2, minWidth: { sm: 280 }, maxWidth: '100%' }}
            >
              {list.map((c) => (
                <MenuItem key={c.id} value={c.id}>
                  {showDate(c.recordedAt)} · {c.status === 'within-target' ? 'within target' : 'outside target'}
                </MenuItem>
              ))}
            </TextField>
          )}
        </Box>
      </Box>
    </Paper>
  );
}
