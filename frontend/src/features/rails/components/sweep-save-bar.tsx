import { memo, type RefObject } from 'react';
import { useShallow } from 'zustand/react/shallow';
import { Button, Typography } from '@mui/material';
import { useDraft, type SweepDraft, type SweepDraftStore } from '../hooks/use-sweep-draft';
import { readyStations } from '../utils/stations';

/**
 * Save and the count of readings. It reads the counts alone, so correcting a reading (the count
 * stays) re-renders nothing here.
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
  const { readings, blank, toFix } = useDraft(
    store,
    useShallow((d: SweepDraft) => {
      const ready = readyStations(d.stations);
      return { readings: ready.stations.length, blank: ready.blank, toFix: ready.problems.size };
    }),
  );
  const canSave = readings >= 3 && toFix === 0;
  return (
    <>
      <Button ref={saveRef} variant="contained" size="large" onClick={onSave} disabled={!canSave}>
        Save sweep
      </Button>
      <Typography color="text.secondary">
        {readings} reading{readings === 1 ? '' : 's'}
        {blank ? ` · ${blank} station${blank === 1 ? '' : 's'} without a reading will be left out` : ''}
        {toFix ? ` · ${toFix} to fix` : ''}
      </Typography>
    </>
  );
});
