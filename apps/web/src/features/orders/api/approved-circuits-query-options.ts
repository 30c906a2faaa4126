import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { buildPageSchema } from '../../builds/api/build-page-schema';
import type { Build } from '../../builds/api/build-schema';
import { vehicleTitle } from '../../builds/utils/vehicle-title';
import { circuitListSchema, type Circuit } from '../../circuits/api/circuit-schema';
import { orderKeys } from './order-keys';

export interface ApprovedCircuit {
  circuit: Circuit;
  buildId: string;
  buildTitle: string;
}

async function approvedOf(client: ApiClient, build: Build, signal: AbortSignal): Promise<ApprovedCircuit[]> {
  const circuits = await client.request(`/api/builds/${encodeURIComponent(build.id)}/circuits`, { schema: circuitListSchema, signal });
  return circuits
    .filter((circuit) => circuit.status === 'approved')
    .map((circuit) => ({ circuit, buildId: build.id, buildTitle: vehicleTitle(build.vehicle) }));
}

/** Approved circuits of the shop's open builds: the builds list counts them, so only builds with some are opened. */
export function approvedCircuitsQueryOptions(client: ApiClient) {
  return queryOptions({
    queryKey: orderKeys.approvedCircuits(),
    queryFn: async ({ signal }) => {
      const page = await client.request('/api/builds?pageSize=200&page=1', { schema: buildPageSchema, signal });
      const withApproved = page.items.filter((build) => build.circuitCounts.approved > 0);
      const lists = await Promise.all(withApproved.map((build) => approvedOf(client, build, signal)));
      return lists.flat();
    },
  });
}
