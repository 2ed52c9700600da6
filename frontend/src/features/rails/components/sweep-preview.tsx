import { memo } from 'react';
import { Box, Stack, Typography } from '@mui/material';
import { StraightnessChart } from '../../../components/charts/straightness-chart';
import { fromMm, toMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import type { StraightnessResult, TargetValue } from '../types';
import { isLengthUnit, showInTargetUnit, showLength, showTarget, targetMm } from '../utils/display';
import { CheckStatusChip } from './check-status-chip';

type PreviewProps = {
  /** Positions in `lengthUnit`, readings in `unit`. */
  points: { position: number; reading: number }[];
  unit: LengthUnit;
  lengthUnit?: LengthUnit;
  result: StraightnessResult | null;
  target: TargetValue | null;
  label: string;
  pending?: boolean;
};

/**
 * Readings with their fitted line and band, in the entry unit, and the result against the target.
 * Memoised: the chart is the costliest thing on the entry form and redraws only when its data
 * does (a fit being asked for and answered changes the line under it, not the chart).
 */
export const SweepPreview = memo(function SweepPreview({ pending, ...fit }: PreviewProps) {
  if (fit.points.length < 3 || !fit.result) {
    return (
      <Box sx={{ p: 3, border: '1px dashed', borderColor: 'divider', borderRadius: 1, color: 'text.secondary' }}>
        {pending
          ? 'Fitting… the chart is drawn when you pause typing.'
          : 'Type at least three readings: the chart and the straightness appear as you go.'}
      </Box>
    );
  }
  return (
    <Stack spacing={1.5}>
      <FitFigures {...fit} result={fit.result} />
      {/* Always takes its line, so the readings below (on a phone) do not jump while a fit runs. */}
      <Typography
        variant="body2"
        color="text.secondary"
        role="status"
        sx={{ minHeight: '1.5em', visibility: pending ? 'visible' : 'hidden' }}
      >
        Updating the fit…
      </Typography>
    </Stack>
  );
});

const FitFigures = memo(function FitFigures({
  points,
  unit,
  lengthUnit = 'mm',
  result,
  target,
  label,
}: Omit<PreviewProps, 'pending' | 'result'> & { result: StraightnessResult }) {
  const u = (mm: number) => fromMm(mm, unit);
  const ls = result.leastSquares;
  const mz = result.minimumZone;
  // Judged on the line the target names: minimum zone (ISO 1101) unless it says least squares.
  const leastSquares = target?.reference === 'least-squares';
  const judged = leastSquares ? ls.straightness : mz.straightness;
  const status = target ? (judged <= targetMm(target) + 1e-12 ? 'within-target' : 'outside-target') : null;
  // The fit's slope is per mm of travel: the chart draws positions in mm.
  const pointsMm =
    lengthUnit === 'mm' ? points : points.map((p) => ({ position: toMm(p.position, lengthUnit), reading: p.reading }));
  return (
    <>
      <StraightnessChart
        points={pointsMm}
        leastSquares={{ slope: u(ls.slope), intercept: u(ls.intercept) }}
        zone={{ slope: u(mz.slope), intercept: u(mz.intercept), width: u(mz.straightness) }}
        target={
          target && isLengthUnit(target.unit)
            ? {
                width: u(targetMm(target)),
                reference: leastSquares ? 'least-squares' : 'minimum-zone',
                label: `Target zone ${showTarget(target)} wide`,
              }
            : null
        }
        unitLabel={UNIT_LABELS[unit]}
        height={300}
        label={label}
      />
      <Stack direction="row" spacing={3} useFlexGap sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
        <Box>
          <Typography variant="body2" color="text.secondary">
            Least squares
          </Typography>
          <Typography sx={{ fontWeight: 600 }} data-testid="ls-straightness">
            {showLength(ls.straightness, unit)}
          </Typography>
        </Box>
        <Box>
          <Typography variant="body2" color="text.secondary">
            Minimum zone
          </Typography>
          <Typography sx={{ fontWeight: 600 }}>{showLength(mz.straightness, unit)}</Typography>
        </Box>
        {target && (
          <Box>
            <Typography variant="body2" color="text.secondary">
              Target ({leastSquares ? 'least squares' : 'minimum zone, ISO 1101'})
            </Typography>
            <Typography sx={{ fontWeight: 600 }}>
              {showTarget(target)}{' '}
              <Typography component="span" color="text.secondary">
                ({showInTargetUnit(judged, target)} now)
              </Typography>
            </Typography>
          </Box>
        )}
        {status && <CheckStatusChip status={status} />}
      </Stack>
    </>
  );
});
