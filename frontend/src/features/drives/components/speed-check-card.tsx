import { Alert, Box, Paper, Typography } from '@mui/material';
import { ErrorState } from '../../../components/states/error-state';
import { LoadingState } from '../../../components/states/loading-state';
import { useSpeedCheck } from '../api/get-speed-check';
import { MOUNTING_LABELS, type Axis } from '../types';
import { showFeed, showRpm, showTarget } from '../utils/format';
import { DriveStatusChip } from './drive-status-chip';

function Row({ label, value, strong }: { label: string; value: string; strong?: boolean }) {
  return (
    <Box
      sx={{
        display: 'flex',
        justifyContent: 'space-between',
        gap: 2,
        py: 0.5,
        borderBottom: '1px solid',
        borderColor: 'divider',
      }}
    >
      <Typography color="text.secondary">{label}</Typography>
      <Typography sx={{ fontWeight: strong ? 700 : 500, textAlign: 'right', whiteSpace: 'nowrap' }}>{value}</Typography>
    </Box>
  );
}

/** Screw speed at the fastest feed against whirling (critical) speed and the d·n limit. */
export function SpeedCheckCard({ axis }: { axis: Axis }) {
  const q = useSpeedCheck(axis.id);
  const u = axis.lengthUnit === 'in' ? 'in' : axis.lengthUnit;
  const ul = u === 'um' ? 'µm' : u;
  return (
    <Paper sx={{ p: 2.5 }} component="section" aria-labelledby="speed-title">
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.5, mb: 1.5, flexWrap: 'wrap' }}>
        <Typography variant="h4" component="h3" id="speed-title" sx={{ flex: '1 1 auto' }}>
          Speed check
        </Typography>
        {q.data && <DriveStatusChip status={q.data.status} />}
      </Box>
      {q.isPending && <LoadingState label="Working out screw speeds…" />}
      {q.isError && <ErrorState error={q.error} onRetry={() => q.refetch()} />}
      {q.data && !q.data.applicable && <Typography color="text.secondary">{q.data.reason}</Typography>}
      {q.data && q.data.applicable && q.data.rpm === null && (
        <Alert severity="info">{q.data.reason} Edit the axis to add them.</Alert>
      )}
      {q.data && q.data.rpm !== null && (
        <>
          <Typography color="text.secondary" sx={{ mb: 1 }}>
            Lead {axis.drive.lead} {ul}, root Ø{axis.drive.rootDiameter} {ul},{' '}
            {MOUNTING_LABELS[axis.drive.mounting!].toLowerCase()} over {axis.drive.unsupportedLength} {ul}, at{' '}
            {showFeed(q.data.feedRate, u)}.
          </Typography>
          <Row label="Screw speed at the fastest feed" value={showRpm(q.data.rpm)} strong />
          <Row label="Critical (whirling) speed" value={showRpm(q.data.criticalSpeed)} />
          <Row label="Permissible speed (0.8 × critical)" value={showRpm(q.data.permissibleSpeed)} />
          <Row
            label={`d·n limit (${q.data.dnLimit?.toLocaleString('en-GB')} ÷ Ø${axis.driveMm.nominalDiameter} mm)`}
            value={showRpm(q.data.dnLimitSpeed)}
          />
          <Row
            label={`Lower limit (${q.data.limitedBy === 'dn-limit' ? 'the d·n limit' : 'whirling'})`}
            value={showRpm(q.data.limitSpeed)}
          />
          <Row
            label="Headroom below the lower limit"
            value={
              q.data.headroomPercent === null
                ? '—'
                : `${q.data.headroomPercent.toFixed(1)} % (target ≥ ${showTarget(q.data.headroom)})`
            }
            strong
          />
          <Row label={`Allowed with ${showTarget(q.data.headroom)} headroom`} value={showRpm(q.data.allowedSpeed)} />
          <Row label="Highest safe feed rate" value={showFeed(q.data.safeFeedRate, u)} strong />
          <Typography
            sx={{ mt: 1.5, fontWeight: 500, color: q.data.status === 'within-target' ? 'success.main' : 'error.main' }}
          >
            {q.data.status === 'within-target'
              ? 'Within limits, with the headroom the target set asks for.'
              : q.data.withinLimits
                ? 'Within the catalogue limits but without the headroom the target set asks for.'
                : 'Outside the limits: lower the fastest feed, shorten the unsupported length, change the end mounting or the drive.'}
          </Typography>
          <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
            Source: {q.data.source}.
          </Typography>
        </>
      )}
    </Paper>
  );
}
