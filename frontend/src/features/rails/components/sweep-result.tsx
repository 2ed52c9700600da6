import {
  Alert,
  Box,
  Paper,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { fromMm, UNIT_LABELS } from '../../../lib/units';
import { PHASE_LABELS, type Sweep } from '../types';
import { showInTargetUnit, showLength, showTarget } from '../utils/display';
import { CheckStatusChip } from './check-status-chip';
import { SweepPreview } from './sweep-preview';
import { UnreadableRecord } from '../../../components/unreadable-record';
import { formatDateTime } from '../../../lib/format-time';

/** A saved sweep: the server's fit, the residual at each station, and the verdict beside its target. */
export function SweepResult({ sweep, title = 'Saved sweep' }: { sweep: Sweep; title?: string }) {
  const unit = sweep.readingUnit;
  const lengthUnit = sweep.lengthUnit;
  const leastSquares = sweep.target.reference === 'least-squares';
  const digits = unit === 'um' ? 1 : unit === 'mm' ? 4 : unit === 'in' ? 5 : 2;
  const { result, stations } = sweep;
  if (!result || !stations) {
    return (
      <Paper component="section" aria-label={title} sx={{ p: { xs: 1.5, sm: 2.5 } }}>
        <Typography variant="h3" component="h2" gutterBottom>
          {title}
        </Typography>
        <UnreadableRecord message={sweep.unreadable ?? 'This sweep cannot be read.'} />
      </Paper>
    );
  }
  return (
    <Paper component="section" aria-label={title} sx={{ p: { xs: 1.5, sm: 2.5 } }}>
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.5, flexWrap: 'wrap', mb: 1 }}>
        <Typography variant="h3" component="h2" sx={{ flex: '1 1 240px' }}>
          {title}
        </Typography>
        <CheckStatusChip status={sweep.status} size="medium" />
      </Box>
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        {PHASE_LABELS[sweep.phase]} · {sweep.face === 'top' ? 'top face' : 'side face'} ·{' '}
        {formatDateTime(sweep.takenAt)} · {sweep.takenBy}
        {sweep.instrument ? ` · ${sweep.instrument}` : ''}
        {sweep.resolution !== null ? ` (${sweep.resolution} ${UNIT_LABELS[unit]})` : ''}
        {sweep.temperatureC !== null ? ` · ${sweep.temperatureC} °C` : ''}
        {sweep.boltSize ? ` · ${sweep.boltSize}${sweep.torqueNm !== null ? ` at ${sweep.torqueNm} N·m` : ''}` : ''}
        {sweep.datum ? ` · datum: ${sweep.datum}` : ''}
      </Typography>
      <Alert severity={sweep.status === 'within-target' ? 'success' : 'error'} sx={{ mb: 2 }}>
        {leastSquares
          ? `Least-squares straightness ${showInTargetUnit(result.leastSquares.straightness, sweep.target)}`
          : `Minimum-zone straightness (ISO 1101) ${showInTargetUnit(result.minimumZone.straightness, sweep.target)}`}{' '}
        against a target of {showTarget(sweep.target)} (
        {leastSquares ? 'judged on the least-squares line' : 'judged on the minimum zone'}):{' '}
        {sweep.status === 'within-target' ? 'within target.' : 'outside target.'}{' '}
        {leastSquares
          ? `Minimum zone ${showInTargetUnit(result.minimumZone.straightness, sweep.target)}.`
          : `Least squares ${showInTargetUnit(result.leastSquares.straightness, sweep.target)}.`}
        {sweep.localSlope && (
          <>
            {' '}
            Largest local slope <strong data-testid="local-slope">
              {sweep.localSlope.mmPerM.toFixed(3)} mm/m
            </strong>{' '}
            (between {Number(fromMm(sweep.localSlope.fromMm, lengthUnit).toPrecision(6))} and{' '}
            {Number(fromMm(sweep.localSlope.toMm, lengthUnit).toPrecision(6))} {UNIT_LABELS[lengthUnit]} along the
            rail).
          </>
        )}
      </Alert>
      {sweep.warnings.length > 0 && (
        <Alert severity="warning" sx={{ mb: 2 }} data-testid="sweep-warnings">
          {sweep.warnings.map((w) => (
            <div key={w.code}>{w.message}</div>
          ))}
        </Alert>
      )}
      <Stack direction={{ xs: 'column', lg: 'row' }} spacing={2.5}>
        <Box sx={{ flex: 3, minWidth: 0 }}>
          <SweepPreview
            points={stations.map((s) => ({ position: s.position, reading: s.reading }))}
            unit={unit}
            lengthUnit={lengthUnit}
            result={result}
            target={sweep.target}
            label="Saved sweep straightness chart"
          />
        </Box>
        <TableContainer sx={{ flex: 2, maxHeight: 380 }}>
          <Table size="small" stickyHeader aria-label="Residual per station">
            <TableHead>
              <TableRow>
                <TableCell>Station ({UNIT_LABELS[lengthUnit]})</TableCell>
                <TableCell align="right">Reading ({UNIT_LABELS[unit]})</TableCell>
                <TableCell align="right">Residual ({UNIT_LABELS[unit]})</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {stations.map((s, i) => {
                const r = fromMm((leastSquares ? result.leastSquares : result.minimumZone).residuals[i], unit);
                return (
                  <TableRow key={i}>
                    <TableCell>{s.position}</TableCell>
                    <TableCell align="right">{s.reading}</TableCell>
                    <TableCell align="right" sx={{ fontVariantNumeric: 'tabular-nums' }}>
                      {r >= 0 ? '+' : ''}
                      {r.toFixed(digits)}
                    </TableCell>
                  </TableRow>
                );
              })}
            </TableBody>
          </Table>
        </TableContainer>
      </Stack>
      <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
        End-point straightness {showLength(result.endPoint.straightness, unit)}. Residuals are from the{' '}
        {leastSquares ? 'least-squares line' : 'minimum-zone line'}, the reference the target names.
      </Typography>
    </Paper>
  );
}
