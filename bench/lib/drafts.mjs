// Circuit drafts for the benchmarks and the soak, built from the shop's seeded catalogue as the
// API lists it (so part ids are the database's). Documents follow `linesmith.circuit/1`.

const SCHEMA = 'linesmith.circuit/1';

function pick(parts, what, test) {
  const found = parts.find(test);
  if (!found) throw new Error(`The catalogue has no ${what}: is the demo catalogue seeded?`);
  return found;
}

const connects = (end, family, size) => end.family === family && end.size === size;

/** The -6 hose, hose ends and adapters a transmission cooler circuit (ATF, 150 psi, 250 °F) needs. */
export function coolerParts(parts) {
  const hose = pick(parts, 'a -6 hose for ATF', (p) => p.kind === 'hose' && p.attributes.dash === 6 && p.attributes.fluids.includes('atf') && p.attributes.maxTempF >= 250);
  const end = (angle) =>
    pick(parts, `a -6 ${angle}° hose end`, (p) => p.kind === 'hose-end' && p.attributes.hoseDash === 6 && p.attributes.angle === angle && p.attributes.hoseTypes.includes(hose.attributes.hoseType));
  const adapter = (what, family, size, test = () => true) =>
    pick(parts, what, (p) => p.kind === 'adapter' && connects(p.attributes.a, family, size) && connects(p.attributes.b, 'flare37', '-6') && test(p));
  const sleeve = pick(parts, 'a fire sleeve for the hose', (p) => p.kind === 'sleeve' && p.attributes.fitsOd.minIn <= hose.attributes.odIn && hose.attributes.odIn <= p.attributes.fitsOd.maxIn);
  return {
    hose: hose.id,
    endStraight: end(0).id,
    end90: end(90).id,
    nptAdapter: adapter('a 1/4 NPT to -6 37° adapter', 'npt', '1/4').id,
    longNose: adapter('a long-nose -6 O-ring boss adapter', 'orb', '-6', (p) => p.attributes.features.includes('long-nose')).id,
    invertedFlare: adapter('a 3/8 inverted flare to -6 37° adapter', 'invflare45', '3/8').id,
    sleeve: sleeve.id,
  };
}

const flare6Male = { family: 'flare37', size: '-6', gender: 'male' };
const corner = (x, y, bendRadiusIn = 4) => ({ x, y, bendRadiusIn });

/**
 * The demo transmission-cooler circuit drawn out: transmission → bulkhead → front cooler and back,
 * four lines with two corners each, end stacks from the solver's kind of choices (the return port
 * takes the long-nose fitting), supports about every 14 in, an exhaust heat zone and a fire sleeve.
 * Scale: 5 sketch px per inch. `seeded` is the circuit's seeded draft (its units are kept).
 */
export function coolerDraft(seeded, parts, label = '') {
  const p = coolerParts(parts);
  const units = seeded.units.map((unit) => (unit.kind === 'transmission' && label ? { ...unit, label } : unit));
  const line = (id, from, to, points, fromStack, toStack, extra = {}) => ({
    id,
    from,
    to,
    hosePartId: p.hose,
    points,
    endStacks: { from: fromStack, to: toStack },
    supports: [{ id: `${id}-s1`, atIn: 14 }, { id: `${id}-s2`, atIn: 28 }],
    sleeves: [],
    ...extra,
  });
  return {
    schema: SCHEMA,
    circuit: seeded.circuit,
    calibration: { a: { x: 100, y: 600 }, b: { x: 350, y: 600 }, knownIn: 50 },
    background: null,
    units: [
      ...units,
      {
        id: 'bulkhead',
        kind: 'bulkhead-plate',
        label: 'Bulkhead plate, core support',
        x: 520,
        y: 300,
        rotation: 0,
        mountGroup: 'chassis',
        ports: [
          { id: 'a-in', label: 'Feed in', connection: flare6Male, role: 'feed', dx: -40, dy: -10 },
          { id: 'a-out', label: 'Feed out', connection: flare6Male, role: 'out', dx: 40, dy: -10 },
          { id: 'b-in', label: 'Return in', connection: flare6Male, role: 'feed', dx: 40, dy: 10 },
          { id: 'b-out', label: 'Return out', connection: flare6Male, role: 'out', dx: -40, dy: 10 },
        ],
      },
    ],
    lines: [
      line('feed-1', { unitId: 'transmission', portId: 'cooler-out' }, { unitId: 'bulkhead', portId: 'a-in' },
        [corner(430, 396), corner(430, 290)], [p.nptAdapter, p.endStraight], [p.end90]),
      line('feed-2', { unitId: 'bulkhead', portId: 'a-out' }, { unitId: 'cooler', portId: 'in' },
        [corner(600, 250), corner(560, 140)], [p.endStraight], [p.invertedFlare, p.endStraight]),
      line('return-1', { unitId: 'cooler', portId: 'out' }, { unitId: 'bulkhead', portId: 'b-in' },
        [corner(520, 180), corner(520, 240)], [p.invertedFlare, p.end90], [p.endStraight]),
      line('return-2', { unitId: 'bulkhead', portId: 'b-out' }, { unitId: 'transmission', portId: 'cooler-return' },
        [corner(420, 360), corner(420, 444)], [p.endStraight], [p.longNose, p.endStraight],
        { sleeves: [{ id: 'return-2-sleeve', startIn: 22, endIn: 40, partId: p.sleeve }] }),
    ],
    heatZones: [
      { id: 'exhaust', label: 'Passenger-side exhaust pipe', kind: 'exhaust', polygon: [{ x: 380, y: 470 }, { x: 460, y: 470 }, { x: 460, y: 520 }, { x: 380, y: 520 }] },
    ],
  };
}

