import type { ConnectionSpec, Family } from '@linesmith/catalog';
import type { MountGroup, PortRole, UnitKind } from '@linesmith/routing';

export interface PortPreset {
  label: string;
  role: PortRole;
  connection: ConnectionSpec;
  dx: number;
  dy: number;
}

export interface UnitPreset {
  kind: UnitKind;
  label: string;
  /** Drawn size in sketch pixels (units are boxes; ports sit on their edges). */
  width: number;
  height: number;
  mountGroup: MountGroup;
  valveKind?: string;
  ports: PortPreset[];
}

const female = (family: Family, size: string): ConnectionSpec => ({ family, size, gender: 'female' });
const male = (family: Family, size: string): ConnectionSpec => ({ family, size, gender: 'male' });

/**
 * Starting points for the palette. Ports are the usual ones for each kind of unit in the shop's
 * work (common practice); the fabricator corrects them in the inspector to match the real part.
 */
export const unitPresets: Readonly<Record<UnitKind, UnitPreset>> = {
  transmission: {
    kind: 'transmission',
    label: 'Transmission',
    width: 160,
    height: 90,
    mountGroup: 'powertrain',
    ports: [
      { label: 'Cooler out', role: 'out', connection: female('orb', '-6'), dx: 80, dy: -20 },
      { label: 'Cooler return', role: 'return', connection: female('orb', '-6'), dx: 80, dy: 20 },
    ],
  },
  cooler: {
    kind: 'cooler',
    label: 'Cooler',
    width: 140,
    height: 80,
    mountGroup: 'chassis',
    ports: [
      { label: 'Inlet', role: 'in', connection: female('invflare45', '3/8'), dx: -70, dy: -25 },
      { label: 'Outlet', role: 'out', connection: female('invflare45', '3/8'), dx: -70, dy: 25 },
    ],
  },
  engine: {
    kind: 'engine',
    label: 'Engine',
    width: 180,
    height: 120,
    mountGroup: 'powertrain',
    ports: [
      { label: 'Oil cooler out', role: 'out', connection: female('metric', 'M22x1.5'), dx: 90, dy: -30 },
      { label: 'Oil cooler return', role: 'return', connection: female('metric', 'M22x1.5'), dx: 90, dy: 30 },
    ],
  },
  pump: {
    kind: 'pump',
    label: 'Pump',
    width: 80,
    height: 50,
    mountGroup: 'chassis',
    ports: [
      { label: 'Inlet', role: 'in', connection: female('orb', '-8'), dx: -40, dy: 0 },
      { label: 'Outlet', role: 'out', connection: female('orb', '-6'), dx: 40, dy: 0 },
    ],
  },
  filter: {
    kind: 'filter',
    label: 'Filter',
    width: 60,
    height: 60,
    mountGroup: 'chassis',
    ports: [
      { label: 'In', role: 'in', connection: female('orb', '-8'), dx: -30, dy: 0 },
      { label: 'Out', role: 'out', connection: female('orb', '-8'), dx: 30, dy: 0 },
    ],
  },
  tank: {
    kind: 'tank',
    label: 'Tank',
    width: 160,
    height: 100,
    mountGroup: 'chassis',
    ports: [
      { label: 'Pickup', role: 'out', connection: female('npt', '3/8'), dx: 80, dy: -25 },
      { label: 'Return', role: 'return', connection: female('npt', '3/8'), dx: 80, dy: 25 },
    ],
  },
  rail: {
    kind: 'rail',
    label: 'Fuel rail',
    width: 200,
    height: 30,
    mountGroup: 'powertrain',
    ports: [
      { label: 'In', role: 'in', connection: female('orb', '-6'), dx: -100, dy: 0 },
      { label: 'Out', role: 'out', connection: female('orb', '-6'), dx: 100, dy: 0 },
    ],
  },
  regulator: {
    kind: 'regulator',
    label: 'Regulator',
    width: 70,
    height: 70,
    mountGroup: 'chassis',
    ports: [
      { label: 'In', role: 'in', connection: female('orb', '-6'), dx: -35, dy: 0 },
      { label: 'Out', role: 'out', connection: female('orb', '-6'), dx: 35, dy: 0 },
      { label: 'Return to tank', role: 'out', connection: female('orb', '-6'), dx: 0, dy: 35 },
    ],
  },
  'bulkhead-plate': {
    kind: 'bulkhead-plate',
    label: 'Bulkhead plate',
    width: 30,
    height: 80,
    mountGroup: 'chassis',
    ports: [
      { label: 'Side A', role: 'feed', connection: male('flare37', '-6'), dx: -15, dy: 0 },
      { label: 'Side B', role: 'out', connection: male('flare37', '-6'), dx: 15, dy: 0 },
    ],
  },
  valve: {
    kind: 'valve',
    label: 'Valve',
    width: 60,
    height: 40,
    mountGroup: 'chassis',
    valveKind: 'thermostatic-bypass',
    ports: [
      { label: 'In', role: 'in', connection: female('orb', '-6'), dx: -30, dy: 0 },
      { label: 'Out', role: 'out', connection: female('orb', '-6'), dx: 30, dy: 0 },
    ],
  },
};

/** The drawn size of a unit of this kind. */
export const unitSize = (kind: UnitKind) => ({ width: unitPresets[kind].width, height: unitPresets[kind].height });
