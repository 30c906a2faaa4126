import {
  compoundProblem,
  hoseClassInfo,
  hoseClassProblem,
  sealCompoundLabels,
  suitableCompounds,
  type Fluid,
  type Part,
  type SealCompound,
  type SealNeed,
} from '@linesmith/catalog';
import { plugSealNeeds, sealDescription, sealKey, stackSealNeeds, suitedSealCatalogue, type SealService } from '../bom/seal-needs.js';
import type { Flag, FlagTarget } from './flag.js';
import { endName, jointTarget, lineTarget, partName, type Rule, type RuleContext } from './rule.js';

/** "fluorocarbon or PTFE", the compounds that suit the service (compatibility table: common practice). */
function compoundsToUse(service: SealService): string {
  const names = suitableCompounds(service.fluid, service.maxTempF).map((c) => sealCompoundLabels[c]);
  if (names.length === 0) return 'a compound rated for it';
  return names.length === 1 ? names[0] : `${names.slice(0, -1).join(', ')} or ${names[names.length - 1]}`;
}

function compoundFlag(what: string, compound: SealCompound, service: SealService, target: FlagTarget): Flag | undefined {
  const problem = compoundProblem(compound, service.fluid, service.maxTempF);
  if (!problem) return undefined;
  return {
    code: 'fluid',
    severity: 'blocker',
    message: `${what}: ${problem}.`,
    target,
    fix: `Use ${compoundsToUse(service)} for this seal.`,
  };
}

/** Flags for the seals one joint set needs: the catalogue part the bill would order for each. */
function neededSealFlags(needs: readonly SealNeed[], where: string, catalogue: ReturnType<typeof suitedSealCatalogue>, service: SealService, target: FlagTarget): Flag[] {
  const flags: Flag[] = [];
  const seen = new Set<string>();
  for (const need of needs) {
    const words = sealDescription(need);
    if (seen.has(words)) continue;
    seen.add(words);
    const part = catalogue.get(sealKey(need));
    if (!part) continue; // not in the catalogue: the bill names the compound to buy
    const compound = part.attributes.compound;
    if (compound === undefined) {
      flags.push({
        code: 'fluid',
        severity: 'caution',
        message: `${where}, ${partName(part)} does not say its compound, so it cannot be checked against ${service.fluid}.`,
        target,
        fix: `Set the compound on the seal part, or use a ${words} in ${compoundsToUse(service)}.`,
      });
      continue;
    }
    const problem = compoundProblem(compound, service.fluid, service.maxTempF);
    if (problem) {
      // The bill picks the best-suited part of each size, so this is the only one the catalogue has.
      flags.push({
        code: 'fluid',
        severity: 'blocker',
        message: `${where}, the catalogue's only ${words} is ${partName(part)}: ${problem}.`,
        target,
        fix: `Use a ${words} in ${compoundsToUse(service)}: add one to the catalogue.`,
      });
    }
  }
  return flags;
}

/** A part's fitted seal (an adapter's or plug's O-ring) with its compound. */
function fittedCompound(part: Part | undefined): SealCompound | undefined {
  if (part?.kind === 'adapter' || part?.kind === 'plug') return part.attributes.sealCompound;
  return undefined;
}

function checkLines(ctx: RuleContext, service: SealService, catalogue: ReturnType<typeof suitedSealCatalogue>): Flag[] {
  const flags: Flag[] = [];
  const { fluid } = service;
  for (const line of ctx.lines) {
    const hose = line.hose;
    if (hose && !hose.attributes.fluids.includes(fluid)) {
      flags.push({
        code: 'fluid',
        severity: 'blocker',
        message: `${partName(hose)} (${hose.attributes.liner} liner) is rated for ${hose.attributes.fluids.join(', ')}, not ${fluid}.`,
        target: lineTarget(line.line.id),
        fix: `Choose a hose rated for ${fluid}${fluid === 'e85' ? ' (PTFE liner)' : ''}.`,
      });
    }
    const hoseClass = hose?.attributes.hoseClass;
    const classProblem = hoseClass ? hoseClassProblem(hoseClass, fluid, service.maxTempF) : undefined;
    if (hose && hoseClass && classProblem) {
      flags.push({
        code: 'fluid',
        severity: 'blocker',
        message: `${partName(hose)} is ${hoseClassInfo[hoseClass].standard} hose: ${classProblem}.`,
        target: lineTarget(line.line.id),
        fix: `Choose a hose whose class is made for ${fluid} at this temperature.`,
      });
    }
    for (const end of ['from', 'to'] as const) {
      const stack = line.stacks[end];
      for (const item of stack.items) {
        const part = item.part;
        const target = jointTarget(line.line.id, end, item.index);
        if (part?.kind === 'seal' && part.attributes.compound !== undefined) {
          const flag = compoundFlag(`At ${endName(line, end)}, ${partName(part)}`, part.attributes.compound, service, target);
          if (flag) flags.push(flag);
        }
        const fitted = fittedCompound(part);
        if (part && fitted !== undefined) {
          const flag = compoundFlag(`At ${endName(line, end)}, the seal fitted to ${partName(part)} (${sealCompoundLabels[fitted]})`, fitted, service, target);
          if (flag) flags.push(flag);
        }
      }
      flags.push(...neededSealFlags(stackSealNeeds(line[end], stack), `At ${endName(line, end)}`, catalogue, service, jointTarget(line.line.id, end, 0)));
    }
  }
  return flags;
}

function checkPlugs(ctx: RuleContext, service: SealService, catalogue: ReturnType<typeof suitedSealCatalogue>): Flag[] {
  const flags: Flag[] = [];
  for (const entry of ctx.ports.values()) {
    const plugId = entry.port.plugPartId;
    if (!plugId || ctx.lineByPort.has(entry.key)) continue;
    const plug = ctx.parts.get(plugId);
    const target: FlagTarget = { kind: 'joint', id: `${entry.key}:plug`, unitId: entry.unit.id };
    const fitted = fittedCompound(plug);
    if (plug && fitted !== undefined) {
      const flag = compoundFlag(`The seal fitted to ${partName(plug)} in port ${entry.key} (${sealCompoundLabels[fitted]})`, fitted, service, target);
      if (flag) flags.push(flag);
    }
    flags.push(...neededSealFlags(plugSealNeeds(entry, plug), `At the plug in port ${entry.key}`, catalogue, service, target));
  }
  return flags;
}

export const fluidRule: Rule = {
  code: 'fluid',
  severity: 'blocker',
  title: 'Hose or seal not rated for the fluid',
  description:
    'The hose liner and the hose class must be made for the fluid and temperature it carries: ethanol blends such as E85 need a PTFE-lined hose, and fuel must never run in a hose rated only for oil or coolant. Every O-ring and washer in the joints — listed in an end stack, fitted to an adapter or plug, or ordered for a port — must be of a compound that suits the fluid (for example fluorocarbon or PTFE, never nitrile, with E85), from a compatibility table of common practice; a seal whose compound is not stated is a caution.',
  check(ctx) {
    const doc = ctx.doc.circuit;
    const service: SealService = { fluid: doc.fluid as Fluid, maxTempF: doc.maxTempF };
    const catalogue = suitedSealCatalogue(ctx.parts, service);
    return [...checkLines(ctx, service, catalogue), ...checkPlugs(ctx, service, catalogue)];
  },
};
