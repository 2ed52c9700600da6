import { Paper, Table, TableBody, TableCell, TableContainer, TableHead, TableRow, Typography } from '@mui/material';
import type { TravelTrial } from '../types';
import { showDateTime, showPercent } from '../utils/format';
import { DriveStatusChip } from './drive-status-chip';

/** Every trial of the axis, newest first; a row opens it above. */
export function TravelTrialHistory({ trials, selectedId, onSelect }: { trials: TravelTrial[]; selectedId: string | null; onSelect: (id: string) => void }) {
  if (trials.length < 2) return null;
  return (
    <TableContainer component={Paper}>
      <Typography variant="h5" component="h4" sx={{ px: 2, pt: 1.5 }}>
        Earlier trials
      </Typography>
      <Table size="small" aria-label="Travel trials">
        <TableHead>
          <TableRow>
            <TableCell>Recorded</TableCell>
            <TableCell align="right">Moves</TableCell>
            <TableCell align="right">Scale error</TableCell>
            <TableCell align="right">Corrected</TableCell>
            <TableCell>Status</TableCell>
            <TableCell>Applied</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {trials.map((t) => (
            <TableRow key={t.id} hover selected={t.id === selectedId} onClick={() => onSelect(t.id)} sx={{ cursor: 'pointer' }}>
              <TableCell>{showDateTime(t.recordedAt)}</TableCell>
              <TableCell align="right">{t.moves.length}</TableCell>
              <TableCell align="right">{showPercent(t.result.errorPercent)}</TableCell>
              <TableCell align="right">{Number(t.result.correctedStepsPerMm.toFixed(4))} steps/mm</TableCell>
              <TableCell>
                <DriveStatusChip status={t.status} />
              </TableCell>
              <TableCell>{t.appliedAt ? `Yes, by ${t.appliedBy}` : 'No'}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
