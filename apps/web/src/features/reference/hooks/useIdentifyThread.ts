import type { ThreadReading } from '@linesmith/catalog';
import { useMutation } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { identifyThreadRequest } from '../api/identify-thread-request';

/** A lookup, not a change: nothing to invalidate afterwards. */
export function useIdentifyThread() {
  const client = useApiClient();
  return useMutation({ mutationFn: (reading: ThreadReading) => identifyThreadRequest(client, reading) });
}
