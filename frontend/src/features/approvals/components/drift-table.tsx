import { ResponsiveTable } from '../../../components/table/responsive-table';
import { Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { palette } from '../../../theme/theme';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { EmptyState } from '../../../components/states/empty-state';
import { useDrift } from '../api/get-drift';
import { dateOnly, dateTime, num, resultText, targetText, unitLabel } from '../format';
import { KIND_LABELS, type DriftRow, type DriftSide } from '../types';
import { CheckStatusChip } from './check-status-chip';

function Side({ side }: { side: DriftSide | null }) {
  if (!side)
    return (
      <Typography variant="body2" color="text.secondary">
        not in this round
      </Typography>
    );
  return (
    <>
      <Typography variant="body2" sx={{ fontWeight: 600, fontVariantNumeric: 'tabular-nums' }}>
        {resultText(side.result)}
      </Typography>
      <CheckStatusChip status={side.status} />
      {side.recordedAt && (
        <Typography variant="caption" color="text.secondary" component="div">
          recorded {dateOnly(side.recordedAt)}
        </Typography>
      )}
    </>
  );
}

function Change({ row }: { row: DriftRow }) {
  if (!row.rechecked)
    return (
      <Typography variant="body2" color="text.secondary">
        not re-checked yet
      </Typography>
    );
  if (row.change === null)
    return (
      <Typography variant="body2" color="text.secondary">
        —
      </Typography>
    );
  const colour = row.worse ? palette.outside : 'text.primary';
  return (
    <Typography variant="body2" sx={{ color: colour, fontWeight: 600, fontVariantNumeric: 'tabular-nums' }}>
      {row.change > 0 ? '+' : ''}
      {num(row.change)} {row.unit ? unitLabel(row.unit) : ''}
      {row.worse && ' (now outside target)'}
    </Typography>
  );
}

/** What drifted: each check of the approved round beside its latest result. */
export function DriftTable({ machineId }: { machineId: string }) {
  const drift = useDrift(machineId);
  if (drift.isPending) return <LoadingState label="Comparing with the approved round…" />;
  if (drift.isError) return <ErrorState error={drift.error} onRetry={() => drift.refetch()} />;
  if (!drift.data.approval)
    return (
      <EmptyState title="Nothing to compare yet">
        Once the machine is approved, a re-check round is compared here with the approved one.
      </EmptyState>
    );
  return (
    <ResponsiveTable component={Paper}>
      <Typography variant="body2" color="text.secondary" sx={{ px: 2, pt: 1.5 }}>
        Approved round of {dateTime(drift.data.approval.approvedAt)} by {drift.data.approval.approvedBy}, beside the
        latest result of each check.
      </Typography>
      <Table size="small" aria-label="What drifted">
        <TableHead>
          <TableRow>
            <TableCell>Check</TableCell>
            <TableCell>Target</TableCell>
            <TableCell>Approved round</TableCell>
            <TableCell>Latest</TableCell>
            <TableCell>Change</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {drift.data.rows.map((r) => (
            <TableRow key={r.key}>
              <TableCell>
                <Typography variant="body2" sx={{ fontWeight: 600 }}>
                  {KIND_LABELS[r.kind]}
                </Typography>
                <Typography variant="body2" color="text.secondary">
                  {r.subject}
                </Typography>
              </TableCell>
              <TableCell sx={{ whiteSpace: 'nowrap' }}>{targetText(r.kind, r.target)}</TableCell>
              <TableCell>
                <Side side={r.approved} />
              </TableCell>
              <TableCell>
                <Side side={r.latest} />
              </TableCell>
              <TableCell>
                <Change row={r} />
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </ResponsiveTable>
  );
}
