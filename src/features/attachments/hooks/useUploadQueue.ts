import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useRef, useState } from 'react';
import type { ApiError } from '../../../lib/api';
import { attachmentKeys } from '../api/queries';
import { uploadFile } from '../api/upload';

export interface QueuedUpload {
  key: string;
  name: string;
  size: number;
  sent: number;
  state: 'sending' | 'failed';
  error?: string;
}

let counter = 0;

/**
 * One request per file, all at once, so each has its own progress and can be cancelled alone.
 * Finished files leave the queue (they appear in the list); failed ones stay until dismissed.
 */
export function useUploadQueue(pageId: string) {
  const client = useQueryClient();
  const [items, setItems] = useState<QueuedUpload[]>([]);
  const cancels = useRef(new Map<string, () => void>());

  const update = useCallback((key: string, change: Partial<QueuedUpload>) => {
    setItems((current) => current.map((item) => (item.key === key ? { ...item, ...change } : item)));
  }, []);
  const drop = useCallback((key: string) => {
    cancels.current.delete(key);
    setItems((current) => current.filter((item) => item.key !== key));
  }, []);

  const add = useCallback(
    (files: Iterable<File>) => {
      for (const file of files) {
        const key = `upload-${++counter}`;
        setItems((current) => [...current, { key, name: file.name, size: file.size, sent: 0, state: 'sending' }]);
        const running = uploadFile(pageId, file, (sent) => update(key, { sent }));
        cancels.current.set(key, running.cancel);
        running.done.then(
          () => {
            drop(key);
            void client.invalidateQueries({ queryKey: attachmentKeys.ofPage(pageId) });
          },
          (error: ApiError) => {
            if (error.code === 'cancelled') {
              drop(key);
              // A cancel that comes after the server had every byte still leaves the file stored: show what is there.
              void client.invalidateQueries({ queryKey: attachmentKeys.ofPage(pageId) });
            } else {
              update(key, { state: 'failed', error: error.message });
            }
            cancels.current.delete(key);
          },
        );
      }
    },
    [client, drop, pageId, update],
  );

  const cancel = useCallback((key: string) => cancels.current.get(key)?.(), []);

  return { items, add, cancel, dismiss: drop };
}
