import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { useRecording } from '../../../lib/offline/use-command';
import type { LengthUnit } from '../../../lib/units';
import { frameKeys, type TestCut } from '../types';

export interface TestCutInput {
  lengthUnit: LengthUnit;
  /** Thickness of the plate cut, in lengthUnit. */
  plateThickness?: number;
  /** Smallest step of the caliper or rule, in lengthUnit. */
  resolution?: number;
  nominal: { x: number; y: number; circle: number };
  measured: { x: number; y: number; diagonal1: number; diagonal2: number; circleX: number; circleY: number; kerf?: number };
  circleKind: 'hole' | 'disc';
  stepsPerMm?: { x?: number; y?: number };
  note?: string;
}

/** Records a test cut through the device's queue of entries: sent at once with a connection, kept and sent once when it returns. */
export function useCreateTestCut(machineId: string) {
  const recording = useRecording<TestCut>();
  const record = (input: TestCutInput, on: { onRecorded?: (saved: TestCut) => void; onQueued?: () => void } = {}) =>
    recording.record({ method: 'POST', path: `/machines/${machineId}/test-cuts`, body: input, label: 'Test cut', refresh: [frameKeys.testCuts(machineId), ...MACHINE_STATE_KEYS] }, on);
  return { ...recording, record };
}
