import { Box, Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { ErrorState } from '../../../components/states/error-state';
import { LoadingState } from '../../../components/states/loading-state';
import { useTravelEnvelope } from '../api/get-travel-envelope';
import { showTarget } from '../utils/format';
import { DriveStatusChip } from './drive-status-chip';

const mm = (v: number | null) => (v === null ? '—' : `${Number(v.toFixed(1))} mm`);

/** Whether the X and Y axes (both sides of a dual-drive gantry) travel the work area plus the margin. */
export function TravelEnvelopeCard({ machineId }: { machineId: string }) {
  const q = useTravelEnvelope(machineId);
  if (q.isPending) return <LoadingState label="Checking the travel envelope…" />;
  if (q.isError) return <ErrorState error={q.error} onRetry={() => q.refetch()} />;
  const e = q.data;
  return (
    <Paper sx={{ p: 2.5 }} component="section" aria-labelledby="envelope-title">
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.5, flexWrap: 'wrap', mb: 1 }}>
        <Typography variant="h4" component="h3" id="envelope-title" sx={{ flex: '1 1 auto' }}>
          Travel envelope
        </Typography>
        <DriveStatusChip status={e.status} />
      </Box>
      <Typography color="text.secondary" sx={{ mb: 1.5 }}>
        Work area {e.workArea.x} × {e.workArea.y} mm; each X and Y axis must travel it plus {showTarget(e.margin)} (
        {e.margin.source ?? 'target set'}). {e.summary}.
      </Typography>
      {e.axes.length > 0 && (
        <Box sx={{ overflowX: 'auto' }}>
          <Table size="small" aria-label="Travel envelope">
            <TableHead>
              <TableRow>
                <TableCell>Axis</TableCell>
                <TableCell align="right">Measured travel</TableCell>
                <TableCell align="right">Work size</TableCell>
                <TableCell align="right">Needed</TableCell>
                <TableCell align="right">Spare</TableCell>
                <TableCell>Covers</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {e.axes.map((a) => (
                <TableRow key={a.axisId}>
                  <TableCell>{a.axis}</TableCell>
                  <TableCell align="right">{mm(a.measuredTravel)}</TableCell>
                  <TableCell align="right">{mm(a.workSize)}</TableCell>
                  <TableCell align="right">{mm(a.requiredTravel)}</TableCell>
                  <TableCell align="right" sx={{ color: a.spare !== null && a.spare < 0 ? 'error.main' : undefined }}>
                    {a.spare === null ? '—' : `${a.spare >= 0 ? '+' : ''}${a.spare.toFixed(1)} mm`}
                  </TableCell>
                  <TableCell>{a.covers === null ? 'Not measured' : a.covers ? 'Yes' : 'No'}</TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </Box>
      )}
    </Paper>
  );
}
