import { CIRCUIT_SCHEMA, circuitDocumentSchema, type CircuitDocument } from '@linesmith/routing';

/**
 * A small transmission-cooler sketch: a transmission (powertrain) whose return port feeds the gear
 * train's lubrication and needs a long-nose fitting, and a cooler (chassis), joined by one line with
 * one corner. Calibrated at 10 px per inch.
 */
export function coolerSketch(): CircuitDocument {
  return circuitDocumentSchema.parse({
    schema: CIRCUIT_SCHEMA,
    circuit: { fluid: 'atf', maxPressurePsi: 150, maxTempF: 250 },
    calibration: { a: { x: 0, y: 0 }, b: { x: 100, y: 0 }, knownIn: 10 },
    background: null,
    units: [
      {
        id: 'trans',
        kind: 'transmission',
        label: 'Transmission',
        x: 100,
        y: 100,
        rotation: 0,
        mountGroup: 'powertrain',
        ports: [
          { id: 'out', label: 'Cooler out', role: 'out', connection: { family: 'orb', size: '-6', gender: 'female' }, dx: 80, dy: -20 },
          {
            id: 'ret',
            label: 'Cooler return',
            role: 'return',
            connection: { family: 'orb', size: '-6', gender: 'female' },
            dx: 80,
            dy: 20,
            feedsLubrication: true,
            requirement: { feature: 'long-nose', reason: 'this port feeds the gear train lubrication' },
          },
        ],
      },
      {
        id: 'cooler',
        kind: 'cooler',
        label: 'Cooler',
        x: 500,
        y: 300,
        rotation: 0,
        mountGroup: 'chassis',
        ports: [
          { id: 'in', label: 'Inlet', role: 'feed', connection: { family: 'invflare45', size: '3/8', gender: 'female' }, dx: -70, dy: -25 },
          { id: 'outlet', label: 'Outlet', role: 'out', connection: { family: 'invflare45', size: '3/8', gender: 'female' }, dx: -70, dy: 25 },
        ],
      },
    ],
    lines: [
      {
        id: 'return-line',
        from: { unitId: 'trans', portId: 'ret' },
        to: { unitId: 'cooler', portId: 'outlet' },
        hosePartId: 'demo-hose-6-rubber',
        points: [{ x: 430, y: 120, bendRadiusIn: 3 }],
        endStacks: { from: ['demo-adapter-orb6-f37-6', 'demo-hose-end-6-rubber-0'], to: ['demo-adapter-invf6-f37-6', 'demo-hose-end-6-rubber-0'] },
      },
    ],
    heatZones: [],
  });
}
