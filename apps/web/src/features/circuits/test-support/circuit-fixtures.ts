import type { CircuitDocumentInput } from '@linesmith/routing';
import type { CircuitCheck, LineReportView } from '../api/check-schema';
import type { Circuit } from '../api/circuit-schema';

/** A circuit as the API sends it (API contract, `Circuit`). */
export function apiCircuit(id: string, extra: Partial<Circuit> = {}): Circuit {
  return {
    id,
    buildId: 'b-1',
    name: 'Transmission cooler',
    kind: 'transmission-cooler',
    fluid: 'atf',
    maxPressurePsi: 150,
    maxTempF: 250,
    status: 'draft',
    draftVersion: 3,
    createdAt: '2026-01-05T09:00:00.000Z',
    updatedAt: '2026-01-06T09:00:00.000Z',
    ...extra,
  };
}

/** A transmission and a cooler joined by one line: adapter + hose end at one end, a hose end at the other. */
export const coolerDraft: CircuitDocumentInput = {
  schema: 'linesmith.circuit/1',
  circuit: { fluid: 'atf', maxPressurePsi: 150, maxTempF: 250 },
  calibration: { a: { x: 0, y: 0 }, b: { x: 100, y: 0 }, knownIn: 10 },
  background: null,
  units: [
    {
      id: 'trans',
      kind: 'transmission',
      label: 'Transmission',
      x: 0,
      y: 0,
      mountGroup: 'powertrain',
      ports: [
        { id: 'out', label: 'cooler out', connection: { family: 'orb', size: '-6', gender: 'female' }, role: 'out', dx: 0, dy: 0 },
        { id: 'ret', label: 'cooler return', connection: { family: 'orb', size: '-6', gender: 'female' }, role: 'return', dx: 0, dy: 20 },
      ],
    },
    {
      id: 'cooler',
      kind: 'cooler',
      label: 'Cooler',
      x: 200,
      y: 0,
      mountGroup: 'chassis',
      ports: [{ id: 'in', label: 'inlet', connection: { family: 'invflare45', size: '5/8', gender: 'female' }, role: 'feed', dx: 0, dy: 0 }],
    },
  ],
  lines: [
    {
      id: 'line-1',
      from: { unitId: 'trans', portId: 'out' },
      to: { unitId: 'cooler', portId: 'in' },
      hosePartId: 'hose-6',
      points: [],
      endStacks: { from: ['adapter-orb6', 'end-6-straight'], to: ['end-6-90'] },
      supports: [],
      sleeves: [],
    },
  ],
  heatZones: [],
};

/** One line report with the cut length given; the other terms are consistent but not under test. */
export function lineReport(lineId: string, cutLengthIn: number | null, extra: Partial<LineReportView> = {}): LineReportView {
  return {
    lineId,
    hosePartId: 'hose-6',
    drawnLengthIn: 20,
    measuredLengthIn: null,
    centrelineIn: 20,
    basis: 'drawn',
    endStackFromIn: 1.5,
    endStackToIn: 1,
    crossesMounts: true,
    slackIn: 1.5,
    requiredSlackIn: 1.5,
    slackRule: 'cross-mount-minimum',
    exactCutIn: cutLengthIn,
    cutLengthIn,
    toleranceIn: 0.1875,
    fits: true,
    supports: { atIn: [{ id: 's-1', atIn: 9 }], longestSpanIn: 11, proposedAtIn: [] },
    sleeves: { requiredIn: [], plannedIn: [], plannedLengthIn: 0, uncoveredIn: [], placed: [], contact: false },
    ...extra,
  };
}

export function checkResult(lines: LineReportView[]): CircuitCheck {
  return {
    lines,
    flags: [
      { code: 'support-gap', severity: 'caution', message: 'An unsupported span is longer than 18 in.', target: { kind: 'line', id: 'line-1' }, fix: 'Add a clamp.' },
    ],
    bom: {
      rows: [
        { partId: 'hose-6', kind: 'hose', description: '-6 braided rubber hose', quantity: 41, unit: 'in', priceCents: 2100, supplierId: 's-1', supplierPartNumber: 'TW-H6', lineIds: ['line-1'], cuts: 2 },
        { partId: 'adapter-orb6', kind: 'adapter', description: '-6 O-ring boss male to -6 37° flare male', quantity: 1, unit: 'each', priceCents: 645, supplierId: 's-1', supplierPartNumber: 'TW-A6', lineIds: ['line-1'] },
        { partId: 'end-6-straight', kind: 'hose-end', description: '-6 straight hose end', quantity: 1, unit: 'each', priceCents: 900, supplierId: 's-1', supplierPartNumber: 'TW-E6', lineIds: ['line-1'] },
        { partId: 'end-6-90', kind: 'hose-end', description: '-6 90° hose end', quantity: 1, unit: 'each', priceCents: 1200, supplierId: 's-1', supplierPartNumber: 'TW-E690', lineIds: ['line-1'] },
      ],
      subtotalCents: 4845,
      taxCents: 0,
      totalCents: 4845,
      unpricedRows: 0,
    },
  };
}
