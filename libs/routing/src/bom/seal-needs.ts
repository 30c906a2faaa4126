import type { Part, SealNeed } from '@linesmith/catalog';
import { sealForPort } from '@linesmith/catalog';
import type { ResolvedStack } from '../lines/end-stack.js';
import type { PortEntry } from '../lines/port-entry.js';

export const sealKey = (need: SealNeed): string =>
  need.type === 'o-ring' ? `o-ring:${need.as568}` : `crush-washer:${need.size}`;

export const sealDescription = (need: SealNeed): string =>
  need.type === 'o-ring'
    ? /^\d+$/.test(need.as568)
      ? `O-ring AS568-${need.as568}`
      : `O-ring ${need.as568}`
    : `Crush washer ${need.size}`;

/**
 * Seals one end stack needs: the port's own seal (O-ring boss, metric port) or, when the port
 * names none, the seal of the adapter in it; the seals of deeper adapters; less any seal parts
 * already listed in the stack.
 */
export function stackSealNeeds(port: PortEntry | undefined, stack: ResolvedStack): SealNeed[] {
  const needs: SealNeed[] = [];
  const portSeal = port ? sealForPort(port.port.connection) : undefined;
  if (portSeal) needs.push(portSeal);
  for (const item of stack.items) {
    const part = item.part;
    if (part?.kind !== 'adapter' || !part.attributes.seal) continue;
    if (item.index === 0 && portSeal) continue; // the same joint: the port's seal is the one it takes
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

/** Seals a plugged port needs: the port's seal, or the plug's own. */
export function plugSealNeeds(port: PortEntry, plug: Part | undefined): SealNeed[] {
  const portSeal = sealForPort(port.port.connection);
  if (portSeal) return [portSeal];
  return plug?.kind === 'plug' && plug.attributes.seal ? [plug.attributes.seal] : [];
}
