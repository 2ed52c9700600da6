import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { useRecording } from '../../../lib/offline/use-command';
import type { Schemas } from '../../../lib/api/schemas';
import { frameKeys, type BedGrid } from '../types';

/** Positions in lengthUnit, heights in readingUnit, row by row. */
export type BedGridInput = Schemas['CreateBedGridDto'];

/** Records a bed grid through the device's queue of entries: sent at once with a connection, kept and sent once when it returns. */
export function useCreateBedGrid(machineId: string) {
  const recording = useRecording<BedGrid>();
  const record = (input: BedGridInput, on: { onRecorded?: (saved: BedGrid) => void; onQueued?: () => void } = {}) =>
    recording.record(
      {
        method: 'POST',
        path: `/machines/${machineId}/bed-grids`,
        body: input,
        label: `Bed grid, ${input.rows} × ${input.columns} points`,
        refresh: [frameKeys.bedGrids(machineId), ...MACHINE_STATE_KEYS],
      },
      on,
    );
  return { ...recording, record };
}
