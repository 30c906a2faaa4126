import type { BuildStatus } from './build-schema';

/** Body of `POST /api/builds` (the server assigns id, version and timestamps). */
export interface CreateBuildInput {
  vehicle: { year: string; make: string; model: string; engine: string; transmission: string };
  customer: { name: string; phone: string; email: string };
  notes: string;
  status: BuildStatus;
}

/** Body of `PATCH /api/builds/:id`: the changed fields on top of the version they were made against. */
export type UpdateBuildInput = Partial<CreateBuildInput> & { version: number };
