import { useQueryClient } from '@tanstack/react-query';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { useRecording } from '../../../lib/offline/use-command';
import type { Schemas } from '../../../lib/api/schemas';
import { positioningRunQueryOptions } from './get-positioning-run';
import { driveKeys, type PositioningRun } from '../types';

/** Targets in lengthUnit; deviations and the instrument resolution in readingUnit. */
export type PositioningRunInput = Schemas['CreatePositioningRunDto'];

/** Records a run through the device's queue of entries (see record-travel-trial.ts). */
export function useRecordPositioningRun(axisId: string, axisName = '') {
  const qc = useQueryClient();
  const recording = useRecording<PositioningRun>();
  const record = (
    input: PositioningRunInput,
    on: { onRecorded?: (r: PositioningRun) => void; onQueued?: () => void } = {},
  ) =>
    recording.record(
      {
        method: 'POST',
        path: positioningRunsPath(axisId),
        body: input,
        label: `Repeat-and-reverse run of axis ${axisName} (${input.targets.length} targets, ${input.runs.length / 2} runs each way)`,
        refresh: [driveKeys.all, ...MACHINE_STATE_KEYS],
      },
      {
        onQueued: on.onQueued,
        onRecorded: (saved) => {
          qc.setQueryData(positioningRunQueryOptions(axisId, saved.id).queryKey, saved);
          on.onRecorded?.(saved);
        },
      },
    );
  return { ...recording, record };
}

export const positioningRunsPath = (axisId: string) => `/axes/${axisId}/positioning-runs`;
