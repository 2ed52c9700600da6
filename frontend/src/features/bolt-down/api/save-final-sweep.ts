import { useQueryClient } from '@tanstack/react-query';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { newCommandKey } from '../../../lib/offline/commands';
import { useCommand } from '../../../lib/offline/use-command';
import type { Schemas } from '../../../lib/api/schemas';
import { boltDownKeys, type BoltDown, type FinalSweepResult } from '../types';

/** The described final-sweep request (a rail sweep's); the id is added when it is sent. Stations as in the rails' NewSweep. */
export type FinalSweepInput = Omit<Schemas['FinalSweepDto'], 'id'> &
  Required<Pick<Schemas['FinalSweepDto'], 'readingUnit' | 'lengthUnit'>>;

export const finalSweepPath = (boltDownId: string) => `/bolt-downs/${boltDownId}/final-sweep`;

/**
 * Saves the final sweep as an entry of the device's queue; the sweep id made here is also its
 * Idempotency-Key, so a resend is the same sweep. The server saves it as the rail's sweep (result
 * and status from the engine); the rail's pages and the machine's state are read again after.
 */
export function useSaveFinalSweep(bd: Pick<BoltDown, 'id' | 'rail'>, onRefused?: (message: string) => void) {
  const qc = useQueryClient();
  const command = useCommand<FinalSweepResult>();
  return (input: FinalSweepInput) => {
    const id = newCommandKey();
    command.send(
      {
        method: 'POST',
        path: finalSweepPath(bd.id),
        body: { ...input, id },
        label: `Final sweep of rail ${bd.rail.label} at every hole`,
        // ['rails']: the rail's page and sweep history show the new sweep too.
        refresh: [boltDownKeys.all, ['rails'], ...MACHINE_STATE_KEYS],
      },
      {
        key: id,
        onSuccess: ({ boltDown, sweep }) => {
          qc.setQueryData(boltDownKeys.detail(bd.id), boltDown);
          qc.setQueryData([...boltDownKeys.all, 'sweep', sweep.id], sweep);
        },
        onError: (err) => onRefused?.(err.message),
      },
    );
  };
}
