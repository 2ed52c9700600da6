import { useEffect } from 'react';
import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { newWriteId, onWriteSent, sendWrite, type WriteOutcome } from '../../../lib/offline-queue';
import { formatLength, toMm, type LengthUnit } from '../../../lib/units';
import { boltDownKeys, type HoleWriteResult } from '../types';

export interface RecordHoleInput {
  index: number;
  positionMm: number;
  /** In the bolt-down's unit. */
  reading: number;
  unit: LengthUnit;
  fixed: boolean;
}

export const holePath = (boltDownId: string, index?: number) => `/bolt-downs/${boltDownId}/holes/${index ?? ''}`;

/** Body of a waiting hole write, as the guide reads it back to show it before it is sent. */
export interface HoleWriteBody {
  reading: number;
  fixed: boolean;
  writeId: string;
}

function store(qc: QueryClient, result: HoleWriteResult) {
  qc.setQueryData(boltDownKeys.detail(result.id), result);
}

/**
 * Fixes (or loosens) a hole through the offline queue: sent at once when it can be, otherwise
 * kept on this device and sent in order later. Resolves 'queued' rather than failing offline.
 */
export function useRecordHole(boltDownId: string) {
  const qc = useQueryClient();
  // Writes sent later (after the connection came back) update the guide too.
  useEffect(
    () =>
      onWriteSent((write, result) => {
        if (!write.path.startsWith(holePath(boltDownId))) return;
        store(qc, result as HoleWriteResult);
        void qc.invalidateQueries({ queryKey: [...boltDownKeys.all, 'rail'] });
      }),
    [boltDownId, qc],
  );
  return useMutation({
    mutationFn: (input: RecordHoleInput): Promise<WriteOutcome<HoleWriteResult>> => {
      const writeId = newWriteId();
      const body: HoleWriteBody = { reading: input.reading, fixed: input.fixed, writeId };
      return sendWrite<HoleWriteResult>({
        id: writeId,
        method: 'PUT',
        path: holePath(boltDownId, input.index),
        body,
        label: `Hole ${input.index + 1} at ${input.positionMm} mm: ${formatLength(toMm(input.reading, input.unit), input.unit)}${input.fixed ? ' fixed' : ''}`,
      });
    },
  });
}
