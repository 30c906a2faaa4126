/** Query keys of the circuits feature; a circuit's check and draft hang under its detail key. */
export const circuitKeys = {
  all: ['circuits'] as const,
  byBuild: (buildId: string) => [...circuitKeys.all, 'build', buildId] as const,
  details: () => [...circuitKeys.all, 'detail'] as const,
  detail: (id: string) => [...circuitKeys.details(), id] as const,
  draft: (id: string) => [...circuitKeys.detail(id), 'draft'] as const,
  check: (id: string) => [...circuitKeys.detail(id), 'check'] as const,
  revisions: (id: string) => [...circuitKeys.detail(id), 'revisions'] as const,
  revision: (id: string, number: number) => [...circuitKeys.revisions(id), number] as const,
  revisionCheck: (id: string, number: number) => [...circuitKeys.revision(id, number), 'check'] as const,
};
