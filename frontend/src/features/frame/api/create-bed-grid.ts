import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { useRecording } from '../../../lib/offline/use-command';
import type { LengthUnit } from '../../../lib/units';
import { frameKeys, type BedGrid } from '../types';

export interface BedGridInput {
  lengthUnit: LengthUnit;
  readingUnit: LengthUnit;
  /** Smallest step of the height gauge, in readingUnit. */
  resolution?: number;
  rows: number;
  columns: number;
  /** Positions in lengthUnit, heights in readingUnit, row by row. */
  points: { x: number; y: number; z: number }[];
  note?: string;
}

/** Records a bed grid through the device's queue of entries: sent at once with a connection, kept and sent once when it returns. */
export function useCreateBedGrid(machineId: string) {
  const recording = useRecording<BedGrid>();
  const record = (input: BedGridInput, on: { onRecorded?: (saved: BedGrid) => void; onQueued?: () => void } = {}) =>
    recording.record({ method: 'POST', path: `/machines/${machineId}/bed-grids`, body: input, label: `Bed grid, ${input.rows} × ${input.columns} points`, refresh: [frameKeys.bedGrids(machineId), ...MACHINE_STATE_KEYS] }, on);
  return { ...recording, record };
}
