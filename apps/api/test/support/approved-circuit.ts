import type { CircuitDocumentInput } from '@linesmith/routing';
import { CircuitRevisionEntity } from '../../src/circuits/circuit-revision.entity.js';
import { CircuitEntity } from '../../src/circuits/circuit.entity.js';
import { createCircuit } from './builds.js';
import type { TestApp } from './test-app.js';

/**
 * A -6 cooler line, 30 in straight at 10 px/in, from a -6 O-ring boss port (powertrain) to a
 * 3/8 in inverted-flare port (chassis), with the given supports; `id` maps demo ids to database ids.
 */
export function coolerLineDocument(id: (demoId: string) => string, supportsAtIn: number[] = []): CircuitDocumentInput {
  return {
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
        ports: [{ id: 'out', label: 'cooler out', connection: { family: 'orb', size: '-6', gender: 'female' }, role: 'out', dx: 0, dy: 0 }],
      },
      {
        id: 'cooler',
        kind: 'cooler',
        label: 'Cooler',
        x: 300,
        y: 0,
        mountGroup: 'chassis',
        ports: [{ id: 'in', label: 'in', connection: { family: 'invflare45', size: '3/8', gender: 'female' }, role: 'feed', dx: 0, dy: 0 }],
      },
    ],
    lines: [
      {
        id: 'L1',
        from: { unitId: 'trans', portId: 'out' },
        to: { unitId: 'cooler', portId: 'in' },
        hosePartId: id('demo-hose-6-rubber'),
        points: [],
        endStacks: {
          from: [id('demo-adapter-orb6-f37-6'), id('demo-hose-end-6-rubber-0')],
          to: [id('demo-adapter-invf6-f37-6'), id('demo-hose-end-6-rubber-0')],
        },
        supports: supportsAtIn.map((atIn, index) => ({ id: `S${index + 1}`, atIn })),
      },
    ],
    heatZones: [],
  };
}

/**
 * A circuit with `document` saved as its draft and as revision 1, then signed off directly in the
 * database (revision locked and approved, circuit approved); the sign-off flow itself is tested
 * with the reviews.
 */
export async function approvedCircuit(testApp: TestApp, fabToken: string, buildId: string, name: string, document: CircuitDocumentInput) {
  const circuit = await createCircuit(testApp, fabToken, buildId, { name, kind: 'transmission-cooler' });
  const auth = { Authorization: `Bearer ${fabToken}` };
  await testApp.http().put(`/api/circuits/${circuit.id}/draft`).set(auth).set('If-Match', String(circuit.draftVersion)).send(document).expect(200);
  await testApp.http().post(`/api/circuits/${circuit.id}/revisions`).set(auth).send({ message: 'for review' }).expect(201);
  const now = new Date();
  await testApp.dataSource.getRepository(CircuitRevisionEntity).update({ circuitId: circuit.id, number: 1 }, { lockedAt: now, approvedAt: now });
  await testApp.dataSource.getRepository(CircuitEntity).update({ id: circuit.id }, { status: 'approved' });
  return circuit;
}
