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
import { ResultWarnings } from './result-warnings';
import type { GridPointResult } from '../types';

const DIGITS: Record<LengthUnit, number> = { mm: 2, um: 0, in: 4, thou: 1 };

/** Bed flatness: grid entry, the colour map of residuals, the worst points and earlier grids. */
export function BedGridSection({
  machineId,
  machineKind,
  workArea,
  canRecord,
}: {
  machineId: string;
  machineKind: string;
  workArea: { x: number; y: number };
  canRecord: boolean;
}) {
  const grids = useBedGrids(machineId);
  const [selectedId, setSelectedId] = useState<string | null>(null);
  if (grids.isPending) return <LoadingState label="Loading bed grids…" />;
  if (grids.isError) return <ErrorState error={grids.error} onRetry={() => grids.refetch()} />;
  const list = grids.data;
  const g = list.find((x) => x.id === selectedId) ?? list[0];
  const unit = g?.readingUnit ?? 'mm';
  const lengthUnit = g?.lengthUnit ?? 'mm';
  const targetUnit: LengthUnit = g && isLengthUnit(g.target.unit) ? g.target.unit : unit;
  const judgedValue = g?.result?.judged.valueMm ?? 0;
  // Drawn about the middle of the judged zone, so the colours show where the bed is high or low in it.
  const aboutMiddle = (p: GridPointResult) => p.judgedHeightMm - judgedValue / 2;
  const reference =
    g?.result?.judged.basis === 'height-range' ? 'the middle of the height range' : 'the middle of the minimum zone';
  const both = (mm: number) =>
    `${showLength(mm, targetUnit)}${targetUnit !== unit ? ` (${showLength(mm, unit)})` : ''}`;

  return (
    <Paper sx={{ p: { xs: 2, md: 2.5 } }} component="section" aria-labelledby="bed-grid-title">
      <Typography variant="h3" id="bed-grid-title" gutterBottom>
        Bed grid
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        {machineKind === 'plasma'
          ? 'Heights over the bed or slats on a grid, read from a gauge carried by the gantry. For a plasma table what matters is the bed parallel to the plane the torch travels in, not level to the floor nor flat after a tilt is taken out: the judged value is the range of the heights as read, tilt left in, against the torch-height target. Minimum-zone flatness (ISO 1101) and least squares are shown beside it.'
          : 'Heights over the bed or spoilboard on a grid. The judged value is minimum-zone flatness (ISO 1101: the smallest distance between two parallel planes holding every point); least-squares flatness and the tilt are shown beside it.'}
      </Typography>
      <Box
        sx={{
          display: 'grid',
          gap: 3,
          gridTemplateColumns: {
            xs: 'minmax(0, 1fr)',
            lg: canRecord ? 'minmax(360px, 1fr) minmax(0, 1fr)' : 'minmax(0, 1fr)',
          },
        }}
      >
        {canRecord && (
          <Box data-print="hide">
            <BedGridEntry machineId={machineId} workArea={workArea} onSaved={(x) => setSelectedId(x.id)} />
          </Box>
        )}
        <Box>
          {g && !g.result ? (
            <Stack spacing={1.5}>
              <UnreadableRecord message={g.unreadable ?? 'This bed grid cannot be read.'} />
              <Typography variant="body2" color="text.secondary">
                Recorded {showDate(g.recordedAt)} by {g.recordedBy.name}
              </Typography>
              {canRecord && !g.locked && (
                <DeleteRecordButton
                  machineId={machineId}
                  kind="bed-grids"
                  id={g.id}
                  what="this bed grid"
                  onDeleted={() => setSelectedId(null)}
                />
              )}
            </Stack>
          ) : g && g.result ? (
            <Stack spacing={1.5}>
              <Box sx={{ display: 'flex', gap: 1.5, alignItems: 'center', flexWrap: 'wrap' }}>
                <Typography variant="h4" component="p" data-testid="flatness-result">
                  {g.result.judged.label}: {both(g.result.judged.valueMm)}
                </Typography>
                <StatusChip status={g.status} />
                {canRecord && !g.locked && (
                  <DeleteRecordButton
                    machineId={machineId}
                    kind="bed-grids"
                    id={g.id}
                    what="this bed grid"
                    onDeleted={() => setSelectedId(null)}
                  />
                )}
              </Box>
              <Typography variant="body2" color="text.secondary">
                Target {showTarget(g.target)} · {g.target.source}
              </Typography>
              <Box
                component="dl"
                sx={{
                  display: 'grid',
                  gridTemplateColumns: 'auto 1fr',
                  columnGap: 2,
                  rowGap: 0.25,
                  m: 0,
                  '& dd': { m: 0 },
                }}
                aria-label="Bed flatness figures"
              >
                {(
                  [
                    ['height-range', 'Height range, tilt left in', g.result.heightRange.rangeMm],
                    ['minimum-zone', 'Minimum-zone flatness (ISO 1101)', g.result.minimumZone.flatnessMm],
                    [null, 'Least-squares flatness', g.result.leastSquares.flatnessMm],
                  ] as const
                ).map(([basis, label, mm]) => (
                  <Box key={label} sx={{ display: 'contents' }}>
                    <Typography
                      component="dt"
                      variant="body2"
                      sx={{ fontWeight: basis === g.result!.judged.basis ? 700 : 400 }}
                    >
                      {label}
                      {basis === g.result!.judged.basis ? ' (judged)' : ''}
                    </Typography>
                    <Typography component="dd" variant="body2">
                      {both(mm)}
                    </Typography>
                  </Box>
                ))}
              </Box>
              <ResultWarnings warnings={g.warnings} label="Bed grid warnings" />
              <Typography variant="body2">
                Tilt {g.result.tilt.mmPerMetre.toFixed(3)} mm/m (X {g.result.tilt.xMmPerMetre.toFixed(3)} mm/m, Y{' '}
                {g.result.tilt.yMmPerMetre.toFixed(3)} mm/m) · {g.rows} × {g.columns} points · {showDate(g.recordedAt)}{' '}
                by {g.recordedBy.name}
                {g.note ? ` · ${g.note}` : ''}
              </Typography>
              <BedGridMap
                points={g.result.points}
                unit={unit}
                lengthUnit={lengthUnit}
                valueOf={aboutMiddle}
                reference={reference}
                worstIndex={g.result.worstPoints[0]?.index}
              />
              <Box>
                <Typography variant="h5" component="h4">
                  Furthest from {reference}
                </Typography>
                <List dense aria-label="Worst points" disablePadding>
                  {g.result.worstPoints.slice(0, 3).map((p) => (
                    <ListItem key={p.index} disableGutters>
                      <ListItemText
                        primary={namePoint(p, unit, DIGITS[unit], aboutMiddle(p))}
                        secondary={`X ${showLength(p.xMm, lengthUnit, lengthUnit === 'in' ? 2 : 0)}, Y ${showLength(p.yMm, lengthUnit, lengthUnit === 'in' ? 2 : 0)}`}
                      />
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
        <TextField
          select
          label="Earlier grids"
          value={g?.id ?? ''}
          onChange={(e) => setSelectedId(e.target.value)}
          sx={{ mt: 2, minWidth: { sm: 320 }, maxWidth: '100%' }}
        >
          {list.map((x) => (
            <MenuItem key={x.id} value={x.id}>
              {showDate(x.recordedAt)} ·{' '}
              {x.result
                ? `${x.result.judged.basis === 'height-range' ? 'height range' : 'flatness'} ${showLength(x.result.judged.valueMm, isLengthUnit(x.target.unit) ? x.target.unit : 'mm')} · ${x.status === 'within-target' ? 'within' : 'outside'}`
                : 'cannot be read'}
            </MenuItem>
          ))}
        </TextField>
      )}
    </Paper>
  );
}
