import { partSchema, type Part } from '@linesmith/catalog';
import { circuitDocumentSchema, type CircuitDocument, type CircuitDocumentInput } from '../circuit/document.schema.js';

/** Small invented catalogue for tests; built through the catalogue's own schema. */
export const part = (raw: unknown): Part => partSchema.parse(raw);

export const hose6 = part({
  id: 'hose-6',
  kind: 'hose',
  description: '-6 braided rubber hose',
  priceCents: 900,
  saleUnit: { type: 'foot' },
  attributes: {
    dash: 6,
    hoseType: 'braided-rubber',
    idIn: 0.34,
    odIn: 0.69,
    liner: 'rubber',
    maxPressurePsi: 350,
    maxTempF: 300,
    minBendRadiusIn: 2,
    fluids: ['atf', 'engine-oil', 'power-steering'],
  },
});

export const hoseEnd6 = part({
  id: 'end-6-straight',
  kind: 'hose-end',
  description: '-6 straight hose end, 37° female swivel',
  priceCents: 1200,
  attributes: {
    hoseDash: 6,
    hoseTypes: ['braided-rubber'],
    port: { family: 'flare37', size: '-6', gender: 'female' },
    angle: 0,
    allowanceIn: 0.75,
    boreIn: 0.3,
    maxPressurePsi: 1000,
  },
});

export const orbToFlare6 = part({
  id: 'adp-orb6-fl6',
  kind: 'adapter',
  description: '-6 O-ring boss to -6 37° flare, short',
  priceCents: 450,
  attributes: {
    a: { family: 'orb', size: '-6', gender: 'male' },
    b: { family: 'flare37', size: '-6', gender: 'male' },
    angle: 0,
    bodyLengthIn: 0.5,
    boreIn: 0.3,
    features: [],
    seal: { type: 'o-ring', as568: '906' },
    maxPressurePsi: 3000,
  },
});

export const orbToFlare6LongNose = part({
  id: 'adp-orb6-fl6-ln',
  kind: 'adapter',
  description: '-6 O-ring boss to -6 37° flare, long nose',
  priceCents: 700,
  attributes: {
    a: { family: 'orb', size: '-6', gender: 'male' },
    b: { family: 'flare37', size: '-6', gender: 'male' },
    angle: 0,
    bodyLengthIn: 1.25,
    boreIn: 0.3,
    features: ['long-nose'],
    seal: { type: 'o-ring', as568: '906' },
    maxPressurePsi: 3000,
  },
});

export const clamp11_16 = part({
  id: 'clamp-11-16',
  kind: 'clamp',
  description: 'Cushion clamp 11/16',
  priceCents: 600,
  saleUnit: { type: 'pack', size: 10 },
  attributes: { fitsOd: { minIn: 0.62, maxIn: 0.75 } },
});

export const fireSleeve = part({
  id: 'sleeve-3-4',
  kind: 'sleeve',
  description: 'Fire sleeve 3/4',
  priceCents: 1500,
  saleUnit: { type: 'foot' },
  attributes: { fitsOd: { minIn: 0.5, maxIn: 0.8 }, maxTempF: 500 },
});

export const oring906 = part({
  id: 'oring-906',
  kind: 'seal',
  description: 'O-ring AS568-906',
  priceCents: 2000,
  saleUnit: { type: 'pack', size: 25 },
  attributes: { seal: { type: 'o-ring', as568: '906' }, compound: 'nitrile', hardnessShoreA: 90 },
});

export const orbPlug6 = part({
  id: 'plug-orb6',
  kind: 'plug',
  description: '-6 O-ring boss plug',
  priceCents: 300,
  attributes: { connection: { family: 'orb', size: '-6', gender: 'male' }, maxPressurePsi: 3000 },
});

export const testParts: Part[] = [hose6, hoseEnd6, orbToFlare6, orbToFlare6LongNose, clamp11_16, fireSleeve, oring906, orbPlug6];

/** 10 sketch pixels to the inch. */
export const calibration = { a: { x: 0, y: 0 }, b: { x: 100, y: 0 }, knownIn: 10 };

/**
 * A transmission cooler circuit: transmission (powertrain) out → cooler in, cooler out →
 * transmission return; the return feeds the gear train's lubrication and needs the long-nose fitting.
 * Both lines run 30 in straight at 10 px/in.
 */
export function coolerCircuitInput(): CircuitDocumentInput {
  return {
    schema: 'linesmith.circuit/1',
    circuit: { fluid: 'atf', maxPressurePsi: 150, maxTempF: 250 },
    calibration,
    background: null,
    units: [
      {
        id: 'trans',
        kind: 'transmission',
        label: 'Transmission',
        x: 0,
        y: 0,
        rotation: 0,
        mountGroup: 'powertrain',
        ports: [
          { id: 'out', label: 'cooler out', connection: { family: 'orb', size: '-6', gender: 'female' }, role: 'out', dx: 0, dy: 0 },
          {
            id: 'ret',
            label: 'cooler return',
            connection: { family: 'orb', size: '-6', gender: 'female' },
            role: 'return',
            dx: 0,
            dy: 200,
            requirement: { feature: 'long-nose', reason: 'this return also feeds the gear train lubrication' },
            feedsLubrication: true,
          },
        ],
      },
      {
        id: 'cooler',
        kind: 'cooler',
        label: 'Cooler',
        x: 300,
        y: 0,
        rotation: 0,
        mountGroup: 'chassis',
        ports: [
          { id: 'in', label: 'in', connection: { family: 'flare37', size: '-6', gender: 'male' }, role: 'in', dx: 0, dy: 0 },
          { id: 'out', label: 'out', connection: { family: 'flare37', size: '-6', gender: 'male' }, role: 'out', dx: 0, dy: 200 },
        ],
      },
    ],
    lines: [
      {
        id: 'L1',
        from: { unitId: 'trans', portId: 'out' },
        to: { unitId: 'cooler', portId: 'in' },
        hosePartId: 'hose-6',
        points: [],
        endStacks: { from: ['adp-orb6-fl6', 'end-6-straight'], to: ['end-6-straight'] },
        supports: [{ id: 's1', atIn: 15 }],
        sleeves: [],
      },
      {
        id: 'L2',
        from: { unitId: 'cooler', portId: 'out' },
        to: { unitId: 'trans', portId: 'ret' },
        hosePartId: 'hose-6',
        points: [],
        endStacks: { from: ['end-6-straight'], to: ['adp-orb6-fl6-ln', 'end-6-straight'] },
        supports: [{ id: 's1', atIn: 15 }],
        sleeves: [],
      },
    ],
    heatZones: [],
  };
}

export const coolerCircuit = (edit?: (doc: CircuitDocumentInput) => void): CircuitDocument => {
  const input = coolerCircuitInput();
  edit?.(input);
  return circuitDocumentSchema.parse(input);
};
