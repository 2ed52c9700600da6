import { useQueryClient } from '@tanstack/react-query';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { useRecording } from '../../../lib/offline/use-command';
import type { Schemas } from '../../../lib/api/schemas';
import { travelTrialQueryOptions } from './get-travel-trial';
import { driveKeys, type TravelTrial } from '../types';

/** Moves in lengthUnit; errors, residuals and the instrument resolution in readingUnit. */
export type TravelTrialInput = Schemas['CreateTravelTrialDto'];

/**
 * Records a trial through the device's queue of entries: sent at once with a connection, kept
 * and sent once when it returns without one. Refreshes the axis's records and the machine's state.
 */
export function useRecordTravelTrial(axisId: string, axisName = '') {
  const qc = useQueryClient();
  const recording = useRecording<TravelTrial>();
  const record = (input: TravelTrialInput, on: { onRecorded?: (t: TravelTrial) => void; onQueued?: () => void } = {}) =>
    recording.record(
      {
        method: 'POST',
        path: travelTrialsPath(axisId),
        body: input,
        label: `Travel trial of axis ${axisName} (${input.moves.length} ${input.moves.length === 1 ? 'move' : 'moves'})`,
        refresh: [driveKeys.all, ...MACHINE_STATE_KEYS],
      },
      {
        onQueued: on.onQueued,
        onRecorded: (saved) => {
          // The answer is the record in full: the result above the list shows it without asking again.
          qc.setQueryData(travelTrialQueryOptions(axisId, saved.id).queryKey, saved);
          on.onRecorded?.(saved);
        },
      },
    );
  return { ...recording, record };
}

export const travelTrialsPath = (axisId: string) => `/axes/${axisId}/travel-trials`;
