import type { CircuitDocument } from '@linesmith/routing';
import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { circuitCheckSchema } from './check-schema';
import { circuitKeys } from './circuit-keys';
import { circuitListSchema, circuitSchema } from './circuit-schema';
import { circuitDraftSchema } from './draft-schema';
import { revisionListSchema, revisionSchema } from './revision-schema';

const at = (id: string) => `/api/circuits/${encodeURIComponent(id)}`;

export function buildCircuitsQueryOptions(client: ApiClient, buildId: string) {
  return queryOptions({
    queryKey: circuitKeys.byBuild(buildId),
    queryFn: ({ signal }) =>
      client.request(`/api/builds/${encodeURIComponent(buildId)}/circuits`, { schema: circuitListSchema, signal }),
  });
}

export function circuitQueryOptions(client: ApiClient, id: string) {
  return queryOptions({
    queryKey: circuitKeys.detail(id),
    queryFn: ({ signal }) => client.request(at(id), { schema: circuitSchema, signal }),
  });
}

export function circuitDraftQueryOptions(client: ApiClient, id: string) {
  return queryOptions({
    queryKey: circuitKeys.draft(id),
    queryFn: ({ signal }) => client.request(`${at(id)}/draft`, { schema: circuitDraftSchema, signal }),
  });
}

/** The authoritative check of the circuit's draft (cut lengths, flags, bill of materials). */
export function circuitCheckQueryOptions(client: ApiClient, id: string) {
  return queryOptions({
    queryKey: circuitKeys.check(id),
    queryFn: ({ signal }) => client.request(`${at(id)}/check`, { schema: circuitCheckSchema, signal }),
  });
}

export function revisionsQueryOptions(client: ApiClient, id: string) {
  return queryOptions({
    queryKey: circuitKeys.revisions(id),
    queryFn: ({ signal }) => client.request(`${at(id)}/revisions`, { schema: revisionListSchema, signal }),
  });
}

export function revisionQueryOptions(client: ApiClient, id: string, number: number) {
  return queryOptions({
    queryKey: circuitKeys.revision(id, number),
    queryFn: ({ signal }) => client.request(`${at(id)}/revisions/${number}`, { schema: revisionSchema, signal }),
    // A revision never changes once saved.
    staleTime: Infinity,
  });
}

/** A saved revision checked by the rules module against today's catalogue and shop rules. */
export function revisionCheckQueryOptions(client: ApiClient, id: string, number: number, document: CircuitDocument | undefined) {
  return queryOptions({
    queryKey: circuitKeys.revisionCheck(id, number),
    queryFn: ({ signal }) =>
      client.request('/api/rules/evaluate', { method: 'POST', body: document, schema: circuitCheckSchema, signal }),
    enabled: document !== undefined,
  });
}
