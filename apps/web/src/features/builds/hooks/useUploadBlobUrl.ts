import { useEffect, useState } from 'react';
import { useApiClient } from '../../../lib/useApiClient';

export type BlobUrlState = { status: 'loading' } | { status: 'ready'; url: string } | { status: 'error'; message: string };

/**
 * An object URL for an upload's bytes (`GET /api/uploads/:id/content` needs the bearer token, so
 * no plain <img src>), revoked when the component unmounts or the id changes.
 */
export function useUploadBlobUrl(uploadId: string): BlobUrlState {
  const client = useApiClient();
  const [state, setState] = useState<BlobUrlState>({ status: 'loading' });
  useEffect(() => {
    const controller = new AbortController();
    let url: string | null = null;
    setState({ status: 'loading' });
    client
      .requestBlob(`/api/uploads/${encodeURIComponent(uploadId)}/content`, { signal: controller.signal })
      .then((blob) => {
        if (controller.signal.aborted) return;
        url = URL.createObjectURL(blob);
        setState({ status: 'ready', url });
      })
      .catch((error: unknown) => {
        if (controller.signal.aborted) return;
        setState({ status: 'error', message: error instanceof Error ? error.message : 'The photo could not be loaded.' });
      });
    return () => {
      controller.abort();
      if (url) URL.revokeObjectURL(url);
    };
  }, [client, uploadId]);
  return state;
}
