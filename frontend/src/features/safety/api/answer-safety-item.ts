import { useQueryClient } from '@tanstack/react-query';
import { useCommand } from '../../../lib/offline/use-command';
import { sessionOwner, sessionOwnerName } from '../../../lib/offline/session-owner';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import type { Schemas } from '../../../lib/api/schemas';
import { safetyKeys, type SafetyWalk } from '../types';

export type AnswerInput = Schemas['AnswerItemDto'] & {
  itemId: string;
  /** The item's words, for the list of entries waiting to be sent. */
  itemText: string;
};

/**
 * Answers one item of the walk. Shown at once (kept on the device and sent when the connection
 * returns, if there is none); the walk is read again from the server once it is recorded.
 */
export function useAnswerSafetyItem(machineId: string) {
  const qc = useQueryClient();
  const command = useCommand<SafetyWalk>();
  const mutate = ({ itemId, itemText, ...body }: AnswerInput) => {
    qc.setQueryData<SafetyWalk>(
      safetyKeys.walk(machineId),
      (walk) =>
        walk && {
          ...walk,
          sections: walk.sections.map((s) => ({
            ...s,
            items: s.items.map((i) =>
              i.id === itemId
                ? {
                    ...i,
                    answer: {
                      id: i.answer?.id ?? 'waiting',
                      answer: body.answer,
                      note: body.note ?? '',
                      answeredBy: { id: sessionOwner() ?? null, name: sessionOwnerName() },
                      answeredAt: new Date().toISOString(),
                    },
                  }
                : i,
            ),
          })),
        },
    );
    command.send({
      method: 'PUT',
      path: `/machines/${machineId}/safety-walk/items/${encodeURIComponent(itemId)}`,
      body,
      label: `Safety walk: “${itemText}” answered ${body.answer}`,
      refresh: [safetyKeys.walk(machineId), ...MACHINE_STATE_KEYS],
    });
  };
  const sending = command.isPending && !command.isPaused ? (command.variables?.path.split('/').pop() ?? null) : null;
  return {
    mutate,
    sendingItemId: sending ? decodeURIComponent(sending) : null,
    error: command.error,
    reset: command.reset,
  };
}