/**
 * A large sketch for the editor: 100 units (3 ports each) on a 10 × 10 grid, 150 lines with three
 * corners, 200 supports and 50 sleeves — 500 items. Scale: 10 sketch px per inch.
 */
export function largeDraft(settings, parts) {
  const p = coolerParts(parts);
  const GRID = 10;
  const SPACING = 160;
  const units = Array.from({ length: GRID * GRID }, (_, u) => ({
    id: `u${u}`,
    kind: u % 2 ? 'cooler' : 'filter',
    label: `Unit ${u + 1}`,
    x: 100 + (u % GRID) * SPACING,
    y: 100 + Math.floor(u / GRID) * SPACING,
    rotation: 0,
    mountGroup: u % 3 ? 'chassis' : 'powertrain',
    ports: [
      { id: 'p0', label: 'In', connection: flare6Male, role: 'feed', dx: -30, dy: 0 },
      { id: 'p1', label: 'Out', connection: flare6Male, role: 'out', dx: 30, dy: -12 },
      { id: 'p2', label: 'Return', connection: flare6Male, role: 'return', dx: 30, dy: 12 },
    ],
  }));
  const portAt = (u, port) => {
    const unit = units[u];
    const found = unit.ports.find((candidate) => candidate.id === port);
    return { x: unit.x + found.dx, y: unit.y + found.dy };
  };
  const wiggle = (a, b, i) => [0.25, 0.5, 0.75].map((f, k) => corner(a.x + (b.x - a.x) * f + (k === 1 ? 0 : 20 * ((i + k) % 2 ? 1 : -1)), a.y + (b.y - a.y) * f + (k === 1 ? 25 : 0), 2.5));
  const lines = [];
  for (let i = 0; i < 100; i += 1) {
    const [a, b] = [i, (i + 1) % 100];
    lines.push({
      id: `L${i}`,
      from: { unitId: `u${a}`, portId: 'p1' },
      to: { unitId: `u${b}`, portId: 'p0' },
      hosePartId: p.hose,
      points: wiggle(portAt(a, 'p1'), portAt(b, 'p0'), i),
      endStacks: { from: [p.endStraight], to: [p.endStraight] },
      supports: [{ id: 's1', atIn: 5 }, { id: 's2', atIn: 10 }],
      sleeves: [],
    });
  }
  for (let j = 0; j < 50; j += 1) {
    const [a, b] = [2 * j, 2 * j + 1];
    lines.push({
      id: `R${j}`,
      from: { unitId: `u${a}`, portId: 'p2' },
      to: { unitId: `u${b}`, portId: 'p2' },
      hosePartId: p.hose,
      points: wiggle(portAt(a, 'p2'), portAt(b, 'p2'), j),
      endStacks: { from: [p.end90], to: [p.end90] },
      supports: [],
      sleeves: [{ id: 'v1', startIn: 2, endIn: 6, partId: p.sleeve }],
    });
  }
  return {
    schema: SCHEMA,
    circuit: settings,
    calibration: { a: { x: 100, y: 1800 }, b: { x: 300, y: 1800 }, knownIn: 20 },
    background: null,
    units,
    lines,
    heatZones: [],
  };
}

/** Items a fabricator can select: units, lines, supports, sleeves and heat zones. */
export function itemCount(doc) {
  return doc.units.length + doc.lines.length + doc.heatZones.length + doc.lines.reduce((n, l) => n + l.supports.length + l.sleeves.length, 0);
}
