import { Alert, Box, Chip, Paper, Stack, Typography } from '@mui/material';
import { StraightnessChart } from '../../../components/charts/straightness-chart';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { formatLength, fromMm, isLengthUnit, toMm, UNIT_LABELS } from '../../../lib/units';
import { useFinalSweep } from '../api/get-sweep';

/** The saved final sweep: its straightness against the target, as the rails feature computed it. */
export function FinalSweepResult({ sweepId }: { sweepId: string }) {
  const sweep = useFinalSweep(sweepId);
  if (sweep.isPending) return <LoadingState label="Loading the final sweep…" />;
  if (sweep.isError) return <ErrorState error={sweep.error} onRetry={() => sweep.refetch()} />;
  const s = sweep.data;
  // A stored sweep that can no longer be read comes without readings or result, saying why.
  if (!s.result || !s.stations)
    return <Alert severity="error">{s.unreadable ?? 'The final sweep could not be read.'}</Alert>;
  const u = s.readingUnit;
  const within = s.status === 'within-target';
  const k = fromMm(1, u);
  const ls = s.result.leastSquares;
  const mz = s.result.minimumZone;
  return (
    <Paper sx={{ p: { xs: 2, md: 3 } }} aria-label="Final sweep result">
      <Stack direction="row" spacing={1.5} sx={{ alignItems: 'center', flexWrap: 'wrap', mb: 1 }}>
        <Typography variant="h2" component="h2">
          Final sweep saved
        </Typography>
        <Chip
          color={within ? 'success' : 'error'}
          label={within ? 'Within target' : 'Outside target'}
          data-testid="final-sweep-status"
        />
      </Stack>
      <Box sx={{ display: 'flex', gap: 4, flexWrap: 'wrap', mb: 2 }}>
        <Box>
          <Typography color="text.secondary">Straightness, least squares</Typography>
          <Typography sx={{ fontSize: '1.6rem', fontWeight: 600 }}>{formatLength(ls.straightness, u)}</Typography>
        </Box>
        <Box>
          <Typography color="text.secondary">Minimum zone</Typography>
          <Typography sx={{ fontSize: '1.6rem', fontWeight: 600 }}>{formatLength(mz.straightness, u)}</Typography>
        </Box>
        <Box>
          <Typography color="text.secondary">Target</Typography>
          <Typography sx={{ fontSize: '1.6rem', fontWeight: 600 }}>
            {s.target.value} {s.target.unit === 'um' ? 'µm' : s.target.unit}
          </Typography>
        </Box>
      </Box>
      <StraightnessChart
        points={s.stations.map((st) => ({ position: st.position, reading: st.reading }))}
        leastSquares={{ slope: ls.slope * k, intercept: ls.intercept * k }}
        zone={{ slope: mz.slope * k, intercept: mz.intercept * k, width: mz.straightness * k }}
        target={
          isLengthUnit(s.target.unit)
            ? {
                width: fromMm(toMm(s.target.value, s.target.unit), u),
                reference: s.target.reference === 'least-squares' ? 'least-squares' : 'minimum-zone',
                label: `Target zone ${s.target.value} ${UNIT_LABELS[s.target.unit]} wide`,
              }
            : null
        }
        unitLabel={UNIT_LABELS[u]}
        label="Straightness of the final sweep"
      />
      {!within && (
        <Alert severity="warning" sx={{ mt: 2 }}>
          The rail is outside its straightness target. Loosen the holes that stand out, re-align them with a new
          bolt-down, and sweep again.
        </Alert>
      )}
    </Paper>
  );
}
