import { z } from 'zod';
import { connectionSpecSchema, fluidSchema, portRequirementSchema as partRequirementSchema } from '@linesmith/catalog';

/** The current version tag of a saved circuit document. Older tags are read through `migrateCircuitDocument`. */
export const CIRCUIT_SCHEMA = 'linesmith.circuit/1';

const id = z.string().trim().min(1, 'Id is required').max(64, 'Ids are at most 64 characters');
/**
 * Bounds that no real sketch comes near, so a hostile or corrupt document cannot make the engine
 * work without end: positions within 200,000 px of the origin (photos are a few thousand px),
 * lengths up to 12,000 in (1,000 ft), and a scale of at least 0.5 px per inch.
 */
export const SKETCH_LIMITS = {
  coordinatePx: 200_000,
  lengthIn: 12_000,
  minPxPerIn: 0.5,
  maxPxPerIn: 10_000,
  units: 500,
  portsPerUnit: 32,
  lines: 1_000,
  cornersPerLine: 200,
  partsPerEndStack: 12,
  supportsPerLine: 200,
  sleevesPerLine: 50,
  heatZones: 200,
  zonePoints: 200,
} as const;
const L = SKETCH_LIMITS;
const coordinate = z.number().finite().min(-L.coordinatePx).max(L.coordinatePx);
const inches = z.number().finite().nonnegative().max(L.lengthIn, `At most ${L.lengthIn} in`);
const label = z.string().trim().max(120, 'Labels are at most 120 characters').default('');
export const sketchPointSchema = z.object({ x: coordinate, y: coordinate });

export const unitKindSchema = z.enum([
  'transmission',
  'cooler',
  'engine',
  'pump',
  'filter',
  'tank',
  'rail',
  'regulator',
  'bulkhead-plate',
  'valve',
]);
export const mountGroupSchema = z.enum(['powertrain', 'chassis', 'axle']);
/**
 * What a port does, which fixes the way fluid flows through it: `out` (outlet), `feed` (a supply
 * port feeding another unit) and `drain` send fluid out; `in` (inlet) and `return` (fluid coming back
 * to its own unit) take it in; `vent` breathes air. Bulkhead plates pass fluid either way.
 */
export const portRoleSchema = z.enum(['out', 'in', 'return', 'feed', 'drain', 'vent']);
export const heatZoneKindSchema = z.enum(['exhaust', 'turbo', 'other']);

/** The catalogue's requirement (what the part must carry) plus why the port asks for it, shown in the flag. */
export const portRequirementSchema = partRequirementSchema.extend({
  reason: z.string().trim().min(1),
});

export const portSchema = z.object({
  id,
  label,
  connection: connectionSpecSchema,
  role: portRoleSchema,
  /** Offset from the unit's position, in sketch pixels, before the unit's rotation. */
  dx: coordinate,
  dy: coordinate,
  requirement: portRequirementSchema.optional(),
  /** True where fluid leaving through this port goes on to lubricate a gear train or bearings. */
  feedsLubrication: z.boolean().optional(),
  /** A plug closing an unused port. */
  plugPartId: id.nullable().optional(),
  /** Usable full thread depth from the port face: a fitting reaching further bottoms out. */
  threadDepthIn: inches.positive().optional(),
  /** Depth from the port face at which an internal passage crosses the bore: a fitting reaching it blocks the passage. */
  passageDepthIn: inches.positive().optional(),
  /** Least reach the port needs (e.g. a long-nose fitting reaching into the passage that feeds lubrication). */
  minReachIn: inches.positive().optional(),
});

export const unitSchema = z.object({
  id,
  kind: unitKindSchema,
  label,
  x: coordinate,
  y: coordinate,
  /** Degrees, clockwise on the sketch. */
  rotation: z.number().finite().default(0),
  mountGroup: mountGroupSchema,
  /** What kind of valve this unit is, e.g. 'thermostatic-bypass'; set only on valves. */
  valveKind: z.string().trim().min(1).optional(),
  ports: z.array(portSchema).max(L.portsPerUnit),
});

export const portRefSchema = z.object({ unitId: id, portId: id });

export const routePointSchema = z.object({
  x: coordinate,
  y: coordinate,
  /** Bend radius at this corner in inches; 0 is a sharp corner. */
  bendRadiusIn: inches,
});

export const supportSchema = z.object({ id, atIn: inches });

export const sleeveSchema = z
  .object({
    id,
    startIn: inches,
    endIn: inches,
    partId: id.nullable(),
  })
  .refine((s) => s.endIn > s.startIn, { message: 'A sleeve must end after it starts', path: ['endIn'] });

export const lineSchema = z.object({
  id,
  from: portRefSchema,
  to: portRefSchema,
  hosePartId: id.nullable(),
  /** Corner points only; the two ends are the port positions. */
  points: z.array(routePointSchema).max(L.cornersPerLine),
  /** Length measured along the real path; overrides the drawn length. */
  measuredLengthIn: inches.positive().nullable().optional(),
  /** Slack the fabricator chose for this line; overrides the shop's slack when set. */
  slackOverrideIn: inches.nullable().optional(),
  /** Ordered part ids from the port outward: adapters …, then the hose end last. */
  endStacks: z.object({ from: z.array(id).max(L.partsPerEndStack), to: z.array(id).max(L.partsPerEndStack) }),
  supports: z.array(supportSchema).max(L.supportsPerLine).default([]),
  sleeves: z.array(sleeveSchema).max(L.sleevesPerLine).default([]),
});

