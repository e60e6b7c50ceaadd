import { useQueryClient } from '@tanstack/react-query';
import type { DatasheetListItem, UploadRejection } from '@understudy/shared-types';
import { useCallback, useEffect, useRef, useState } from 'react';
import { isAbortError, uploadDatasheet, uploadRejectionOf } from '../api/upload-datasheet';
import { datasheetKeys } from '../keys';

export type UploadPhase = 'waiting' | 'uploading' | 'done' | 'refused' | 'failed' | 'cancelled';

export interface UploadEntry {
  key: string;
  /** Order of choosing: files go up in the order they were picked. */
  seq: number;
  file: File;
  phase: UploadPhase;
  loaded: number;
  total: number;
  /** The stored datasheet, once the server took the file. */
  item?: DatasheetListItem;
  /** Why the server (or, for a file that is plainly no PDF, this page) refused it. */
  rejection?: UploadRejection;
  /** A failure that was not about the file: the network, the session, the server. */
  error?: string;
}

/** A few at a time: each file gets its own request and bar, without one big batch starving the rest. */
const CONCURRENCY = 3;

let sequence = 0;

function looksLikePdf(file: File): boolean {
  return file.type === 'application/pdf' || /\.pdf$/i.test(file.name);
}

/** One request per file, so each has its own progress and one refused file does not hold back the others. */
export function useDatasheetUploads({ partId }: { partId?: string } = {}) {
  const queryClient = useQueryClient();
  const [uploads, setUploads] = useState<UploadEntry[]>([]);
  const controllers = useRef(new Map<string, AbortController>());

  const update = useCallback((key: string, patch: Partial<UploadEntry>) => {
    setUploads((list) => list.map((u) => (u.key === key ? { ...u, ...patch } : u)));
  }, []);

  const start = useCallback(
    (entry: UploadEntry) => {
      const controller = new AbortController();
      controllers.current.set(entry.key, controller);
      uploadDatasheet(entry.file, {
        partId,
        signal: controller.signal,
        onProgress: (loaded, total) => update(entry.key, { loaded, total }),
      })
        .then((item) => {
          update(entry.key, { phase: 'done', item, loaded: entry.total, error: undefined });
          void queryClient.invalidateQueries({ queryKey: datasheetKeys.lists() });
        })
        .catch((error: unknown) => {
          if (isAbortError(error)) return update(entry.key, { phase: 'cancelled' });
          const rejection = uploadRejectionOf(error);
          if (rejection) return update(entry.key, { phase: 'refused', rejection });
          update(entry.key, { phase: 'failed', error: error instanceof Error ? error.message : 'The upload failed.' });
        })
        .finally(() => controllers.current.delete(entry.key));
    },
    [partId, queryClient, update],
  );

  // Starts waiting files as slots free up.
  useEffect(() => {
    const running = uploads.filter((u) => u.phase === 'uploading').length;
    const next = uploads
      .filter((u) => u.phase === 'waiting')
      .sort((a, b) => a.seq - b.seq)
      .slice(0, Math.max(0, CONCURRENCY - running));
    if (next.length === 0) return;
    setUploads((list) => list.map((u) => (next.some((n) => n.key === u.key) ? { ...u, phase: 'uploading' } : u)));
    for (const entry of next) start(entry);
  }, [uploads, start]);

  // Leaving the page cancels what is still on its way; nothing half-sent is kept by the server.
  useEffect(() => {
    const live = controllers.current;
    return () => {
      for (const controller of live.values()) controller.abort();
    };
  }, []);

  const add = useCallback((files: File[]) => {
    const entries = files.map((file): UploadEntry => {
      const seq = ++sequence;
      const base = { key: `upload-${seq}`, seq, file, loaded: 0, total: file.size };
      if (!looksLikePdf(file)) {
        return {
          ...base,
          phase: 'refused',
          rejection: { fileName: file.name, code: 'not-pdf', message: `${file.name} is not a PDF; only PDF datasheets can be read.` },
        };
      }
      return { ...base, phase: 'waiting' };
    });
    // The latest batch on top, like the list below, in the order it was chosen.
    setUploads((list) => [...entries, ...list]);
  }, []);

  const cancel = useCallback(
    (key: string) => {
      const controller = controllers.current.get(key);
      if (controller) controller.abort();
      else update(key, { phase: 'cancelled' });
    },
    [update],
  );

  const retry = useCallback(
    (key: string) => update(key, { phase: 'waiting', seq: ++sequence, loaded: 0, error: undefined, rejection: undefined }),
    [update],
  );

  const dismiss = useCallback((key: string) => setUploads((list) => list.filter((u) => u.key !== key)), []);

  const clearFinished = useCallback(
    () => setUploads((list) => list.filter((u) => u.phase === 'waiting' || u.phase === 'uploading')),
    [],
  );

  return { uploads, add, cancel, retry, dismiss, clearFinished };
}
