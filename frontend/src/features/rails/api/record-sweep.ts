import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { useCommand } from '../../../lib/offline/use-command';
import { railKeys, type NewSweep, type Sweep } from '../types';

export const sweepsPath = (railId: string) => `/rails/${railId}/sweeps`;

/**
 * Records a sweep as an entry of the device's queue (lib/offline): sent at once when there is a
 * connection, kept and sent once, in order, when it returns. The sweep's id, made in the browser,
 * is also the entry's Idempotency-Key, so a resend is the same sweep on the server.
 */
export function useRecordSweep(rail: { id: string; label: string }) {
  const command = useCommand<Sweep>();
  const send = (sweep: NewSweep, callbacks: { onSuccess?: (s: Sweep) => void; onError?: (e: Error) => void } = {}) =>
    command.send(
      {
        method: 'POST',
        path: sweepsPath(rail.id),
        body: sweep,
        label: `Sweep of rail ${rail.label} (${sweep.stations.length} readings)`,
        refresh: [railKeys.all, ...MACHINE_STATE_KEYS],
      },
      { key: sweep.id, onSuccess: (s) => callbacks.onSuccess?.(s), onError: (e) => callbacks.onError?.(e) },
    );
  return { send };
}