export const heatZoneSchema = z.object({
  id,
  label,
  kind: heatZoneKindSchema,
  polygon: z.array(sketchPointSchema).min(3, 'A heat zone needs at least 3 points').max(L.zonePoints),
  /** Inches; when absent the shop's clearance for the zone kind applies. */
  clearanceIn: inches.optional(),
  /** A heat shield stands between this hot part and the lines: contact becomes a caution for the reviewer. */
  shielded: z.boolean().optional(),
});

export const calibrationSchema = z
  .object({ a: sketchPointSchema, b: sketchPointSchema, knownIn: inches.positive() })
  .refine((c) => c.a.x !== c.b.x || c.a.y !== c.b.y, {
    message: 'The two calibration points must differ',
    path: ['b'],
  })
  .refine(
    (c) => {
      const px = Math.hypot(c.b.x - c.a.x, c.b.y - c.a.y);
      if (px === 0) return true; // reported above
      return px / c.knownIn >= L.minPxPerIn && px / c.knownIn <= L.maxPxPerIn;
    },
    { message: `The scale must lie between ${L.minPxPerIn} and ${L.maxPxPerIn} px per inch: check the known distance`, path: ['knownIn'] },
  );

export const backgroundSchema = z.object({
  uploadId: id,
  opacity: z.number().min(0).max(1),
  locked: z.boolean(),
});

export const circuitSettingsSchema = z.object({
  fluid: fluidSchema,
  maxPressurePsi: z.number().finite().nonnegative(),
  maxTempF: z.number().finite(),
});

const circuitDocumentShape = z.object({
  schema: z.literal(CIRCUIT_SCHEMA),
  circuit: circuitSettingsSchema,
  calibration: calibrationSchema.nullable(),
  background: backgroundSchema.nullable(),
  units: z.array(unitSchema).max(L.units),
  lines: z.array(lineSchema).max(L.lines),
  heatZones: z.array(heatZoneSchema).max(L.heatZones),
});

/** One circuit revision as saved (DOMAIN §3). Positions in sketch pixels. */
export const circuitDocumentSchema = circuitDocumentShape.superRefine((doc, ctx) => {
  const issue = (path: PropertyKey[], message: string) => ctx.addIssue({ code: 'custom', path, message });
  const portsByUnit = new Map<string, Set<string>>();
  const unitIds = new Set<string>();
  doc.units.forEach((unit, u) => {
    if (unitIds.has(unit.id)) {
      issue(['units', u, 'id'], `Unit id "${unit.id}" is used twice`);
      return; // lines resolve against the first unit of that id
    }
    unitIds.add(unit.id);
    const portIds = new Set<string>();
    unit.ports.forEach((port, p) => {
      if (portIds.has(port.id)) issue(['units', u, 'ports', p, 'id'], `Port id "${port.id}" is used twice on unit "${unit.id}"`);
      portIds.add(port.id);
    });
    portsByUnit.set(unit.id, portIds);
  });
  const lineIds = new Set<string>();
  const usedPorts = new Map<string, string>();
  doc.lines.forEach((line, l) => {
    if (lineIds.has(line.id)) issue(['lines', l, 'id'], `Line id "${line.id}" is used twice`);
    lineIds.add(line.id);
    for (const end of ['from', 'to'] as const) {
      const ref = line[end];
      const ports = portsByUnit.get(ref.unitId);
      if (!ports) {
        issue(['lines', l, end, 'unitId'], `Line "${line.id}" ${end} unit "${ref.unitId}" does not exist`);
        continue;
      }
      if (!ports.has(ref.portId)) {
        issue(['lines', l, end, 'portId'], `Line "${line.id}" ${end} port "${ref.portId}" is not on unit "${ref.unitId}"`);
        continue;
      }
      const key = `${ref.unitId}/${ref.portId}`;
      const other = usedPorts.get(key);
      if (other !== undefined) issue(['lines', l, end], `Port "${key}" already takes line "${other}"`);
      else usedPorts.set(key, line.id);
    }
    uniqueIds(line.supports, (s, i) => issue(['lines', l, 'supports', i, 'id'], `Support id "${s}" is used twice on line "${line.id}"`));
    uniqueIds(line.sleeves, (s, i) => issue(['lines', l, 'sleeves', i, 'id'], `Sleeve id "${s}" is used twice on line "${line.id}"`));
  });
  uniqueIds(doc.heatZones, (z, i) => issue(['heatZones', i, 'id'], `Heat zone id "${z}" is used twice`));
});

function uniqueIds(items: ReadonlyArray<{ id: string }>, onRepeat: (id: string, index: number) => void): void {
  const seen = new Set<string>();
  items.forEach((item, i) => {
    if (seen.has(item.id)) onRepeat(item.id, i);
    seen.add(item.id);
  });
}

export type CircuitDocument = z.infer<typeof circuitDocumentSchema>;
export type CircuitDocumentInput = z.input<typeof circuitDocumentSchema>;
export type CircuitSettings = z.infer<typeof circuitSettingsSchema>;
export type CircuitUnit = z.infer<typeof unitSchema>;
export type CircuitPort = z.infer<typeof portSchema>;
export type PortRef = z.infer<typeof portRefSchema>;
export type CircuitLine = z.infer<typeof lineSchema>;
export type RoutePoint = z.infer<typeof routePointSchema>;
export type LineSupport = z.infer<typeof supportSchema>;
export type LineSleeve = z.infer<typeof sleeveSchema>;
export type HeatZone = z.infer<typeof heatZoneSchema>;
export type HeatZoneKind = z.infer<typeof heatZoneKindSchema>;
export type MountGroup = z.infer<typeof mountGroupSchema>;
export type UnitKind = z.infer<typeof unitKindSchema>;
export type PortRole = z.infer<typeof portRoleSchema>;
export type SketchCalibration = z.infer<typeof calibrationSchema>;
export type SketchBackground = z.infer<typeof backgroundSchema>;
