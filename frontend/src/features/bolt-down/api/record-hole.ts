import { useQueryClient } from '@tanstack/react-query';
import type { Schemas } from '../../../lib/api/schemas';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { newCommandKey } from '../../../lib/offline/commands';
import { useCommand } from '../../../lib/offline/use-command';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { boltDownKeys, type BoltDown, type HoleWriteResult } from '../types';
import { positionText } from '../utils/position-text';

export interface RecordHoleInput {
  index: number;
  positionMm: number;
  /** In the bolt-down's unit. */
  reading: number;
  fixed: boolean;
}

export const holePath = (boltDownId: string, index?: number) => `/bolt-downs/${boltDownId}/holes/${index ?? ''}`;

/** Body of a hole write, as the guide reads it back from a waiting entry to show it before it is sent. */
export type HoleWriteBody = Schemas['RecordHoleDto'];

/** Queries a hole write changes: the bolt-down, the rail's list of them, and the machine's state. */
export const holeRefreshKeys = (bd: Pick<BoltDown, 'id' | 'railId'>) => [
  boltDownKeys.detail(bd.id),
  boltDownKeys.forRail(bd.railId),
  ...MACHINE_STATE_KEYS,
];

/**
 * Fixes (or loosens) a hole as an entry of the device's queue (lib/offline): sent at once when
 * there is a connection, kept and sent once, in order, when it returns. The write id is also the
 * entry's Idempotency-Key, so a resend is the same write. `onRefused` is called when the server
 * refuses it while the guide is open.
 */
export function useRecordHole(
  bd: Pick<BoltDown, 'id' | 'railId' | 'readingUnit' | 'lengthUnit'>,
  onRefused?: (input: RecordHoleInput, message: string) => void,
) {
  const qc = useQueryClient();
  const command = useCommand<HoleWriteResult>();
  return (input: RecordHoleInput) => {
    const writeId = newCommandKey();
    const body: HoleWriteBody = { reading: input.reading, fixed: input.fixed, writeId };
    const reading = `${input.reading > 0 ? '+' : ''}${input.reading} ${UNIT_LABELS[bd.readingUnit as LengthUnit]}`;
    command.send(
      {
        method: 'PUT',
        path: holePath(bd.id, input.index),
        body,
        label: `Hole ${input.index + 1} at ${positionText(input.positionMm, bd.lengthUnit)}: ${reading}${input.fixed ? ', fixed' : ''}`,
        refresh: holeRefreshKeys(bd),
      },
      {
        key: writeId,
        // The answer is the whole bolt-down as the server now has it.
        onSuccess: (result) => qc.setQueryData(boltDownKeys.detail(bd.id), result),
        onError: (err) => onRefused?.(input, err.message),
      },
    );
  };
}
