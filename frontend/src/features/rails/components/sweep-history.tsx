import { useEffect, useEffectEvent, useRef, useState } from 'react';
import {
  Alert,
  Box,
  Button,
  Checkbox,
  IconButton,
  Paper,
  Snackbar,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Tooltip,
  Typography,
} from '@mui/material';
import DeleteOutline from '@mui/icons-material/DeleteOutlined';
import LockOutlined from '@mui/icons-material/LockOutlined';
import EditOutlined from '@mui/icons-material/EditOutlined';
import { SweepOverlayChart } from '../../../components/charts/sweep-overlay-chart';
import { fromMm, UNIT_LABELS } from '../../../lib/units';
import { useDeleteSweep } from '../api/delete-sweep';
import { useSweepsById } from '../api/get-sweep';
import { useSweeps, type SweepListItem } from '../api/get-sweeps';
import { PHASE_LABELS } from '../types';
import { isLengthUnit, showInTargetUnit, showTarget, targetMm } from '../utils/display';
import { CheckStatusChip } from './check-status-chip';
import { SweepResult } from './sweep-result';
import { EditSweepDetailsDialog } from './edit-sweep-details-dialog';
import { UnreadableRecord } from '../../../components/unreadable-record';
import { ResponsiveTable } from '../../../components/table/responsive-table';
import { formatDateTime } from '../../../lib/format-time';

/** The straightness target as a zone of its full width, in the chart's unit. */
const targetZone = (t: { value: number; unit: string } | undefined, unit: Parameters<typeof fromMm>[1]) =>
  t && isLengthUnit(t.unit) ? { width: fromMm(targetMm(t), unit), label: `Target zone ${showTarget(t)} wide` } : null;

/** How long a deleted sweep can be brought back before the delete is sent. */
const UNDO_MS = 8000;

const when = (s: { takenAt: string }) => formatDateTime(s.takenAt);

/**
 * The rail's sweeps, newest first, a page at a time; pick two to overlay, open one to see its
 * residuals. The list holds summaries; the readings of the sweeps overlaid or opened are fetched.
 */
