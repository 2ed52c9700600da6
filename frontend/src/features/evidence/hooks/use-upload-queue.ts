import { useCallback, useEffect, useRef, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { uploadEvidence, type UploadHandle } from '../api/upload-evidence';
import { evidenceKeys, type Evidence, type EvidenceLimits, type EvidenceSubject } from '../types';
import { formatBytes } from '../utils/format-bytes';

export type UploadStatus = 'uploading' | 'done' | 'refused' | 'cancelled';

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

let counter = 0;

/** Several files at once: each its own request, progress and outcome. */
export function useUploadQueue(subject: EvidenceSubject, limits: EvidenceLimits | undefined) {
  const qc = useQueryClient();
  const [items, setItems] = useState<UploadItem[]>([]);
  const handles = useRef(new Map<string, UploadHandle>());

  const patch = useCallback((key: string, change: Partial<UploadItem>) => {
    setItems((list) => list.map((i) => (i.key === key ? { ...i, ...change } : i)));
  }, []);

  const add = useCallback(
    (files: File[], caption?: string) => {
      const fresh: UploadItem[] = [];
      for (const file of files) {
        const key = `upload-${++counter}`;
        const item: UploadItem = { key, name: file.name, sizeBytes: file.size, progress: 0, status: 'uploading' };
        if (limits && file.size > limits.maxBytes) {
          // Refused here already: no point sending what the server will refuse.
          fresh.push({ ...item, status: 'refused', message: `${file.name} is ${formatBytes(file.size)}, over the limit of ${formatBytes(limits.maxBytes)} a file` });
          continue;
        }
        if (file.size === 0) {
          fresh.push({ ...item, status: 'refused', message: `${file.name} is empty (0 bytes)` });
          continue;
        }
        fresh.push(item);
        const handle = uploadEvidence({ ...subject, file, caption }, (progress) => patch(key, { progress }));
        handles.current.set(key, handle);
        handle.done
          .then((evidence) => {
            patch(key, { status: 'done', progress: 1, evidence });
            qc.invalidateQueries({ queryKey: evidenceKeys.all });
          })
          .catch((err: Error) => patch(key, { status: err.message === 'Upload cancelled' ? 'cancelled' : 'refused', message: err.message }))
          .finally(() => handles.current.delete(key));
      }
      setItems((list) => [...fresh, ...list]);
    },
    [limits, subject, patch, qc],
  );

  const cancel = useCallback((key: string) => handles.current.get(key)?.abort(), []);
  const dismiss = useCallback((key: string) => setItems((list) => list.filter((i) => i.key !== key)), []);
  const clearFinished = useCallback(() => setItems((list) => list.filter((i) => i.status === 'uploading')), []);

  // Uploads still under way when the uploader closes (another tab of the machine file) carry on;
  // the gallery picks them up when they land. Leaving the app itself would cut them off: ask first.
  const busy = items.some((i) => i.status === 'uploading');
  useEffect(() => {
    if (!busy) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [busy]);

  return { items, add, cancel, dismiss, clearFinished };
}
