import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { useRecording } from '../../../lib/offline/use-command';
import type { Schemas } from '../../../lib/api/schemas';
import { frameKeys, type DiagonalCheck } from '../types';

export type DiagonalCheckInput = Schemas['CreateDiagonalCheckDto'];

/** Records a diagonal check through the device's queue of entries: sent at once with a connection, kept and sent once when it returns. */
export function useCreateDiagonalCheck(machineId: string) {
  const recording = useRecording<DiagonalCheck>();
  const record = (
    input: DiagonalCheckInput,
    on: { onRecorded?: (saved: DiagonalCheck) => void; onQueued?: () => void } = {},
  ) =>
    recording.record(
      {
        method: 'POST',
        path: `/machines/${machineId}/diagonal-checks`,
        body: input,
        label: `Diagonal check: ${input.diagonal1} and ${input.diagonal2} ${input.lengthUnit}`,
        refresh: [frameKeys.diagonalChecks(machineId), ...MACHINE_STATE_KEYS],
      },
      on,
    );
  return { ...recording, record };
}
