import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { buildQueryOptions } from '../api/build-query-options';

/** The build by id; an empty id (not known yet) waits without asking. */
export function useBuild(id: string) {
  return useQuery({ ...buildQueryOptions(useApiClient(), id), enabled: id !== '' });
}
