import { UNIT_LABELS } from '../../../lib/units';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import {
  Box,
  Button,
  Link,
  Paper,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import AddOutlined from '@mui/icons-material/AddOutlined';
import { paths } from '../../../config/paths';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { EmptyState } from '../../../components/states/empty-state';
import { useMe } from '../../../lib/session/get-me';
import { canRecord as mayRecord } from '../../../lib/session/roles';
import { useRails } from '../api/get-rails';
import { showInTargetUnit, showTarget } from '../utils/display';
import { AddRailDialog } from './add-rail-dialog';
import { CheckStatusChip } from './check-status-chip';
import { UnreadableRecord } from '../../../components/unreadable-record';
import { PairParallelismSummary } from './pair-parallelism-summary';
import { ResponsiveTable } from '../../../components/table/responsive-table';

/** The machine file's rails: each with its latest straightness, and each partner pair's parallelism. */
export function RailsPanel({ machineId }: { machineId: string }) {
  const rails = useRails(machineId);
  const me = useMe();
  const canRecord = mayRecord(me.data?.role);
  const [adding, setAdding] = useState(false);
  if (rails.isPending) return <LoadingState label="Loading rails…" />;
  if (rails.isError) return <ErrorState error={rails.error} onRetry={() => rails.refetch()} />;
  const list = rails.data;
  const byId = new Map(list.map((r) => [r.id, r]));
  // Each pair once, named in label order (Y1 and Y2).
  const pairs = list.filter((r) => {
    const p = r.partnerRailId ? byId.get(r.partnerRailId) : undefined;
    return !!p && (r.label.localeCompare(p.label) || r.id.localeCompare(p.id)) < 0;
  });
  const addButton = canRecord && (
    <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setAdding(true)}>
      Add rail
    </Button>
  );

  return (
    <Stack spacing={2}>
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 2, flexWrap: 'wrap' }}>
        <Typography color="text.secondary" sx={{ flex: '1 1 320px' }}>
          Straightness is judged on the least-squares line of each rail's latest sweep; minimum zone is shown beside it.
        </Typography>
        {list.length > 0 && addButton}
      </Box>
      {list.length === 0 ? (
        <EmptyState title="No rails yet" action={addButton || undefined}>
          Add each linear rail with its length and hole pitch, then sweep it with an indicator.
        </EmptyState>
      ) : (
        <ResponsiveTable component={Paper}>
          <Table aria-label="Rails" size="small" sx={{ '& td, & th': { py: 1.25 } }}>
            <TableHead>
              <TableRow>
                <TableCell>Rail</TableCell>
                <TableCell>Length · holes</TableCell>
                <TableCell>Latest straightness</TableCell>
                <TableCell>Status</TableCell>
                <TableCell>Partner</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {list.map((r) => {
                const s = r.latestSweep;
                const partner = r.partnerRailId ? byId.get(r.partnerRailId) : undefined;
                return (
                  <TableRow key={r.id} hover>
                    <TableCell>
                      <Link component={RouterLink} to={paths.rail(machineId, r.id)} sx={{ fontWeight: 600 }}>
                        {r.label}
                      </Link>
                      <Typography variant="body2" color="text.secondary">
                        Axis {r.axis}
                        {r.profileSize ? ` · ${r.profileSize} mm profile` : ''}
                      </Typography>
                    </TableCell>
                    <TableCell>
                      {r.unreadable ? (
                        <UnreadableRecord inline message={r.unreadable} />
                      ) : (
                        `${r.length} ${UNIT_LABELS[r.lengthUnit]} · ${r.holes.length} holes`
                      )}
                      <Typography variant="body2" color="text.secondary">
                        pitch {r.holePitch} {UNIT_LABELS[r.lengthUnit]}
                      </Typography>
                    </TableCell>
                    <TableCell>
                      {s && (s.leastSquaresStraightness === null || s.minimumZoneStraightness === null) ? (
                        <UnreadableRecord inline message={s.unreadable ?? ''} />
                      ) : s && s.leastSquaresStraightness !== null && s.minimumZoneStraightness !== null ? (
                        <>
                          {s.target.reference === 'least-squares'
                            ? `${showInTargetUnit(s.leastSquaresStraightness, s.target)} least squares`
                            : `${showInTargetUnit(s.minimumZoneStraightness, s.target)} minimum zone`}
                          <Typography variant="body2" color="text.secondary">
                            {s.target.reference === 'least-squares'
                              ? `${showInTargetUnit(s.minimumZoneStraightness, s.target)} minimum zone`
                              : `${showInTargetUnit(s.leastSquaresStraightness, s.target)} least squares`}{' '}
                            · target {showTarget(s.target)} (
                            {s.target.reference === 'least-squares'
                              ? 'least squares'
                              : s.target.reference
                                ? 'minimum zone'
                                : 'least squares, as saved'}
                            ){s.localSlopeMmPerM !== null ? ` · slope ${s.localSlopeMmPerM.toFixed(3)} mm/m` : ''} ·{' '}
                            {s.face} face · {r.sweepCount} sweep{r.sweepCount === 1 ? '' : 's'}
                          </Typography>
                        </>
                      ) : (
                        <Typography color="text.secondary">No sweep yet</Typography>
                      )}
                    </TableCell>
                    <TableCell>
                      <CheckStatusChip status={s ? s.status : 'not-started'} />
                    </TableCell>
                    <TableCell>{partner ? partner.label : '—'}</TableCell>
                  </TableRow>
                );
              })}
            </TableBody>
          </Table>
        </ResponsiveTable>
      )}
      {pairs.length > 0 && (
        <Stack spacing={1.5}>
          <Typography variant="h4" component="h3">
            Partner rails
          </Typography>
          {pairs.map((r) => (
            <PairParallelismSummary
              key={r.id}
              railId={r.id}
              title={`${r.label} and ${byId.get(r.partnerRailId!)!.label}`}
            />
          ))}
        </Stack>
      )}
      {canRecord && <AddRailDialog machineId={machineId} rails={list} open={adding} onClose={() => setAdding(false)} />}
    </Stack>
  );
}
