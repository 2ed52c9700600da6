import { useState } from 'react';
import { Alert, Box, Paper, Stack, Typography } from '@mui/material';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { useDiagonalChecks } from '../api/get-diagonal-checks';
import type { DiagonalCheck } from '../types';
import { showDate, showTarget } from '../utils/format';
import { DeleteRecordButton } from './delete-record-button';
import { DiagonalCheckForm } from './diagonal-check-form';
import { SquarenessDrawing } from './squareness-drawing';
import { SquaringHistory } from './squaring-history';
import { UnreadableRecord } from '../../../components/unreadable-record';
import { StatusChip } from './status-chip';
import { ResultWarnings } from './result-warnings';

/** The four lengths the drawing needs, in mm; null when a stored one cannot be read (the record then has no result either). */
function drawableSides(mm: DiagonalCheck['inputMm']) {
  const { sideX, sideY, diagonal1, diagonal2 } = mm;
  return sideX === null || sideY === null || diagonal1 === null || diagonal2 === null
    ? null
    : { sideX, sideY, diagonal1, diagonal2 };
}

/** Squareness from the diagonals: entry, the drawing of the latest (or chosen) check, and the history. */
export function DiagonalCheckSection({ machineId, canRecord }: { machineId: string; canRecord: boolean }) {
  const checks = useDiagonalChecks(machineId);
  const [selectedId, setSelectedId] = useState<string | null>(null);
  if (checks.isPending) return <LoadingState label="Loading diagonal checks…" />;
  if (checks.isError) return <ErrorState error={checks.error} onRetry={() => checks.refetch()} />;
  const list = checks.data;
  const shown: DiagonalCheck | undefined = list.find((c) => c.id === selectedId) ?? list[0];
  const sides = shown ? drawableSides(shown.inputMm) : null;

  return (
    <Paper sx={{ p: { xs: 2, md: 2.5 } }} component="section" aria-labelledby="diagonal-check-title">
      <Typography variant="h3" id="diagonal-check-title" gutterBottom>
        Diagonal check
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        Mark or cut a large rectangle with the machine, measure both sides and both diagonals. Equal diagonals mean a
        square gantry; the difference gives the angle and how far to move one end of a dual-drive gantry (usually by
        offsetting its home switch), then re-home and check again.
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
            <DiagonalCheckForm machineId={machineId} onSaved={(c) => setSelectedId(c.id)} />
          </Box>
        )}
        <Box>
          {shown && !shown.result ? (
            <Stack spacing={1.5}>
              <UnreadableRecord message={shown.unreadable ?? 'This diagonal check cannot be read.'} />
              <Typography variant="body2" color="text.secondary">
                Recorded {showDate(shown.recordedAt)} by {shown.recordedBy.name}
              </Typography>
              {canRecord && !shown.locked && (
                <DeleteRecordButton
                  machineId={machineId}
                  kind="diagonal-checks"
                  id={shown.id}
                  what="this diagonal check"
                  onDeleted={() => setSelectedId(null)}
                />
              )}
            </Stack>
          ) : shown && shown.result ? (
            <Stack spacing={1.5}>
              <Box sx={{ display: 'flex', gap: 1.5, alignItems: 'center', flexWrap: 'wrap' }}>
                <Typography variant="h4" component="p" data-testid="squareness-result">
                  {shown.result.mmPerMetre.toFixed(3)} mm/m out of square · {shown.result.outOfSquareArcsec.toFixed(0)}″
                  ({shown.result.outOfSquareDeg.toFixed(4)}°)
                </Typography>
                <StatusChip status={shown.status} />
                {canRecord && !shown.locked && (
                  <DeleteRecordButton
                    machineId={machineId}
                    kind="diagonal-checks"
                    id={shown.id}
                    what="this diagonal check"
                    onDeleted={() => setSelectedId(null)}
                  />
                )}
              </Box>
              <Typography variant="body2" color="text.secondary">
                Recorded {showDate(shown.recordedAt)} by {shown.recordedBy.name}
                {shown.note ? ` · ${shown.note}` : ''}
              </Typography>
              <Typography variant="body2" color="text.secondary">
                Target {showTarget(shown.target)} · {shown.target.source}
              </Typography>
              {sides && (
                <SquarenessDrawing
                  sideXMm={sides.sideX}
                  sideYMm={sides.sideY}
                  diagonal1Mm={sides.diagonal1}
                  diagonal2Mm={sides.diagonal2}
                  outOfSquareRad={shown.result.outOfSquareRad}
                  longDiagonal={shown.result.longDiagonal}
                  correction={shown.result.correction}
                  unit={shown.lengthUnit}
                />
              )}
              <Alert severity={shown.result.correction.end ? 'info' : 'success'} icon={false}>
                {shown.result.correction.instruction}
              </Alert>
              <ResultWarnings warnings={shown.warnings} label="Diagonal check warnings" />
            </Stack>
          ) : (
            <Typography color="text.secondary">No diagonal check yet.</Typography>
          )}
        </Box>
      </Box>
      {list.length > 0 && (
        <Box sx={{ mt: 3 }}>
          <Typography variant="h4" gutterBottom>
            Squaring history
          </Typography>
          <SquaringHistory checks={list} selectedId={shown?.id} onSelect={(c) => setSelectedId(c.id)} />
        </Box>
      )}
    </Paper>
  );
}
