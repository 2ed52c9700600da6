import type { QueryKey } from '@tanstack/react-query';
import { MACHINE_STATE_KEYS } from '../machine-state-keys';
import { useRecording } from '../offline/use-command';
import { commandPath, type CheckInput, type CheckRecordingPath, type RecordedCheck } from './check-paths';

interface RecordCheckOptions<P extends CheckRecordingPath> {
  /** The entry in words, for the list of waiting entries: "Backlash check of axis X (3 positions)". */
  label: (input: CheckInput<P>) => string;
  /** The feature's queries to refresh once recorded; the machine's state and board are always refreshed. */
  refresh: QueryKey[];
}

/**
 * Records a check under its parent through the device's queue of entries (`useRecording`): sent
 * at once with a connection, kept and sent once when it returns without. `path` is also where the
 * form's waiting entries are found (`<WaitingEntries path={…} />`).
 */
export function useRecordCheck<P extends CheckRecordingPath>(
  path: P,
  parentId: string,
  { label, refresh }: RecordCheckOptions<P>,
) {
  const recording = useRecording<RecordedCheck<P>>();
  const sentTo = commandPath(path, { id: parentId });
  const record = (
    input: CheckInput<P>,
    on: { onRecorded?: (check: RecordedCheck<P>) => void; onQueued?: () => void } = {},
  ) =>
    recording.record(
      { method: 'POST', path: sentTo, body: input, label: label(input), refresh: [...refresh, ...MACHINE_STATE_KEYS] },
      on,
    );
  return { ...recording, record, path: sentTo };
}