export function SweepHistory({ sweeps, canRecord }: { sweeps: SweepListItem[]; canRecord: boolean }) {
  // Until someone picks, the overlay follows the two newest sweeps.
  const [chosenIds, setPicked] = useState<string[] | null>(null);
  const picked = chosenIds ?? sweeps.slice(0, 2).map((s) => s.id);
  const [open, setOpen] = useState<string | null>(null);
  const [editing, setEditing] = useState<SweepListItem | null>(null);
  const remove = useDeleteSweep();
  // A delete waits a few seconds (the row hidden) so it can be undone; then it is sent.
  const [deleting, setDeleting] = useState<SweepListItem | null>(null);
  const timer = useRef<number | undefined>(undefined);
  const waitingDelete = useRef<SweepListItem | null>(null);
  const sendDelete = (s: SweepListItem) => {
    window.clearTimeout(timer.current);
    waitingDelete.current = null;
    remove.mutate(s.id);
  };
  const askDelete = (s: SweepListItem) => {
    // One at a time: a delete already waiting goes ahead now.
    if (waitingDelete.current) sendDelete(waitingDelete.current);
    waitingDelete.current = s;
    setDeleting(s);
    timer.current = window.setTimeout(() => {
      sendDelete(s);
      setDeleting(null);
    }, UNDO_MS);
  };
  const undoDelete = () => {
    window.clearTimeout(timer.current);
    waitingDelete.current = null;
    setDeleting(null);
  };
  // Leaving the page does not cancel a delete the person asked for.
  const sendWaitingDelete = useEffectEvent(() => {
    if (waitingDelete.current) sendDelete(waitingDelete.current);
  });
  useEffect(() => () => sendWaitingDelete(), []);
  const more = useSweeps(sweeps[0]?.railId ?? '');
  const full = useSweepsById([...picked, ...(open && !picked.includes(open) ? [open] : [])]);
  const shown = sweeps.filter((s) => s.id !== deleting?.id);
  if (!sweeps.length) return null;
  // A sweep whose readings or result cannot be read has nothing to draw.
  const chosen = full
    .filter((s) => picked.includes(s.id))
    .flatMap((s) => (s.result && s.stations ? [{ ...s, result: s.result, stations: s.stations }] : []));
  const unit = chosen[0]?.readingUnit ?? sweeps[0].readingUnit;
  const toggle = (id: string) =>
    setPicked(picked.includes(id) ? picked.filter((x) => x !== id) : [...picked, id].slice(-2));
  const opened = full.find((s) => s.id === open);

  return (
    <Stack spacing={2}>
      <Paper component="section" aria-label="Sweep history" sx={{ p: { xs: 1.5, sm: 2.5 } }}>
        <Typography variant="h3" component="h2" gutterBottom>
          Sweep history
        </Typography>
        {remove.error && (
          <Alert severity="error" sx={{ mb: 1 }}>
            {remove.error.message}
          </Alert>
        )}
        <ResponsiveTable titleFirst={false}>
          <Table size="small" aria-label="Sweeps">
            <TableHead>
              <TableRow>
                <TableCell padding="checkbox">Overlay</TableCell>
                <TableCell>Taken</TableCell>
                <TableCell>Phase</TableCell>
                <TableCell>Least squares</TableCell>
                <TableCell>Minimum zone</TableCell>
                <TableCell>Status</TableCell>
                <TableCell />
              </TableRow>
            </TableHead>
            <TableBody>
              {shown.map((s) => (
                <TableRow key={s.id} hover selected={open === s.id}>
                  <TableCell padding="checkbox">
                    <Checkbox
                      checked={picked.includes(s.id)}
                      onChange={() => toggle(s.id)}
                      slotProps={{ input: { 'aria-label': `Overlay the sweep of ${when(s)}` } }}
                    />
                  </TableCell>
                  <TableCell>
                    {when(s)}
                    <Typography variant="body2" color="text.secondary">
                      {s.takenBy}
                      {s.datum ? ` · ${s.datum}` : ''}
                    </Typography>
                  </TableCell>
                  <TableCell>{PHASE_LABELS[s.phase]}</TableCell>
                  {s.leastSquaresStraightness === null || s.minimumZoneStraightness === null ? (
                    <TableCell colSpan={2}>
                      <UnreadableRecord inline message={s.unreadable ?? ''} />
                    </TableCell>
                  ) : (
                    <>
                      <TableCell>{showInTargetUnit(s.leastSquaresStraightness, s.target)}</TableCell>
                      <TableCell>{showInTargetUnit(s.minimumZoneStraightness, s.target)}</TableCell>
                    </>
                  )}
                  <TableCell>
                    <CheckStatusChip status={s.status} />
                  </TableCell>
                  <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                    <Button size="small" onClick={() => setOpen(open === s.id ? null : s.id)}>
                      {open === s.id ? 'Close' : 'Open'}
                    </Button>
                    {canRecord && !s.locked && (
                      <Button
                        size="small"
                        startIcon={<EditOutlined />}
                        onClick={() => setEditing(s)}
                        aria-label={`Edit details of the sweep of ${when(s)}`}
                      >
                        Edit details
                      </Button>
                    )}
                    {s.locked ? (
                      <Tooltip title="Part of an approval: kept as it is">
                        <LockOutlined
                          fontSize="small"
                          sx={{ verticalAlign: 'middle', color: 'text.secondary', ml: 1 }}
                          aria-label="Locked by an approval"
                        />
                      </Tooltip>
                    ) : (
                      canRecord && (
                        <IconButton
                          size="small"
                          aria-label={`Delete the sweep of ${when(s)}`}
                          onClick={() => askDelete(s)}
                        >
                          <DeleteOutline fontSize="small" />
                        </IconButton>
                      )
                    )}
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </ResponsiveTable>
        {more.hasNextPage && (
          <Box sx={{ mt: 1 }}>
            <Button onClick={() => more.fetchNextPage()} disabled={more.isFetchingNextPage}>
              {more.isFetchingNextPage ? 'Loading older sweeps…' : 'Load older sweeps'}
            </Button>
          </Box>
        )}
        {chosen.length > 0 && (
          <Box sx={{ mt: 2 }}>
            <Typography color="text.secondary" sx={{ mb: 1 }}>
              Deviation of each sweep from its own least-squares line, so sweeps zeroed differently compare shape for
              shape.
            </Typography>
            <SweepOverlayChart
              label="Sweeps overlaid"
              unitLabel={UNIT_LABELS[unit]}
              yLabel="Deviation"
              target={targetZone(sweeps.find((s) => s.id === chosen[0].id)?.target, unit)}
              series={chosen.map((s) => ({
                name: `${when(s)} (${PHASE_LABELS[s.phase].toLowerCase()})`,
                points: s.stations.map((st, i) => ({
                  position: st.positionMm,
                  value: fromMm(s.result.leastSquares.residuals[i], unit),
                })),
              }))}
            />
          </Box>
        )}
      </Paper>
      {editing && (
        <EditSweepDetailsDialog
          sweepId={editing.id}
          title={`sweep of ${when(editing)}`}
          onClose={() => setEditing(null)}
        />
      )}
      {opened && <SweepResult sweep={opened} title={`Sweep of ${when(opened)}`} />}
      <Snackbar
        open={!!deleting}
        message={deleting ? `Deleted the sweep of ${when(deleting)}` : ''}
        action={
          <Button
            color="inherit"
            size="small"
            onClick={undoDelete}
            aria-label={deleting ? `Undo deleting the sweep of ${when(deleting)}` : 'Undo'}
          >
            Undo
          </Button>
        }
      />
    </Stack>
  );
}
