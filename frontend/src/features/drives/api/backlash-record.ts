import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { useRecording } from '../../../lib/offline/use-command';
import type { Schemas } from '../../../lib/api/schemas';
import type { BacklashCheck } from '../backlash-types';
import { driveKeys } from '../types';

export type BacklashInput = Schemas['CreateBacklashCheckDto'];

/** Records a backlash check through the device's queue of entries (see record-travel-trial.ts). */
export function useRecordBacklash(axisId: string, axisName = '') {
  const recording = useRecording<BacklashCheck>();
  const record = (input: BacklashInput, on: { onRecorded?: (c: BacklashCheck) => void; onQueued?: () => void } = {}) =>
    recording.record(
      {
        method: 'POST',
        path: backlashChecksPath(axisId),
        body: input,
        label: `Backlash check of axis ${axisName} (${input.positions.length} positions)`,
        refresh: [driveKeys.all, ...MACHINE_STATE_KEYS],
      },
      on,
    );
  return { ...recording, record };
}

export const backlashChecksPath = (axisId: string) => `/axes/${axisId}/backlash-checks`;
