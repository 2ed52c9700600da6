import { useMutation } from '@tanstack/react-query';
import { newWriteId, sendWriteWithin, type WriteOutcome } from '../../../lib/offline-queue';
import { formatLength, toMm, type LengthUnit } from '../../../lib/units';
import type { HoleWriteResult } from '../types';

export interface RecordHoleInput {
  index: number;
  positionMm: number;
  /** In the bolt-down's unit. */
  reading: number;
  unit: LengthUnit;
  fixed: boolean;
}

// At the machine the next hole matters more than the answer: carry on if the link is slow.
const PATIENCE_MS = 2500;

export const holePath = (boltDownId: string, index?: number) => `/bolt-downs/${boltDownId}/holes/${index ?? ''}`;

/** Body of a waiting hole write, as the guide reads it back to show it before it is sent. */
export interface HoleWriteBody {
  reading: number;
  fixed: boolean;
  writeId: string;
}

/**
 * Fixes (or loosens) a hole through the offline queue: sent at once when it can be, otherwise
 * kept on this device and sent in order later. Resolves 'queued' rather than failing offline.
 * The answers of writes sent later reach the guide through useBoltDownSync.
 */
export function useRecordHole(boltDownId: string) {
  return useMutation({
    mutationFn: (input: RecordHoleInput): Promise<WriteOutcome<HoleWriteResult>> => {
      const writeId = newWriteId();
      const body: HoleWriteBody = { reading: input.reading, fixed: input.fixed, writeId };
      return sendWriteWithin<HoleWriteResult>({
        id: writeId,
        method: 'PUT',
        path: holePath(boltDownId, input.index),
        body,
        label: `Hole ${input.index + 1} at ${input.positionMm} mm: ${formatLength(toMm(input.reading, input.unit), input.unit)}${input.fixed ? ' fixed' : ''}`,
      }, PATIENCE_MS);
    },
  });
}
