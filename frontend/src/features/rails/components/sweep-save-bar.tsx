import { memo, useMemo, type RefObject } from 'react';
import { Button, Typography } from '@mui/material';
import { useDraft, type SweepDraftStore } from '../hooks/use-sweep-draft';
import { readyStations } from '../utils/stations';

/**
 * Save and the count of readings: the one part of the form besides the row being typed that
 * changes with each reading, so it subscribes to the stations by itself.
 */
export const SweepSaveBar = memo(function SweepSaveBar({
  store,
  saveRef,
  onSave,
}: {
  store: SweepDraftStore;
  saveRef: RefObject<HTMLButtonElement | null>;
  onSave: () => void;
}) {
  const stations = useDraft(store, (d) => d.stations);
  const ready = useMemo(() => readyStations(stations), [stations]);
  const canSave = ready.stations.length >= 3 && ready.problems.size === 0;
  return (
    <>
      <Button ref={saveRef} variant="contained" size="large" onClick={onSave} disabled={!canSave}>
        Save sweep
      </Button>
      <Typography color="text.secondary">
        {ready.stations.length} reading{ready.stations.length === 1 ? '' : 's'}
        {ready.blank
          ? ` · ${ready.blank} station${ready.blank === 1 ? '' : 's'} without a reading will be left out`
          : ''}
        {ready.problems.size ? ` · ${ready.problems.size} to fix` : ''}
      </Typography>
    </>
  );
});
