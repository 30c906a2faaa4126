import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { revisionCheckQueryOptions, revisionQueryOptions } from '../api/circuit-query-options';

/** A saved revision and, once it has loaded, its check. */
export function useRevision(circuitId: string, number: number) {
  const client = useApiClient();
  const revision = useQuery(revisionQueryOptions(client, circuitId, number));
  const check = useQuery(revisionCheckQueryOptions(client, circuitId, number, revision.data?.document));
  return { revision, check };
}
