import { Box, Button, Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import type { TravelTrialListItem } from '../api/get-travel-trials';
import { showDateTime, showPercent } from '../utils/format';
import { UnreadableRecord } from '../../../components/unreadable-record';
import { DriveStatusChip } from './drive-status-chip';
import { ResponsiveTable } from '../../../components/table/responsive-table';

interface Props {
  trials: TravelTrialListItem[];
  selectedId: string | null;
  onSelect: (id: string) => void;
  /** More trials than one page: the button below asks for the next. */
  hasOlder: boolean;
  loadingOlder: boolean;
  onLoadOlder: () => void;
}

/** The axis's trials, newest first, a page at a time; a row opens it above. */
export function TravelTrialHistory({ trials, selectedId, onSelect, hasOlder, loadingOlder, onLoadOlder }: Props) {
  if (trials.length < 2) return null;
  return (
    <ResponsiveTable component={Paper}>
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
            <TableCell>Warnings</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {trials.map((t) => (
            <TableRow
              key={t.id}
              hover
              selected={t.id === selectedId}
              onClick={() => onSelect(t.id)}
              sx={{ cursor: 'pointer' }}
            >
              <TableCell>{showDateTime(t.recordedAt)}</TableCell>
              <TableCell align="right">{t.moveCount}</TableCell>
              {t.result ? (
                <>
                  <TableCell align="right">{showPercent(t.result.errorPercent)}</TableCell>
                  <TableCell align="right">{`${Number(t.result.correctedStepsPerMm.toFixed(4))} steps/mm`}</TableCell>
                </>
              ) : (
                <TableCell colSpan={2}>
                  <UnreadableRecord inline message={t.unreadable ?? ''} />
                </TableCell>
              )}
              <TableCell>
                <DriveStatusChip status={t.status} />
              </TableCell>
              <TableCell>{t.appliedAt ? `Yes, by ${t.appliedBy}` : 'No'}</TableCell>
              <TableCell title={t.warnings.map((w) => w.message).join('\n')}>
                {t.warnings.length ? `${t.warnings.length} warning${t.warnings.length === 1 ? '' : 's'}` : '—'}
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
      {hasOlder && (
        <Box sx={{ px: 2, py: 1 }}>
          <Button onClick={onLoadOlder} disabled={loadingOlder}>
            {loadingOlder ? 'Loading older trials…' : 'Load older trials'}
          </Button>
        </Box>
      )}
    </ResponsiveTable>
  );
}
