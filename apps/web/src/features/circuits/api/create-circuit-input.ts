import type { Fluid } from '@linesmith/catalog';
import type { CircuitKind } from '@linesmith/routing';

/** Body of `POST /api/builds/:buildId/circuits`. */
export interface CreateCircuitInput {
  name: string;
  kind: CircuitKind;
  fluid: Fluid;
  maxPressurePsi: number;
  maxTempF: number;
}
