import { solveAdapters, type HoseEndPart, type Part } from '@linesmith/catalog';
import type { CircuitPort } from '@linesmith/routing';

export interface EndStackSuggestion {
  /** Part ids from the port outward: the adapters, then the hose end. */
  partIds: string[];
  label: string;
  /** True when the part in the port meets the port's requirement (e.g. long-nose). */
  meetsRequirement: boolean;
  lengthIn: number;
}

/**
 * End stacks that join a port to the hose through each candidate hose end, from the adapter
 * solver run locally against the loaded catalogue, honouring the port's requirement.
 */
export function endStackSuggestions(
  port: CircuitPort,
  hoseEnds: readonly HoseEndPart[],
  parts: readonly Part[],
  limitPerEnd = 3,
): EndStackSuggestion[] {
  const suggestions: EndStackSuggestion[] = [];
  for (const hoseEnd of hoseEnds) {
    const chains = solveAdapters(port.connection, hoseEnd.attributes.port, parts, {
      limit: limitPerEnd,
      ...(port.requirement ? { requirement: port.requirement } : {}),
    });
    for (const chain of chains) {
      const names = [...chain.parts.map((p) => p.description), hoseEnd.description];
      suggestions.push({
        partIds: [...chain.parts.map((p) => p.id), hoseEnd.id],
        label: names.join(' + '),
        meetsRequirement: !port.requirement || chain.partCount > 0,
        lengthIn: chain.bodyLengthIn + hoseEnd.attributes.allowanceIn,
      });
    }
  }
  return suggestions;
}
