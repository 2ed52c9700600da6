import { useEffect } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { onWriteSent } from '../../../lib/offline-queue';
import { holePath } from '../api/record-hole';
import { finalSweepPath } from '../api/save-final-sweep';
import { boltDownKeys, type FinalSweepResult, type HoleWriteResult } from '../types';

/**
 * Puts the server's answer to every write of this bolt-down into the cache when it arrives,
 * whether it was sent at once or long after (the connection came back). Mounted by the guide
 * for as long as the bolt-down is on screen, so no answer is missed while panels come and go.
 */
export function useBoltDownSync(boltDownId: string) {
  const qc = useQueryClient();
  useEffect(
    () =>
      onWriteSent((write, result) => {
        if (write.path.startsWith(holePath(boltDownId))) {
          qc.setQueryData(boltDownKeys.detail(boltDownId), result as HoleWriteResult);
          void qc.invalidateQueries({ queryKey: [...boltDownKeys.all, 'rail'] });
        } else if (write.path === finalSweepPath(boltDownId)) {
          const { boltDown, sweep } = result as FinalSweepResult;
          qc.setQueryData(boltDownKeys.detail(boltDownId), boltDown);
          qc.setQueryData([...boltDownKeys.all, 'sweep', sweep.id], sweep);
          // A new rail sweep changes the rail page, the machine's checks and its history: look again.
          void qc.invalidateQueries();
        }
      }),
    [boltDownId, qc],
  );
}
