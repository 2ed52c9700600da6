import { useState } from 'react';
import { Box, List, ListItem, ListItemText, MenuItem, Paper, Stack, TextField, Typography } from '@mui/material';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import type { LengthUnit } from '../../../lib/units';
import { useBedGrids } from '../api/get-bed-grids';
import { isLengthUnit, showDate, showLength, showTarget } from '../utils/format';
import { namePoint } from '../utils/grid-labels';
import { BedGridEntry } from './bed-grid-entry';
import { BedGridMap } from './bed-grid-map';
import { StatusChip } from './status-chip';
import { UnreadableRecord } from '../../../components/unreadable-record';
import { DeleteRecordButton } from './delete-record-button';

const DIGITS: Record<LengthUnit, number> = { mm: 2, um: 0, in: 4, thou: 1 };

/** Bed flatness: grid entry, the colour map of residuals, the worst points and earlier grids. */
export function BedGridSection({ machineId, workArea, canRecord }: { machineId: string; workArea: { x: number; y: number }; canRecord: boolean }) {
  const grids = useBedGrids(machineId);
  const [selectedId, setSelectedId] = useState<string | null>(null);
  if (grids.isPending) return <LoadingState label="Loading bed grids…" />;
  if (grids.isError) return <ErrorState error={grids.error} onRetry={() => grids.refetch()} />;
  const list = grids.data;
  const g = list.find((x) => x.id === selectedId) ?? list[0];
  const unit = g?.unit ?? 'mm';
  const targetUnit: LengthUnit = g && isLengthUnit(g.target.unit) ? g.target.unit : unit;

  return (
    <Paper sx={{ p: { xs: 2, md: 2.5 } }} component="section" aria-labelledby="bed-grid-title">
      <Typography variant="h3" id="bed-grid-title" gutterBottom>
        Bed grid
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        Heights over the bed or slats on a grid. A least-squares plane is fitted through them; flatness is the spread of the heights about that plane, and the plane's slope is the tilt. For a plasma table what matters is the bed parallel to the torch's travel, not level to the floor.
      </Typography>
      <Box sx={{ display: 'grid', gap: 3, gridTemplateColumns: { xs: '1fr', lg: canRecord ? 'minmax(360px, 1fr) 1fr' : '1fr' } }}>
        {canRecord && <BedGridEntry machineId={machineId} workArea={workArea} onSaved={(x) => setSelectedId(x.id)} />}
        <Box>
          {g && !g.result ? (
            <Stack spacing={1.5}>
              <UnreadableRecord message={g.unreadable ?? 'This bed grid cannot be read.'} />
              <Typography variant="body2" color="text.secondary">
                Recorded {showDate(g.recordedAt)} by {g.recordedBy.name}
              </Typography>
              {canRecord && !g.locked && <DeleteRecordButton machineId={machineId} kind="bed-grids" id={g.id} what="this bed grid" onDeleted={() => setSelectedId(null)} />}
            </Stack>
          ) : g && g.result ? (
            <Stack spacing={1.5}>
              <Box sx={{ display: 'flex', gap: 1.5, alignItems: 'center', flexWrap: 'wrap' }}>
                <Typography variant="h4" component="p" data-testid="flatness-result">
                  Flatness {showLength(g.result.leastSquares.flatnessMm, targetUnit)}
                  {targetUnit !== 'mm' && ` (${showLength(g.result.leastSquares.flatnessMm, 'mm')})`}
                </Typography>
                <StatusChip status={g.status} />
                {canRecord && !g.locked && <DeleteRecordButton machineId={machineId} kind="bed-grids" id={g.id} what="this bed grid" onDeleted={() => setSelectedId(null)} />}
              </Box>
              <Typography variant="body2" color="text.secondary">
                Target {showTarget(g.target)} · {g.target.source}
              </Typography>
              <Typography variant="body2">
                Tilt {g.result.tilt.mmPerMetre.toFixed(3)} mm/m (X {g.result.tilt.xMmPerMetre.toFixed(3)} mm/m, Y {g.result.tilt.yMmPerMetre.toFixed(3)} mm/m) · {g.rows} × {g.columns} points · {showDate(g.recordedAt)} by {g.recordedBy.name}
                {g.note ? ` · ${g.note}` : ''}
              </Typography>
              <BedGridMap points={g.result.points} unit={unit} worstIndex={g.result.worstPoints[0]?.index} />
              <Box>
                <Typography variant="h5" component="h4">Furthest from the plane</Typography>
                <List dense aria-label="Worst points" disablePadding>
                  {g.result.worstPoints.slice(0, 3).map((p) => (
                    <ListItem key={p.index} disableGutters>
                      <ListItemText primary={namePoint(p, unit, DIGITS[unit])} secondary={`X ${p.xMm} mm, Y ${p.yMm} mm`} />
                    </ListItem>
                  ))}
                </List>
              </Box>
            </Stack>
          ) : (
            <Typography color="text.secondary">No bed grid yet.</Typography>
          )}
        </Box>
      </Box>
      {list.length > 1 && (
        <TextField select label="Earlier grids" value={g?.id ?? ''} onChange={(e) => setSelectedId(e.target.value)} sx={{ mt: 2, minWidth: 320 }}>
          {list.map((x) => (
            <MenuItem key={x.id} value={x.id}>
              {showDate(x.recordedAt)} · {x.result ? `flatness ${showLength(x.result.leastSquares.flatnessMm, isLengthUnit(x.target.unit) ? x.target.unit : 'mm')} · ${x.status === 'within-target' ? 'within' : 'outside'}` : 'cannot be read'}
            </MenuItem>
          ))}
        </TextField>
      )}
    </Paper>
  );
}
