import { Alert, Box, Paper, Typography } from '@mui/material';
import { SweepOverlayChart } from '../../../components/charts/sweep-overlay-chart';
import { fromMm, UNIT_LABELS } from '../../../lib/units';
import { useParallelism } from '../api/get-parallelism';
import { isLengthUnit, showInTargetUnit, showLength, showTarget, targetMm } from '../utils/display';
import { CheckStatusChip } from './check-status-chip';

/** Parallelism and height difference of one partner pair, against their targets. */
export function PairParallelismSummary({
  railId,
  title,
  partnerLabel,
}: {
  railId: string;
  title: string;
  partnerLabel?: string;
}) {
  const q = useParallelism(railId);
  const unit = q.data && isLengthUnit(q.data.targets.parallelism.unit) ? q.data.targets.parallelism.unit : 'mm';
  // A rail without a partner has no height; only a pair judged on its parallelism has differences.
  const height = q.data && 'height' in q.data ? q.data.height : null;
  const compared = q.data && 'positions' in q.data ? q.data : null;
  return (
    <Paper
      component="section"
      aria-label={`Parallelism ${title}`}
      sx={{ p: 2, display: 'flex', gap: 2, alignItems: 'center', flexWrap: 'wrap' }}
    >
      <Box sx={{ flex: '1 1 260px', minWidth: 0 }}>
        <Typography sx={{ fontWeight: 600 }}>{title}</Typography>
        {q.isPending && <Typography color="text.secondary">Comparing…</Typography>}
        {q.isError && <Typography color="error">{q.error.message}</Typography>}
        {q.data && q.data.status === 'not-comparable' && (
          <Typography color="text.secondary">{q.data.reason}</Typography>
        )}
        {q.data && q.data.status !== 'not-comparable' && (
          <Typography color="text.secondary">
            {compared
              ? `Parallelism ${showInTargetUnit(compared.parallelism, compared.targets.parallelism)} (target ${showTarget(compared.targets.parallelism)}, ${compared.face} face, datum ${compared.datum})`
              : `No parallelism yet: ${('reason' in q.data && q.data.reason) || 'needs side-face sweeps of both rails against one datum'}`}
          </Typography>
        )}
        {height && (
          <Typography color="text.secondary" data-testid="height-difference">
            {height.measured && height.worst !== null
              ? `Height difference ${showLength(height.worst, unit)} at the worst station (${showLength(height.at ?? 0, 'mm')} along; top face, datum ${height.datum}) · target ${height.targetText}`
              : 'Height difference: not measured. It needs top-face sweeps of both rails read against one common datum.'}
          </Typography>
        )}
        {q.data && q.data.warnings.length > 0 && (
          <Alert severity="warning" sx={{ mt: 1 }}>
            {q.data.warnings.map((w) => (
              <div key={w.code}>{w.message}</div>
            ))}
          </Alert>
        )}
        {q.data && (
          <Typography variant="body2" color="text.secondary">
            Height target: {q.data.targets.heightDifference.source ?? showTarget(q.data.targets.heightDifference)}
          </Typography>
        )}
      </Box>
      {q.data && <CheckStatusChip status={q.data.status} />}
      {partnerLabel && compared && (
        <Box sx={{ flex: '1 1 100%', minWidth: 0 }}>
          <SweepOverlayChart
            label="Partner rail differences"
            height={200}
            unitLabel={UNIT_LABELS[unit]}
            yLabel="B − A"
            target={{
              width: fromMm(targetMm(compared.targets.parallelism), unit),
              label: `Parallelism target ${showTarget(compared.targets.parallelism)} wide`,
            }}
            series={[
              {
                name: `B − A: ${partnerLabel} minus this rail`,
                points: compared.positions.map((position, i) => ({
                  position,
                  value: fromMm(compared.differences[i], unit),
                })),
              },
            ]}
          />
        </Box>
      )}
    </Paper>
  );
}
