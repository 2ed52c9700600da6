import { useEffect } from 'react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { newWriteId, onWriteSent, sendWrite } from '../../../lib/offline-queue';
import type { LengthUnit } from '../../../lib/units';
import { boltDownKeys, type FinalSweepResult } from '../types';

export interface FinalSweepInput {
  unit: LengthUnit;
  phase: 'as-left' | 'as-found';
  stations: { position: number; reading: number }[];
  instrument?: string;
  resolution?: number;
  temperatureC?: number;
  boltSize?: string;
  torqueNm?: number;
  notes?: string;
}

const finalSweepPath = (boltDownId: string) => `/bolt-downs/${boltDownId}/final-sweep`;

/**
 * Saves the final sweep through the offline queue; the sweep id made here makes a resend the
 * same sweep. The server saves it as the rail's sweep (result and status from the engine).
 */
export function useSaveFinalSweep(boltDownId: string) {
  const qc = useQueryClient();
  useEffect(
    () =>
      onWriteSent((write, result) => {
        if (write.path !== finalSweepPath(boltDownId)) return;
        const { boltDown, sweep } = result as FinalSweepResult;
        qc.setQueryData(boltDownKeys.detail(boltDownId), boltDown);
        qc.setQueryData([...boltDownKeys.all, 'sweep', sweep.id], sweep);
        // A new rail sweep changes the rail page, the machine's checks and its history: look again.
        void qc.invalidateQueries();
      }),
    [boltDownId, qc],
  );
  return useMutation({
    mutationFn: (input: FinalSweepInput) => {
      const id = newWriteId();
      return sendWrite<FinalSweepResult>({ id, method: 'POST', path: finalSweepPath(boltDownId), body: { ...input, id }, label: 'Final sweep at every hole' });
    },
  });
}
