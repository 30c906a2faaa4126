import type { ConnectionSpec } from '@linesmith/catalog';
import { circuitKinds, CIRCUIT_SCHEMA, type CircuitDocumentInput, type CircuitKind } from '@linesmith/routing';

/** The invented demo job of PRODUCT.md ("Demo scenario"); the 555-01xx number is reserved for fiction. */
export const DEMO_BUILD = {
  vehicleYear: '1974',
  vehicleMake: 'Redfern',
  vehicleModel: 'Half-ton pickup, long bed',
  vehicleEngine: 'Late-model 6.2 L V8, fuel injected',
  vehicleTransmission: 'Four-speed automatic, electronically controlled',
  customerName: 'Wendell Abernathy',
  customerPhone: '555-0142',
  customerEmail: 'wendell.abernathy@mailbox.example',
  notes:
    'Engine and transmission swap. Front-mount transmission cooler, remote engine-oil cooler, ' +
    'return-style fuel system with an in-tank pump. Customer wants fire sleeve on every line near the headers.',
  status: 'open' as const,
};

const spec = (family: ConnectionSpec['family'], size: string, gender: ConnectionSpec['gender']): ConnectionSpec => ({
  family,
  size,
  gender,
});

function documentOf(kind: CircuitKind, units: CircuitDocumentInput['units']): CircuitDocumentInput {
  const { fluid, maxPressurePsi, maxTempF } = circuitKinds[kind];
  return {
    schema: CIRCUIT_SCHEMA,
    circuit: { fluid, maxPressurePsi, maxTempF },
    calibration: null,
    // No photo ships with the demo: the background stays empty until one is uploaded.
    background: null,
    units,
    lines: [],
    heatZones: [],
  };
}

export interface DemoCircuit {
  name: string;
  kind: CircuitKind;
  document: CircuitDocumentInput;
}

/** Starter sketches: units and their ports placed, lines still to draw. */
export const DEMO_CIRCUITS: DemoCircuit[] = [
  {
    name: 'Transmission cooler',
    kind: 'transmission-cooler',
    document: documentOf('transmission-cooler', [
      {
        id: 'transmission',
        kind: 'transmission',
        label: 'Four-speed automatic',
        x: 320,
        y: 420,
        mountGroup: 'powertrain',
        ports: [
          { id: 'cooler-out', label: 'To cooler', connection: spec('npt', '1/4', 'female'), role: 'out', dx: 48, dy: -24 },
          {
            id: 'cooler-return',
            label: 'From cooler (feeds gear-train lubrication)',
            connection: spec('orb', '-6', 'female'),
            role: 'return',
            dx: 48,
            dy: 24,
            feedsLubrication: true,
            // The lubrication passage starts 0.9 in behind the face: the long nose must reach it (invented figures).
            minReachIn: 0.9,
            threadDepthIn: 1.2,
            requirement: {
              feature: 'long-nose',
              reason:
                'Fluid returning through this port lubricates the gear train; only the long-nose fitting leaves the passage open.',
            },
          },
        ],
      },
      {
        id: 'cooler',
        kind: 'cooler',
        label: 'Transmission cooler, ahead of the radiator',
        x: 660,
        y: 160,
        mountGroup: 'chassis',
        ports: [
          { id: 'in', label: 'Inlet', connection: spec('invflare45', '3/8', 'female'), role: 'in', dx: -60, dy: -20 },
          { id: 'out', label: 'Outlet', connection: spec('invflare45', '3/8', 'female'), role: 'out', dx: -60, dy: 20 },
        ],
      },
    ]),
  },
  {
    name: 'Engine-oil cooler',
    kind: 'engine-oil-cooler',
    document: documentOf('engine-oil-cooler', [
      {
        id: 'engine',
        kind: 'engine',
        label: 'V8, oil filter adapter',
        x: 360,
        y: 360,
        mountGroup: 'powertrain',
        ports: [
          { id: 'to-cooler', label: 'To cooler', connection: spec('metric', 'M22x1.5', 'female'), role: 'out', dx: 60, dy: -16 },
          { id: 'from-cooler', label: 'From cooler', connection: spec('metric', 'M22x1.5', 'female'), role: 'return', dx: 60, dy: 16 },
        ],
      },
      {
        id: 'oil-cooler',
        kind: 'cooler',
        label: 'Engine-oil cooler, driver side',
        x: 700,
        y: 240,
        mountGroup: 'chassis',
        ports: [
          { id: 'in', label: 'Inlet', connection: spec('orb', '-10', 'female'), role: 'in', dx: -50, dy: -18 },
          { id: 'out', label: 'Outlet', connection: spec('orb', '-10', 'female'), role: 'out', dx: -50, dy: 18 },
        ],
      },
    ]),
  },
  {
    name: 'Fuel return system',
    kind: 'fuel',
    document: documentOf('fuel', [
      {
        id: 'tank',
        kind: 'tank',
        label: 'Fuel tank with in-tank pump',
        x: 120,
        y: 520,
        mountGroup: 'chassis',
        ports: [
          { id: 'pump-out', label: 'Pump outlet', connection: spec('orb', '-8', 'female'), role: 'out', dx: 40, dy: -30 },
          { id: 'return', label: 'Return', connection: spec('npt', '3/8', 'female'), role: 'return', dx: 40, dy: 30 },
        ],
      },
      {
        id: 'filter',
        kind: 'filter',
        label: 'Fuel filter, frame rail',
        x: 380,
        y: 500,
        mountGroup: 'chassis',
        ports: [
          { id: 'in', label: 'Inlet', connection: spec('orb', '-8', 'female'), role: 'in', dx: -30, dy: 0 },
          { id: 'out', label: 'Outlet', connection: spec('orb', '-8', 'female'), role: 'out', dx: 30, dy: 0 },
        ],
      },
      {
        id: 'rail',
        kind: 'rail',
        label: 'Fuel rail, driver side',
        x: 560,
        y: 300,
        mountGroup: 'powertrain',
        ports: [
          { id: 'in', label: 'Inlet', connection: spec('orb', '-8', 'female'), role: 'in', dx: -70, dy: 0 },
          { id: 'out', label: 'Outlet', connection: spec('orb', '-6', 'female'), role: 'out', dx: 70, dy: 0 },
        ],
      },
      {
        id: 'regulator',
        kind: 'regulator',
        label: 'Return-style regulator, firewall',
        x: 720,
        y: 260,
        mountGroup: 'chassis',
        ports: [
          { id: 'in', label: 'From rail', connection: spec('orb', '-6', 'female'), role: 'in', dx: -24, dy: 0 },
          { id: 'return', label: 'Return to tank', connection: spec('orb', '-6', 'female'), role: 'out', dx: 24, dy: 0 },
        ],
      },
    ]),
  },
];
