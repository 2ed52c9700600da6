import { useMutation } from '@tanstack/react-query';
import { newWriteId, sendWriteWithin } from '../../../lib/offline-queue';
import type { LengthUnit } from '../../../lib/units';
import type { FinalSweepResult } from '../types';

export interface FinalSweepInput {
  readingUnit: LengthUnit;
  lengthUnit: LengthUnit;
  phase: 'as-left' | 'as-found';
  stations: { position: number; reading: number }[];
  instrument?: string;
  resolution?: number;
  temperatureC?: number;
  boltSize?: string;
  torqueNm?: number;
  notes?: string;
}

export const finalSweepPath = (boltDownId: string) => `/bolt-downs/${boltDownId}/final-sweep`;

/**
 * Saves the final sweep through the offline queue; the sweep id made here makes a resend the
 * same sweep. The server saves it as the rail's sweep (result and status from the engine).
 */
export function useSaveFinalSweep(boltDownId: string) {
  return useMutation({
    mutationFn: (input: FinalSweepInput) => {
      const id = newWriteId();
      return sendWriteWithin<FinalSweepResult>({ id, method: 'POST', path: finalSweepPath(boltDownId), body: { ...input, id }, label: 'Final sweep at every hole' }, 8000);
    },
  });
}
