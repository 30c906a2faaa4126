import { hoseEndFitsHose, type HoseEndPart, type HosePart, type Part } from '@linesmith/catalog';
import type { CircuitSettings } from '@linesmith/routing';

/** Hoses rated for the circuit's fluid, pressure and temperature (what the rating rules check). */
export function hosesForCircuit(parts: readonly Part[], circuit: CircuitSettings): HosePart[] {
  return parts.filter(
    (p): p is HosePart =>
      p.kind === 'hose' &&
      !p.retired &&
      p.attributes.fluids.includes(circuit.fluid) &&
      p.attributes.maxPressurePsi >= circuit.maxPressurePsi &&
      p.attributes.maxTempF >= circuit.maxTempF,
  );
}

/** Hose ends that fit the hose (dash and hose type). */
export function hoseEndsForHose(parts: readonly Part[], hose: HosePart | undefined): HoseEndPart[] {
  if (!hose) return [];
  return parts.filter((p): p is HoseEndPart => p.kind === 'hose-end' && !p.retired && hoseEndFitsHose(p, hose));
}

export const partLabel = (part: Part | undefined, id: string): string =>
  part ? `${part.description}${part.supplierPartNumber ? ` (${part.supplierPartNumber})` : ''}` : `Unknown part ${id}`;
