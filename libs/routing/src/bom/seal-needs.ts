import type { Fluid, Part, PartOf, SealCompound, SealNeed } from '@linesmith/catalog';
import { compoundProblem, hasSeatForms, sealCompoundLabels, sealsForPort, suitableCompounds } from '@linesmith/catalog';
import type { ResolvedStack } from '../lines/end-stack.js';
import type { PortEntry } from '../lines/port-entry.js';

export const sealKey = (need: SealNeed): string => (need.type === 'o-ring' ? `o-ring:${need.as568}` : `${need.type}:${need.size}`);

/**
 * A seal in words, optionally with the compound to buy: "O-ring AS568-906",
 * "Bonded washer M14", "O-ring AS568-906, fluorocarbon".
 */
export const sealDescription = (need: SealNeed, compound?: string): string => {
  const base =
    need.type === 'o-ring'
      ? /^\d+$/.test(need.as568)
        ? `O-ring AS568-${need.as568}`
        : `O-ring ${need.as568}`
      : `${need.type === 'bonded-washer' ? 'Bonded washer' : 'Crush washer'} ${need.size}`;
  return compound ? `${base}, ${compound}` : base;
};

/**
 * The seals a joint at a port needs. For ports whose seat form decides the seal (metric, BSP
 * parallel) the stud in the port decides: a sealing-edge stud in an ISO 9974-1 port takes no
 * washer, a washer stud takes one. Otherwise the port's own seals (O-ring boss, ORFS, banjo).
 */
function portJointSeals(port: PortEntry | undefined, stack: ResolvedStack): SealNeed[] {
  if (!port) return [];
  const connection = port.port.connection;
  const first = stack.joints[0];
  if (hasSeatForms(connection.family) && first && first.index === 0 && first.result.ok) return sealsForPort(first.outer);
  return sealsForPort(connection);
}

/**
 * Seals one end stack needs: the seals of the joint at the port (see above) or, when it names
 * none, the seal of the adapter in it; the seals of deeper adapters; less any seal parts already
 * listed in the stack.
 */
export function stackSealNeeds(port: PortEntry | undefined, stack: ResolvedStack): SealNeed[] {
  const needs: SealNeed[] = [];
  const portSeals = portJointSeals(port, stack);
  needs.push(...portSeals);
  for (const item of stack.items) {
    const part = item.part;
    if (part?.kind !== 'adapter' || !part.attributes.seal) continue;
    if (item.index === 0 && (portSeals.length > 0 || (port && hasSeatForms(port.port.connection.family)))) continue; // the same joint: its seals are counted above
    needs.push(part.attributes.seal);
  }
  const listed: string[] = [];
  for (const item of stack.items) if (item.part?.kind === 'seal') listed.push(sealKey(item.part.attributes.seal));
  if (listed.length === 0) return needs; // the usual stack lists no seals: nothing to take off
  return needs.filter((need) => {
    const at = listed.indexOf(sealKey(need));
    if (at < 0) return true;
    listed.splice(at, 1);
    return false;
  });
}

/**
 * Seals a plugged port needs: the port's seals, or the plug's own. In a seat-form port (metric,
 * BSP parallel) a plug of the same family seals by its own seat form (a sealing-edge plug needs
 * no washer).
 */
export function plugSealNeeds(port: PortEntry, plug: Part | undefined): SealNeed[] {
  const connection = port.port.connection;
  if (hasSeatForms(connection.family) && plug?.kind === 'plug' && plug.attributes.connection.family === connection.family) {
    return sealsForPort(plug.attributes.connection);
  }
  const portSeals = sealsForPort(connection);
  if (portSeals.length > 0) return portSeals;
  return plug?.kind === 'plug' && plug.attributes.seal ? [plug.attributes.seal] : [];
}

/** The fluid and temperature a circuit's seals must suit. */
export interface SealService {
  fluid: Fluid;
  maxTempF?: number;
}

/**
 * How well a seal part suits the service: 0 compatible, 1 compound not stated, 2 not compatible.
 * Used to pick which of several catalogue parts of one seal size goes on the bill.
 */
export function sealSuitability(part: PartOf<'seal'>, service: SealService | undefined): number {
  if (!service) return 0;
  const { compound } = part.attributes;
  if (compound === undefined) return 1;
  return compoundProblem(compound, service.fluid, service.maxTempF) === undefined ? 0 : 2;
}

/** Seal parts by seal size, and the compound to buy for a size the catalogue lacks. */
export class SealCatalogue extends Map<string, PartOf<'seal'>> {
  constructor(readonly compoundToBuy: string | undefined) {
    super();
  }
}

/**
 * Where a suitable seal's compound comes in the usual choice for the service (`suitableCompounds`
 * order; after them, compounds not listed): picks between seal parts that suit equally, so the
 * choice never depends on the order the catalogue lists its parts in.
 */
function compoundPreference(part: PartOf<'seal'>, preferred: readonly SealCompound[]): number {
  const { compound } = part.attributes;
  const index = compound === undefined ? -1 : preferred.indexOf(compound);
  return index === -1 ? preferred.length : index;
}

/**
 * The shop's seal parts by seal size, the one that best suits the fluid and temperature of each
 * (among equals, the usual compound for the fluid first; then catalogue order), for the seals the
 * ports and adapters need.
 */
export function suitedSealCatalogue(parts: ReadonlyMap<string, Part> | Iterable<Part>, service: SealService | undefined): SealCatalogue {
  const chosen = new SealCatalogue(compoundToBuy(service));
  const preferred = service ? suitableCompounds(service.fluid, service.maxTempF) : [];
  const all = parts instanceof Map ? parts.values() : (parts as Iterable<Part>);
  for (const part of all) {
    if (part.kind !== 'seal' || part.retired) continue;
    const key = sealKey(part.attributes.seal);
    const current = chosen.get(key);
    if (!current) {
      chosen.set(key, part);
      continue;
    }
    const suits = sealSuitability(part, service) - sealSuitability(current, service);
    if (suits < 0 || (suits === 0 && compoundPreference(part, preferred) < compoundPreference(current, preferred))) chosen.set(key, part);
  }
  return chosen;
}

/** The compound to buy for a seal the catalogue lacks ("fluorocarbon"), from the compatibility table. */
export function compoundToBuy(service: SealService | undefined): string | undefined {
  if (!service) return undefined;
  const best = suitableCompounds(service.fluid, service.maxTempF)[0];
  return best === undefined ? undefined : sealCompoundLabels[best];
}

/**
 * A seal part as the bill of materials names it: its description, plus its hardness and compound
 * where the description does not already say them ("O-ring AS568-906 (90 Shore A fluorocarbon)").
 */
export function sealPartDescription(part: PartOf<'seal'>): string {
  const { compound, hardnessShoreA } = part.attributes;
  if (compound === undefined) return part.description;
  const label = sealCompoundLabels[compound];
  if (part.description.toLowerCase().includes(label.toLowerCase())) return part.description;
  return `${part.description} (${hardnessShoreA === undefined ? '' : `${hardnessShoreA} Shore A `}${label})`;
}
