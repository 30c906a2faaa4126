import type { Part } from '@linesmith/catalog';
import type { PortEntry } from '../lines/port-entry.js';
import { formatInches } from '../units/length-format.js';
import { isAbove, isBelow } from './compare.js';
import type { Flag, FlagTarget } from './flag.js';
import { jointTarget, partName, type Rule } from './rule.js';

/** How far a part screwed into a port reaches past its face; undefined when the catalogue does not say. */
function reachOf(part: Part): number | undefined {
  if (part.kind === 'adapter' || part.kind === 'hose-end' || part.kind === 'plug') return part.attributes.reachIn;
  return undefined;
}

const limitsOf = (entry: PortEntry) => {
  const { threadDepthIn, passageDepthIn, minReachIn } = entry.port;
  return threadDepthIn === undefined && passageDepthIn === undefined && minReachIn === undefined
    ? undefined
    : { threadDepthIn, passageDepthIn, minReachIn };
};

function checkPart(entry: PortEntry, part: Part, target: FlagTarget): Flag[] {
  const limits = limitsOf(entry);
  if (!limits) return [];
  const where = `${entry.unit.label || entry.unit.id} ${entry.port.label || entry.port.id}`;
  const reach = reachOf(part);
  if (reach === undefined) {
    return [
      {
        code: 'port-reach',
        severity: 'note',
        message: `The port at ${where} has depth limits, but the catalogue gives no reach for ${partName(part)}: the reach was not checked.`,
        target,
        fix: 'Enter the part’s reach (how far its thread goes past the port face) in the catalogue, or check it against the port by hand.',
      },
    ];
  }
  const flags: Flag[] = [];
  const flag = (message: string, fix: string) => flags.push({ code: 'port-reach', severity: 'blocker', message, target, fix });
  if (limits.threadDepthIn !== undefined && isAbove(reach, limits.threadDepthIn)) {
    flag(
      `${partName(part)} reaches ${formatInches(reach)} in into the port at ${where}, past its ${formatInches(limits.threadDepthIn)} in of usable thread: it bottoms before it seals.`,
      'Use a fitting with a shorter reach for this port.',
    );
  }
  if (limits.passageDepthIn !== undefined && !isBelow(reach, limits.passageDepthIn)) {
    flag(
      `${partName(part)} reaches ${formatInches(reach)} in into the port at ${where}; the internal passage behind it starts ${formatInches(limits.passageDepthIn)} in in: the fitting blocks the passage.`,
      'Use a fitting whose reach stops short of the passage.',
    );
  }
  if (limits.minReachIn !== undefined && isBelow(reach, limits.minReachIn)) {
    flag(
      `${partName(part)} reaches only ${formatInches(reach)} in into the port at ${where}, which needs at least ${formatInches(limits.minReachIn)} in${entry.port.requirement ? ` (${entry.port.requirement.reason})` : ''}.`,
      `Use the port’s ${entry.port.requirement?.feature ?? 'longer-reach'} fitting, reaching at least ${formatInches(limits.minReachIn)} in.`,
    );
  }
  return flags;
}

export const portReachRule: Rule = {
  code: 'port-reach',
  severity: 'blocker',
  title: 'Fitting reach against the port',
  description:
    'A port can limit how far a fitting may go in: its usable thread depth (a longer fitting bottoms before it seals), an internal passage behind it (a fitting reaching it blocks the flow) and a least reach (a return that feeds lubrication may need the long-nose fitting to reach its passage). The part screwed into the port (seals aside), or its plug, is checked against each limit the port gives, with the numbers.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const line of ctx.lines) {
      for (const end of ['from', 'to'] as const) {
        const entry = line[end];
        if (!entry || !limitsOf(entry)) continue;
        const first = line.stacks[end].items.find((i) => i.part?.kind !== 'seal');
        if (!first?.part) continue; // nothing in the port: incomplete-line or missing-part says so
        flags.push(...checkPart(entry, first.part, jointTarget(line.line.id, end, first.index)));
      }
    }
    for (const entry of ctx.ports.values()) {
      const plugId = entry.port.plugPartId;
      if (!plugId || ctx.lineByPort.has(entry.key)) continue;
      const plug = ctx.parts.get(plugId);
      if (plug?.kind !== 'plug') continue; // open-port flags a plug that is not one
      flags.push(...checkPart(entry, plug, { kind: 'joint', id: `${entry.key}:plug`, unitId: entry.unit.id }));
    }
    return flags;
  },
};
