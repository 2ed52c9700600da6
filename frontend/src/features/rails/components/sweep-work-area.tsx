import { memo, useMemo } from 'react';
import { Alert, Grid } from '@mui/material';
import type { LengthUnit } from '../../../lib/units';
import { useStraightnessPreview } from '../api/preview-straightness';
import { useAfterTypingPause } from '../hooks/use-after-typing-pause';
import { useSettledBody } from '../hooks/use-settled-body';
import type { StationDraft, SweepDraftStore } from '../hooks/use-sweep-draft';
import type { TargetValue } from '../types';
import { StationReadings } from './station-readings';
import { SweepPreview } from './sweep-preview';

/**
 * The readings and the live chart. The fit lives here rather than in the form, so asking for it
 * and its answer re-render these two alone; the chart and the residuals are drawn once typing
 * pauses and at low priority, so a keystroke never waits for them.
 */
export const SweepWorkArea = memo(function SweepWorkArea({
  store,
  unit,
  lengthUnit,
  target,
  onRowChange,
  onDrop,
  onLastEnter,
}: {
  store: SweepDraftStore;
  unit: LengthUnit;
  lengthUnit: LengthUnit;
  target: TargetValue | null;
  onRowChange: (index: number, patch: Partial<StationDraft>) => void;
  onDrop: (index: number) => void;
  onLastEnter: () => void;
}) {
  // The fit is asked for once typing pauses (useSettledBody).
  const settled = useSettledBody(store);
  const preview = useStraightnessPreview(settled);
  // Drawn once typing pauses, at low priority; the chart draws the readings the fit was made
  // from, so the line always belongs to its points.
  const drawn = useAfterTypingPause(preview.data, store);
  // Readings that cannot be fitted (fewer than three, or one to fix) take the chart away, also
  // once typing pauses; the residuals stay beside the rows meanwhile.
  const fittable = useAfterTypingPause(settled !== null, store);
  const shown = fittable ? drawn : undefined;
  const chartPoints = useMemo(
    () => (shown ? shown.body.positions.map((position, k) => ({ position, reading: shown.body.readings[k] })) : []),
    [shown],
  );
  return (
    <>
      {/* On a narrow screen the chart comes first, so it stays in view above the readings being typed. */}
      <Grid size={{ xs: 12, md: 6 }} sx={{ order: { xs: 2, md: 1 } }}>
        <StationReadings
          store={store}
          unit={unit}
          lengthUnit={lengthUnit}
          fit={drawn}
          onRowChange={onRowChange}
          onDrop={onDrop}
          onLastEnter={onLastEnter}
        />
      </Grid>
      <Grid size={{ xs: 12, md: 6 }} sx={{ order: { xs: 1, md: 2 } }}>
        <SweepPreview
          points={chartPoints}
          unit={shown?.body.readingUnit ?? unit}
          lengthUnit={shown?.body.lengthUnit ?? lengthUnit}
          result={shown?.result ?? null}
          target={target}
          label="Live straightness chart"
          // Readings enough for a fit whose chart is not drawn yet (asked for, or waiting for a pause).
          pending={preview.isFetching || (settled !== null && !shown)}
        />
        {preview.error && (
          <Alert severity="error" sx={{ mt: 1 }}>
            {preview.error.message}
          </Alert>
        )}
      </Grid>
    </>
  );
});
