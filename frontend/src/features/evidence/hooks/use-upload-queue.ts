import { useCallback, useEffect, useState, useSyncExternalStore } from 'react';
import { useMutationState, useQueryClient, type Mutation } from '@tanstack/react-query';
import { COMMAND_KEY, type CommandVariables } from '../../../lib/offline/commands';
import { abortUpload, CANCELLED_STATUS, onUploadProgress, uploadProgress } from '../../../lib/offline/send-form';
import { useCommand } from '../../../lib/offline/use-command';
import { sessionOwner } from '../../../lib/offline/session-owner';
import { ApiError } from '../../../lib/api-client';
import { evidenceKeys, type Evidence, type EvidenceLimits, type EvidenceSubject } from '../types';
import { formatBytes } from '../utils/format-bytes';

/** `waiting`: kept on this device until the connection returns (or an earlier entry has gone). */
export type UploadStatus = 'waiting' | 'uploading' | 'done' | 'refused' | 'cancelled';

export interface UploadItem {
  key: string;
  name: string;
  sizeBytes: number;
  /** 0…1 of the bytes sent. */
  progress: number;
  status: UploadStatus;
  message?: string;
  evidence?: Evidence;
}

export const EVIDENCE_PATH = '/evidence';

const isUploadFor = (subject: EvidenceSubject) => (v: CommandVariables | undefined) =>
  !!v?.form &&
  v.path === EVIDENCE_PATH &&
  v.form.fields.subjectType === subject.subjectType &&
  v.form.fields.subjectId === subject.subjectId &&
  v.ownerId === sessionOwner();

const variablesOf = (m: Mutation<unknown, Error, unknown, unknown>) =>
  m.state.variables as CommandVariables | undefined;

/** Redraws as bytes go out. */
function useProgressTick(): number {
  return useSyncExternalStore(onUploadProgress, tick, tick);
}
let version = 0;
onUploadProgress(() => version++);
const tick = () => version;

/**
 * Several files at once, each its own entry in the device's queue (sent with its own key, in
 * the order added, kept while there is no connection and sent when it returns, after a reload
 * too), each with its own progress and outcome. Refusals seen here are shown here (not again in
 * the banner above the page).
 */
export function useUploadQueue(subject: EvidenceSubject, limits: EvidenceLimits | undefined) {
  const qc = useQueryClient();
  const command = useCommand<Evidence>();
  // Refused before sending, and refusals or cancellations taken over from the queue.
  const [outcomes, setOutcomes] = useState<UploadItem[]>([]);
  useProgressTick();
  const matches = isUploadFor(subject);
  const queued = useMutationState({
    filters: { mutationKey: COMMAND_KEY, predicate: (m) => matches(variablesOf(m)) },
    select: (m) => ({
      v: variablesOf(m)!,
      status: m.state.status,
      paused: m.state.isPaused,
      data: m.state.data as Evidence | undefined,
      error: m.state.error,
    }),
  });

  // A refusal (or a cancellation) becomes the list's own line and leaves the queue.
  useEffect(() => {
    const failed = queued.filter((q) => q.status === 'error');
    if (!failed.length) return;
    const cancelled = (e: unknown) => e instanceof ApiError && e.status === CANCELLED_STATUS;
    // The mutation cache is an outside store: its failed uploads move into this list and are
    // removed from the cache in the same step, so the effect is the place for both.
    // eslint-disable-next-line react-hooks/set-state-in-effect
    setOutcomes((list) => [
      ...failed.map((q): UploadItem => ({
        key: q.v.key,
        name: q.v.form!.fileName,
        sizeBytes: q.v.form!.file.size,
        progress: 0,
        status: cancelled(q.error) ? 'cancelled' : 'refused',
        message: q.error?.message ?? '',
      })),
      ...list,
    ]);
    for (const m of qc.getMutationCache().findAll({ mutationKey: COMMAND_KEY, status: 'error' }))
      if (failed.some((q) => q.v.key === variablesOf(m)?.key)) qc.getMutationCache().remove(m);
  }, [queued, qc]);

  const fromQueue = queued
    .filter((q) => q.status !== 'error' && q.status !== 'idle')
    .map((q): UploadItem => {
      const status: UploadStatus = q.status === 'success' ? 'done' : q.paused ? 'waiting' : 'uploading';
      return {
        key: q.v.key,
        name: q.v.form!.fileName,
        sizeBytes: q.v.form!.file.size,
        progress: status === 'done' ? 1 : uploadProgress(q.v.key),
        status,
        evidence: q.data,
      };
    })
    .reverse();
  const items = [...fromQueue, ...outcomes];

  const add = useCallback(
    (files: File[], caption?: string) => {
      const refused: UploadItem[] = [];
      for (const file of files) {
        const item = {
          key: `refused-${Math.random().toString(36).slice(2)}`,
          name: file.name,
          sizeBytes: file.size,
          progress: 0,
          status: 'refused' as const,
        };
        if (limits && file.size > limits.maxBytes) {
          // Refused here already: no point sending what the server will refuse.
          refused.push({
            ...item,
            message: `${file.name} is ${formatBytes(file.size)}, over the limit of ${formatBytes(limits.maxBytes)} a file`,
          });
          continue;
        }
        if (file.size === 0) {
          refused.push({ ...item, message: `${file.name} is empty (0 bytes)` });
          continue;
        }
        const fields: Record<string, string> = { subjectType: subject.subjectType, subjectId: subject.subjectId };
        if (caption?.trim()) fields.caption = caption.trim();
        command.send({
          method: 'POST',
          path: EVIDENCE_PATH,
          form: { fields, file, fileName: file.name },
          label: `Photo or file ${file.name}`,
          refresh: [evidenceKeys.all],
        });
      }
      if (refused.length) setOutcomes((list) => [...refused, ...list]);
    },
    [limits, subject, command],
  );

  const removeFromQueue = useCallback(
    (key: string) => {
      const m = qc
        .getMutationCache()
        .findAll({ mutationKey: COMMAND_KEY })
        .find((x) => variablesOf(x)?.key === key);
      if (m) qc.getMutationCache().remove(m);
    },
    [qc],
  );
  const cancel = useCallback(
    (key: string) => {
      if (abortUpload(key)) return;
      // Not on its way yet: it leaves the queue here.
      const waiting = fromQueue.find((i) => i.key === key);
      removeFromQueue(key);
      if (waiting)
        setOutcomes((list) => [{ ...waiting, status: 'cancelled', message: `${waiting.name}: not sent` }, ...list]);
    },
    [fromQueue, removeFromQueue],
  );
  const dismiss = useCallback(
    (key: string) => {
      setOutcomes((list) => list.filter((i) => i.key !== key));
      if (fromQueue.some((i) => i.key === key && i.status === 'done')) removeFromQueue(key);
    },
    [fromQueue, removeFromQueue],
  );
  const clearFinished = useCallback(() => {
    setOutcomes([]);
    for (const i of fromQueue) if (i.status === 'done') removeFromQueue(i.key);
  }, [fromQueue, removeFromQueue]);

  // A file on its way when the page is left would be sent again from the start at the next visit: ask first.
  const busy = items.some((i) => i.status === 'uploading');
  useEffect(() => {
    if (!busy) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [busy]);

  return { items, add, cancel, dismiss, clearFinished };
}
