import { Box, Paper, Typography } from '@mui/material';
import { SweepOverlayChart } from '../../../components/charts/sweep-overlay-chart';
import { fromMm, UNIT_LABELS } from '../../../lib/units';
import { useParallelism } from '../api/get-parallelism';
import { isLengthUnit, showInTargetUnit, showTarget } from '../utils/display';
import { CheckStatusChip } from './check-status-chip';

/** Parallelism and height difference of one partner pair, against their targets. */
export function PairParallelismSummary({ railId, title, partnerLabel }: { railId: string; title: string; partnerLabel?: string }) {
  const q = useParallelism(railId);
  const unit = q.data && isLengthUnit(q.data.targets.parallelism.unit) ? q.data.targets.parallelism.unit : 'mm';
  return (
    <Paper component="section" aria-label={`Parallelism ${title}`} sx={{ p: 2, display: 'flex', gap: 2, alignItems: 'center', flexWrap: 'wrap' }}>
      <Box sx={{ flex: '1 1 260px', minWidth: 0 }}>
        <Typography sx={{ fontWeight: 600 }}>{title}</Typography>
        {q.isPending && <Typography color="text.secondary">Comparing…</Typography>}
        {q.isError && <Typography color="error">{q.error.message}</Typography>}
        {q.data && q.data.status === 'not-comparable' && <Typography color="text.secondary">{q.data.reason}</Typography>}
        {q.data && q.data.status !== 'not-comparable' && (
          <Typography color="text.secondary">
            Parallelism {showInTargetUnit(q.data.parallelism!, q.data.targets.parallelism)} (target {showTarget(q.data.targets.parallelism)}) · height difference{' '}
            {showInTargetUnit(q.data.meanOffset!, q.data.targets.heightDifference)} (target {showTarget(q.data.targets.heightDifference)}) · datum {q.data.datum}
          </Typography>
        )}
      </Box>
      {q.data && <CheckStatusChip status={q.data.status} />}
      {partnerLabel && q.data?.differences && q.data.positions && (
        <Box sx={{ flex: '1 1 100%', minWidth: 0 }}>
          <SweepOverlayChart
            label="Partner rail differences"
            height={200}
            unitLabel={UNIT_LABELS[unit]}
            yLabel="B − A"
            series={[{ name: `B − A: ${partnerLabel} minus this rail`, points: q.data.positions.map((position, i) => ({ position, value: fromMm(q.data!.differences![i], unit) })) }]}
          />
        </Box>
      )}
    </Paper>
  );
}
