import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import { useApiClient } from '../../../lib/useApiClient';
import { buildKeys } from '../api/build-keys';
import { uploadPhoto } from '../api/upload-photo';
import { checkPhotoFile } from '../utils/check-photo-file';

export interface PhotoUploadItem {
  key: string;
  fileName: string;
  /** 0…1 while sending. */
  progress: number;
  status: 'rejected' | 'uploading' | 'failed' | 'done';
  message?: string;
}

let nextKey = 0;

/**
 * The queue of photos being sent for one build: each file is checked here first (type, size),
 * then sent on its own request with its own progress. Unmounting cancels what is still in flight.
 */
export function usePhotoUploads(buildId: string) {
  const client = useApiClient();
  const queryClient = useQueryClient();
  const [items, setItems] = useState<PhotoUploadItem[]>([]);
  const controllers = useRef(new Set<AbortController>());

  useEffect(() => {
    const inFlight = controllers.current;
    return () => {
      for (const controller of inFlight) controller.abort();
      inFlight.clear();
    };
  }, []);

  const update = useCallback((key: string, change: Partial<PhotoUploadItem>) => {
    setItems((current) => current.map((item) => (item.key === key ? { ...item, ...change } : item)));
  }, []);

  const addFiles = useCallback(
    (files: Iterable<File>) => {
      for (const file of files) {
        const key = `upload-${(nextKey += 1)}`;
        const problem = checkPhotoFile(file);
        if (problem) {
          setItems((current) => [...current, { key, fileName: file.name, progress: 0, status: 'rejected', message: problem }]);
          continue;
        }
        setItems((current) => [...current, { key, fileName: file.name, progress: 0, status: 'uploading' }]);
        const controller = new AbortController();
        controllers.current.add(controller);
        uploadPhoto({ client, buildId, file, signal: controller.signal, onProgress: (progress) => update(key, { progress }) })
          .then(() => {
            update(key, { status: 'done', progress: 1 });
            return queryClient.invalidateQueries({ queryKey: buildKeys.uploads(buildId) });
          })
          .catch((error: unknown) => {
            if (controller.signal.aborted) return;
            update(key, { status: 'failed', message: error instanceof Error ? error.message : 'The upload failed.' });
          })
          .finally(() => controllers.current.delete(controller));
      }
    },
    [buildId, client, queryClient, update],
  );

  const dismiss = useCallback((key: string) => setItems((current) => current.filter((item) => item.key !== key)), []);

  return { items, addFiles, dismiss };
}
