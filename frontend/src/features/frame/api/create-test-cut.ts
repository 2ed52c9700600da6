import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { useRecording } from '../../../lib/offline/use-command';
import type { Schemas } from '../../../lib/api/schemas';
import { frameKeys, type TestCut } from '../types';

export type TestCutInput = Schemas['CreateTestCutDto'];

/** Records a test cut through the device's queue of entries: sent at once with a connection, kept and sent once when it returns. */
export function useCreateTestCut(machineId: string) {
  const recording = useRecording<TestCut>();
  const record = (input: TestCutInput, on: { onRecorded?: (saved: TestCut) => void; onQueued?: () => void } = {}) =>
    recording.record(
      {
        method: 'POST',
        path: `/machines/${machineId}/test-cuts`,
        body: input,
        label: 'Test cut',
        refresh: [frameKeys.testCuts(machineId), ...MACHINE_STATE_KEYS],
      },
      on,
    );
  return { ...recording, record };
}
