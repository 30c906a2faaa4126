import type { ConnectionSpec, Family } from '../connections.js';
import type { HoseClass, HoseEndType } from '../parts/hose-classes.js';
import type { Fluid, Part, PartOf, SaleUnit, SealNeed } from '../parts/part.schema.js';
import type { SealCompound } from '../seals/seal-compounds.js';

/**
 * Invented demo catalogue for the demo shop "Tidewater Rod & Diesel": suppliers, part numbers,
 * prices and ratings are made up for the demo and describe no real product.
 */
export interface DemoSupplier {
  id: string;
  name: string;
  email: string;
  accountNumber: string;
}

export const demoSuppliers: readonly DemoSupplier[] = [
  { id: 'demo-supplier-harbor', name: 'Harbor Line Supply', email: 'orders@harborline.example', accountNumber: 'HLS-20417' },
  { id: 'demo-supplier-ridgeback', name: 'Ridgeback Fittings Co.', email: 'counter@ridgeback-fittings.example', accountNumber: 'RFC-88312' },
];

const HARBOR = 'demo-supplier-harbor';
const RIDGEBACK = 'demo-supplier-ridgeback';
const each: SaleUnit = { type: 'each' };
const foot: SaleUnit = { type: 'foot' };
const packOf10: SaleUnit = { type: 'pack', size: 10 };

interface Common {
  id: string;
  supplierId: string;
  supplierPartNumber: string;
  description: string;
  priceCents: number;
  saleUnit?: SaleUnit;
  stockOnHand?: number;
}

function common(c: Common) {
  return {
    id: c.id,
    supplierId: c.supplierId,
    supplierPartNumber: c.supplierPartNumber,
    description: c.description,
    priceCents: c.priceCents,
    saleUnit: c.saleUnit ?? each,
    stockOnHand: c.stockOnHand ?? 0,
    retired: false,
  };
}

const end = (family: Family, size: string, gender: ConnectionSpec['gender'], seat?: ConnectionSpec['seat']): ConnectionSpec =>
  seat === undefined ? { family, size, gender } : { family, size, gender, seat };
const oring = (as568: string): SealNeed => ({ type: 'o-ring', as568 });

// --- Hose: -6 and -8 in two liners --------------------------------------------------------
interface HoseLine {
  key: string;
  hoseType: string;
  hoseClass?: HoseClass;
  endTypes: HoseEndType[];
  liner: 'cpe' | 'ptfe' | 'rubber';
  label: string;
  fluids: Fluid[];
  sizes: Array<{ dash: 6 | 8; idIn: number; odIn: number; psi: number; bendIn: number; price: number; pn: string }>;
  maxTempF: number;
}

const petroleum: Fluid[] = ['atf', 'engine-oil', 'gasoline', 'diesel', 'power-steering'];
const hoseLines: HoseLine[] = [
  {
    key: 'rubber',
    hoseType: 'braided-rubber',
    endTypes: ['reusable', 'crimp'],
    liner: 'cpe',
    label: 'CPE-lined braided rubber hose',
    fluids: petroleum,
    maxTempF: 300,
    sizes: [
      { dash: 6, idIn: 0.375, odIn: 0.69, psi: 1000, bendIn: 2.5, price: 640, pn: 'HL-6120-06' },
      { dash: 8, idIn: 0.5, odIn: 0.83, psi: 800, bendIn: 3.0, price: 790, pn: 'HL-6120-08' },
    ],
  },
  {
    key: 'ptfe',
    hoseType: 'ptfe-braided',
    hoseClass: 'ptfe-braided',
    endTypes: ['reusable', 'crimp'],
    liner: 'ptfe',
    label: 'PTFE-lined braided hose (ethanol fuel)',
    fluids: [...petroleum, 'e85', 'coolant'],
    maxTempF: 400,
    // PTFE-lined hose runs about one size smaller inside than its dash.
    sizes: [
      { dash: 6, idIn: 0.31, odIn: 0.58, psi: 1500, bendIn: 3.5, price: 1150, pn: 'HL-7340-06' },
      { dash: 8, idIn: 0.4, odIn: 0.7, psi: 1250, bendIn: 4.5, price: 1425, pn: 'HL-7340-08' },
    ],
  },
  {
    key: 'cooler',
    hoseType: 'cooler-hose',
    hoseClass: 'sae-j1532-150',
    endTypes: ['push-on-clamp', 'crimp'],
    liner: 'rubber',
    label: 'Transmission oil cooler hose, SAE J1532 Type A, 150 °C class',
    fluids: ['atf'],
    maxTempF: 302, // SAE J1532 150 °C class
    // SAE J1532 Type A: 250 psi (1.7 MPa) working pressure.
    sizes: [{ dash: 6, idIn: 0.375, odIn: 0.69, psi: 250, bendIn: 2.0, price: 310, pn: 'HL-40001' }],
  },
];

const hoses: PartOf<'hose'>[] = hoseLines.flatMap((line) =>
  line.sizes.map((s) => ({
    ...common({
      id: `demo-hose-${s.dash}-${line.key}`,
      supplierId: HARBOR,
      supplierPartNumber: s.pn,
      description: `-${s.dash} ${line.label}`,
      priceCents: s.price,
      saleUnit: foot,
      stockOnHand: 25,
    }),
    kind: 'hose' as const,
    attributes: {
      dash: s.dash,
      hoseType: line.hoseType,
      ...(line.hoseClass ? { hoseClass: line.hoseClass } : {}),
      endTypes: line.endTypes,
      idIn: s.idIn,
      odIn: s.odIn,
      liner: line.liner,
      maxPressurePsi: s.psi,
      maxTempF: line.maxTempF,
      minBendRadiusIn: s.bendIn,
      fluids: line.fluids,
    },
  })),
);

// --- Hose ends: straight, 45° and 90° for each hose, -N 37° female swivel on the port side -----
const endAngles = [
  { angle: 0 as const, word: 'straight', allowanceIn: 0.8, borePenaltyIn: 0, price: 0 },
  { angle: 45 as const, word: '45°', allowanceIn: 1.25, borePenaltyIn: 0.01, price: 380 },
  { angle: 90 as const, word: '90°', allowanceIn: 1.5, borePenaltyIn: 0.015, price: 460 },
];

const braidedHoses = hoses.filter((hose) => hose.attributes.hoseType !== 'cooler-hose');
const braidedHoseEnds: PartOf<'hose-end'>[] = braidedHoses.flatMap((hose) =>
  endAngles.map((a) => {
    const ptfe = hose.attributes.liner === 'ptfe';
    const dash = hose.attributes.dash;
    return {
      ...common({
        id: `${hose.id.replace('demo-hose', 'demo-hose-end')}-${a.angle}`,
        supplierId: HARBOR,
        supplierPartNumber: `HL-${ptfe ? 74 : 61}${a.angle === 0 ? '00' : String(a.angle).padStart(2, '0')}-0${dash}`,
        description: `-${dash} ${a.word} hose end for ${ptfe ? 'PTFE-lined' : 'braided rubber'} hose, -${dash} 37° female swivel`,
        priceCents: (ptfe ? 1890 : 1090) + (dash === 8 ? 260 : 0) + a.price,
        stockOnHand: 4,
      }),
      kind: 'hose-end' as const,
      attributes: {
        hoseDash: dash,
        hoseTypes: [hose.attributes.hoseType],
        port: end('flare37', `-${dash}`, 'female'),
        angle: a.angle,
        allowanceIn: a.allowanceIn + (ptfe ? 0.1 : 0) + (dash === 8 ? 0.1 : 0),
        // The socket holds the hose about an inch past its cut face: nothing bends before that.
        rigidLengthIn: Number((a.allowanceIn + (ptfe ? 0.1 : 0) + (dash === 8 ? 0.1 : 0) + (dash === 8 ? 1.0 : 0.85)).toFixed(2)),
        // Bores stay at or above 80 % of the hose ID at every angle, so no suggested end restricts (common practice).
        boreIn: Number(((ptfe ? hose.attributes.idIn - 0.045 : hose.attributes.idIn - 0.06) - a.borePenaltyIn).toFixed(3)),
        maxPressurePsi: hose.attributes.maxPressurePsi,
        endType: 'reusable' as const,
      },
    };
  }),
);

// Barbed hose ends for the cooler hose, held by a hose clamp; a banjo hose end for braided rubber.
// Part numbers from here on follow the demo's own sequential scheme (supplier prefix + 5 digits).
const coolerHoseEnds: PartOf<'hose-end'>[] = endAngles.map((a, i) => ({
  ...common({
    id: `demo-hose-end-6-cooler-${a.angle}`,
    supplierId: HARBOR,
    supplierPartNumber: `HL-4001${i + 1}`,
    description: `-6 ${a.word} barbed hose end with hose clamp for cooler hose, -6 37° female swivel`,
    priceCents: 640 + a.price,
    stockOnHand: 4,
  }),
  kind: 'hose-end' as const,
  attributes: {
    hoseDash: 6,
    hoseTypes: ['cooler-hose'],
    port: end('flare37', '-6', 'female'),
    angle: a.angle,
    allowanceIn: a.allowanceIn + 0.2,
    rigidLengthIn: Number((a.allowanceIn + 0.2 + 0.75).toFixed(2)),
    boreIn: Number((0.315 - a.borePenaltyIn).toFixed(3)),
    maxPressurePsi: 250,
    endType: 'push-on-clamp' as const,
  },
}));

const banjoHoseEnds: PartOf<'hose-end'>[] = [
  {
    ...common({
      id: 'demo-hose-end-6-rubber-banjo-m14',
      supplierId: RIDGEBACK,
      supplierPartNumber: 'RF-40101',
      description: '-6 banjo hose end for braided rubber hose, M14x1.5 banjo bolt (turbo oil feed)',
      priceCents: 1980,
      stockOnHand: 2,
    }),
    kind: 'hose-end',
    attributes: {
      hoseDash: 6,
      hoseTypes: ['braided-rubber'],
      port: end('banjo', 'M14x1.5', 'male'),
      angle: 90,
      allowanceIn: 1.1,
      boreIn: 0.18, // the banjo bolt's drilling
      maxPressurePsi: 1000,
      endType: 'reusable',
    },
  },
];

const hoseEnds: PartOf<'hose-end'>[] = [...braidedHoseEnds, ...coolerHoseEnds, ...banjoHoseEnds];

// --- Adapters: port thread (side a) to 37° flare (side b) for the demo circuits --------------
interface AdapterRow {
  id: string;
  supplierId: string;
  pn: string;
  description: string;
  price: number;
  a: ConnectionSpec;
  b: ConnectionSpec;
  angle?: 0 | 45 | 90;
  bodyLengthIn: number;
  boreIn: number;
  /** How far side a reaches past the port face (invented, like every demo figure). */
  reachIn?: number;
  features?: string[];
  seal?: SealNeed;
  sealCompound?: SealCompound;
}

const adapterRows: AdapterRow[] = [
  // Transmission cooler circuit: 1/4 NPT and -6 ORB ports on the transmission.
  { id: 'demo-adapter-npt4-f37-6', supplierId: RIDGEBACK, pn: 'RF-204-0604', description: '1/4 NPT male to -6 37° flare male', price: 495, a: end('npt', '1/4', 'male'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.1, boreIn: 0.3, reachIn: 0.55 },
  { id: 'demo-adapter-npt4-f37-6-90', supplierId: RIDGEBACK, pn: 'RF-294-0604', description: '1/4 NPT male to -6 37° flare male, 90° elbow', price: 895, a: end('npt', '1/4', 'male'), b: end('flare37', '-6', 'male'), angle: 90, bodyLengthIn: 1.3, boreIn: 0.3, reachIn: 0.55 },
  { id: 'demo-adapter-orb6-f37-6', supplierId: RIDGEBACK, pn: 'RF-206-0606', description: '-6 O-ring boss male to -6 37° flare male, short', price: 645, a: end('orb', '-6', 'male'), b: end('flare37', '-6', 'male'), bodyLengthIn: 0.95, boreIn: 0.31, reachIn: 0.5, seal: oring('906') },
  { id: 'demo-adapter-orb6-f37-6-long', supplierId: RIDGEBACK, pn: 'RF-206-0606L', description: '-6 O-ring boss male to -6 37° flare male, long-nose (lubrication-feed return port)', price: 1275, a: end('orb', '-6', 'male'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.65, boreIn: 0.31, reachIn: 1.05, features: ['long-nose'], seal: oring('906') },
  { id: 'demo-adapter-orb6-f37-6-90', supplierId: RIDGEBACK, pn: 'RF-296-0606', description: '-6 O-ring boss male to -6 37° flare male, 90° elbow', price: 1190, a: end('orb', '-6', 'male'), b: end('flare37', '-6', 'male'), angle: 90, bodyLengthIn: 1.4, boreIn: 0.3, reachIn: 0.5, seal: oring('906') },
  // Cooler: 5/8-18 inverted flare port (3/8 in tube, the same tube size as -6).
  { id: 'demo-adapter-invf6-f37-6', supplierId: RIDGEBACK, pn: 'RF-218-0606', description: '3/8 tube inverted flare male (5/8-18) to -6 37° flare male', price: 725, a: end('invflare45', '3/8', 'male'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.05, boreIn: 0.3 },
  // Engine-oil cooler circuit: M22x1.5 on the engine, -10 ORB on the cooler, -8 hose.
  { id: 'demo-adapter-m22-f37-8', supplierId: RIDGEBACK, pn: 'RF-322-0822', description: 'M22x1.5 O-ring port male to -8 37° flare male', price: 1480, a: end('metric', 'M22x1.5', 'male', 'o-ring'), b: end('flare37', '-8', 'male'), bodyLengthIn: 1.1, boreIn: 0.41, seal: oring('ISO 6149-1 M22x1.5 (19.3x2.2)') },
  { id: 'demo-adapter-orb10-f37-8', supplierId: RIDGEBACK, pn: 'RF-206-0810', description: '-10 O-ring boss male to -8 37° flare male, reducing', price: 935, a: end('orb', '-10', 'male'), b: end('flare37', '-8', 'male'), bodyLengthIn: 1.05, boreIn: 0.41, seal: oring('910') },
  // Fuel return system: -6 / -8 ORB on pump and regulator, 3/8 NPT on the tank.
  { id: 'demo-adapter-orb8-f37-8', supplierId: HARBOR, pn: 'HL-3208-08', description: '-8 O-ring boss male to -8 37° flare male', price: 765, a: end('orb', '-8', 'male'), b: end('flare37', '-8', 'male'), bodyLengthIn: 1.0, boreIn: 0.41, seal: oring('908') },
  { id: 'demo-adapter-orb8-f37-8-90', supplierId: HARBOR, pn: 'HL-3298-08', description: '-8 O-ring boss male to -8 37° flare male, 90° elbow', price: 1340, a: end('orb', '-8', 'male'), b: end('flare37', '-8', 'male'), angle: 90, bodyLengthIn: 1.55, boreIn: 0.4, seal: oring('908') },
  { id: 'demo-adapter-npt38-f37-8', supplierId: HARBOR, pn: 'HL-3106-08', description: '3/8 NPT male to -8 37° flare male', price: 610, a: end('npt', '3/8', 'male'), b: end('flare37', '-8', 'male'), bodyLengthIn: 1.2, boreIn: 0.38 },
  { id: 'demo-adapter-npt38-f37-6', supplierId: HARBOR, pn: 'HL-3106-06', description: '3/8 NPT male to -6 37° flare male', price: 585, a: end('npt', '3/8', 'male'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.15, boreIn: 0.31 },
  { id: 'demo-adapter-orb6-f37-6-hl', supplierId: HARBOR, pn: 'HL-3206-06', description: '-6 O-ring boss male to -6 37° flare male', price: 690, a: end('orb', '-6', 'male'), b: end('flare37', '-6', 'male'), bodyLengthIn: 0.95, boreIn: 0.31, seal: oring('906') },
  // Reducer: -8 37° female swivel to -6 37° male, for a -6 hose on a -8 fitting.
  { id: 'demo-adapter-f37-8f-6m', supplierId: HARBOR, pn: 'HL-3410-0806', description: '-8 37° flare female swivel to -6 37° flare male reducer', price: 880, a: end('flare37', '-8', 'female'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.0, boreIn: 0.31 },
  // Imported transmission with metric cooler ports: washer-sealed (ISO 9974-2 / DIN 3852), sealing-edge and ISO 6149 O-ring studs.
  { id: 'demo-adapter-m14w-f37-6', supplierId: RIDGEBACK, pn: 'RF-40102', description: 'M14x1.5 washer-sealed stud to -6 37° flare male', price: 690, a: end('metric', 'M14x1.5', 'male', 'bonded-washer'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.0, boreIn: 0.3, seal: { type: 'bonded-washer', size: 'M14' } },
  { id: 'demo-adapter-m16w-f37-6', supplierId: RIDGEBACK, pn: 'RF-40103', description: 'M16x1.5 washer-sealed stud to -6 37° flare male', price: 720, a: end('metric', 'M16x1.5', 'male', 'bonded-washer'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.0, boreIn: 0.31, seal: { type: 'bonded-washer', size: 'M16' } },
  { id: 'demo-adapter-m14e-f37-6', supplierId: RIDGEBACK, pn: 'RF-40104', description: 'M14x1.5 sealing-edge stud to -6 37° flare male', price: 655, a: end('metric', 'M14x1.5', 'male', 'sealing-edge'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.0, boreIn: 0.3 },
  { id: 'demo-adapter-m14o-f37-6', supplierId: RIDGEBACK, pn: 'RF-40105', description: 'M14x1.5 O-ring stud (ISO 6149) to -6 37° flare male', price: 780, a: end('metric', 'M14x1.5', 'male', 'o-ring'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.05, boreIn: 0.3, seal: oring('ISO 6149-1 M14x1.5 (11.3x2.2)'), sealCompound: 'nitrile' },
  // Imported cooler with BSP parallel ports (washer-sealed, ISO 1179-2) and a BSP taper sender port.
  { id: 'demo-adapter-bspp12-f37-8', supplierId: HARBOR, pn: 'HL-40021', description: '1/2 BSPP washer-sealed stud to -8 37° flare male', price: 840, a: end('bspp', '1/2', 'male', 'bonded-washer'), b: end('flare37', '-8', 'male'), bodyLengthIn: 1.1, boreIn: 0.41, seal: { type: 'bonded-washer', size: '1/2 BSP' } },
  { id: 'demo-adapter-bspp38-f37-6', supplierId: HARBOR, pn: 'HL-40022', description: '3/8 BSPP washer-sealed stud to -6 37° flare male', price: 760, a: end('bspp', '3/8', 'male', 'bonded-washer'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.0, boreIn: 0.31, seal: { type: 'bonded-washer', size: '3/8 BSP' } },
  { id: 'demo-adapter-bspt14-f37-6', supplierId: HARBOR, pn: 'HL-40023', description: '1/4 BSPT male to -6 37° flare male', price: 560, a: end('bspt', '1/4', 'male'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.1, boreIn: 0.27 },
  // Factory cooler and fuel lines with quick-connect end forms (SAE J2044): connector with retainer to -6.
  { id: 'demo-adapter-qc38-f37-6', supplierId: RIDGEBACK, pn: 'RF-40106', description: '3/8 in quick-connect female with retainer (SAE J2044) to -6 37° flare male', price: 1350, a: end('qc', '3/8', 'female'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.6, boreIn: 0.28, sealCompound: 'fluorocarbon' },
  { id: 'demo-adapter-qc516-f37-6', supplierId: RIDGEBACK, pn: 'RF-40107', description: '5/16 in quick-connect female with retainer (SAE J2044) to -6 37° flare male', price: 1320, a: end('qc', '5/16', 'female'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.6, boreIn: 0.24, sealCompound: 'fluorocarbon' },
  // Power steering: O-ring face seal; pipe-thread variants.
  { id: 'demo-adapter-orfs6-orb6', supplierId: HARBOR, pn: 'HL-40024', description: '-6 O-ring face seal male to -6 O-ring boss male', price: 910, a: end('orb', '-6', 'male'), b: end('orfs', '-6', 'male'), bodyLengthIn: 1.2, boreIn: 0.3, seal: oring('906') },
  { id: 'demo-adapter-orfs6-f37-6', supplierId: HARBOR, pn: 'HL-40025', description: '-6 O-ring face seal female swivel to -6 37° flare male', price: 980, a: end('orfs', '-6', 'female'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.3, boreIn: 0.3, seal: oring('012') },
  { id: 'demo-adapter-nptf18-f37-4', supplierId: HARBOR, pn: 'HL-40026', description: '1/8 NPTF male to -4 37° flare male (gauge port)', price: 410, a: end('nptf', '1/8', 'male'), b: end('flare37', '-4', 'male'), bodyLengthIn: 0.9, boreIn: 0.17 },
  { id: 'demo-adapter-npsm14-f37-6', supplierId: HARBOR, pn: 'HL-40027', description: '1/4 NPSM female swivel to -6 37° flare male', price: 620, a: end('npsm', '1/4', 'female'), b: end('flare37', '-6', 'male'), bodyLengthIn: 1.1, boreIn: 0.28 },
];

/** Invented working pressure for the demo's steel fittings and plugs (far above any demo circuit). */
const DEMO_FITTING_PSI = 3000;

const adapters: PartOf<'adapter'>[] = adapterRows.map((r) => ({
  ...common({ id: r.id, supplierId: r.supplierId, supplierPartNumber: r.pn, description: r.description, priceCents: r.price, stockOnHand: 2 }),
  kind: 'adapter' as const,
  attributes: {
    a: r.a,
    b: r.b,
    angle: r.angle ?? 0,
    bodyLengthIn: r.bodyLengthIn,
    ...(r.reachIn === undefined ? {} : { reachIn: r.reachIn }),
    boreIn: r.boreIn,
    features: r.features ?? [],
    ...(r.seal ? { seal: r.seal } : {}),
    ...(r.sealCompound ? { sealCompound: r.sealCompound } : {}),
    maxPressurePsi: DEMO_FITTING_PSI,
  },
}));

const bulkheads: PartOf<'bulkhead'>[] = [
  {
    ...common({ id: 'demo-bulkhead-f37-6', supplierId: RIDGEBACK, supplierPartNumber: 'RF-560-06', description: '-6 37° flare male bulkhead union with jam nut', priceCents: 1650 }),
    kind: 'bulkhead',
    attributes: { a: end('flare37', '-6', 'male'), b: end('flare37', '-6', 'male'), bodyLengthIn: 2.2, boreIn: 0.31, maxPressurePsi: DEMO_FITTING_PSI },
  },
];

const plugs: PartOf<'plug'>[] = [
  { ...common({ id: 'demo-plug-orb6', supplierId: RIDGEBACK, supplierPartNumber: 'RF-650-06', description: '-6 O-ring boss plug', priceCents: 385 }), kind: 'plug', attributes: { connection: end('orb', '-6', 'male'), seal: oring('906'), maxPressurePsi: DEMO_FITTING_PSI } },
  { ...common({ id: 'demo-plug-orb8', supplierId: RIDGEBACK, supplierPartNumber: 'RF-650-08', description: '-8 O-ring boss plug', priceCents: 445 }), kind: 'plug', attributes: { connection: end('orb', '-8', 'male'), seal: oring('908'), maxPressurePsi: DEMO_FITTING_PSI } },
  { ...common({ id: 'demo-plug-npt4', supplierId: HARBOR, supplierPartNumber: 'HL-5004-04', description: '1/4 NPT hex pipe plug', priceCents: 260 }), kind: 'plug', attributes: { connection: end('npt', '1/4', 'male'), maxPressurePsi: DEMO_FITTING_PSI } },
  { ...common({ id: 'demo-cap-f37-6', supplierId: HARBOR, supplierPartNumber: 'HL-5106-06', description: '-6 37° flare cap (female)', priceCents: 310 }), kind: 'plug', attributes: { connection: end('flare37', '-6', 'female'), maxPressurePsi: DEMO_FITTING_PSI } },
];

// --- Cushion clamps by hose OD (packs of 10) and fire sleeve by OD range (by the foot) --------
const clamps: PartOf<'clamp'>[] = [
  { id: 'demo-clamp-9-16', pn: 'RF-810-09', minIn: 0.53, maxIn: 0.62, price: 1450 },
  { id: 'demo-clamp-11-16', pn: 'RF-810-11', minIn: 0.63, maxIn: 0.72, price: 1520 },
  { id: 'demo-clamp-13-16', pn: 'RF-810-13', minIn: 0.78, maxIn: 0.88, price: 1610 },
].map((c) => ({
  ...common({ id: c.id, supplierId: RIDGEBACK, supplierPartNumber: c.pn, description: `Cushion clamp for hose OD ${c.minIn}–${c.maxIn} in, pack of 10`, priceCents: c.price, saleUnit: packOf10, stockOnHand: 2 }),
  kind: 'clamp' as const,
  attributes: { fitsOd: { minIn: c.minIn, maxIn: c.maxIn } },
}));

const sleeves: PartOf<'sleeve'>[] = [
  { id: 'demo-sleeve-5-8', pn: 'HL-9010-10', minIn: 0.5, maxIn: 0.75, price: 520 },
  { id: 'demo-sleeve-1', pn: 'HL-9010-16', minIn: 0.75, maxIn: 1.0, price: 640 },
].map((s) => ({
  ...common({ id: s.id, supplierId: HARBOR, supplierPartNumber: s.pn, description: `Fire sleeve for hose OD ${s.minIn}–${s.maxIn} in`, priceCents: s.price, saleUnit: foot, stockOnHand: 6 }),
  kind: 'sleeve' as const,
  attributes: { fitsOd: { minIn: s.minIn, maxIn: s.maxIn }, maxTempF: 500 },
}));

interface SealRow {
  id: string;
  pn: string;
  seal: SealNeed;
  compound: SealCompound;
  hardnessShoreA?: number;
  price: number;
}

const washer = (type: 'bonded-washer' | 'crush-washer', size: string): SealNeed => ({ type, size });
const sealRows: SealRow[] = [
  { id: 'demo-oring-906', pn: 'RF-906-10', seal: oring('906'), compound: 'nitrile', hardnessShoreA: 90, price: 350 },
  { id: 'demo-oring-908', pn: 'RF-908-10', seal: oring('908'), compound: 'nitrile', hardnessShoreA: 90, price: 380 },
  { id: 'demo-oring-910', pn: 'RF-910-10', seal: oring('910'), compound: 'nitrile', hardnessShoreA: 90, price: 410 },
  { id: 'demo-oring-m22', pn: 'RF-922-10', seal: oring('ISO 6149-1 M22x1.5 (19.3x2.2)'), compound: 'nitrile', hardnessShoreA: 90, price: 520 },
  { id: 'demo-crush-washer-m14', pn: 'HL-8014-10', seal: washer('crush-washer', 'M14'), compound: 'copper', price: 290 },
  { id: 'demo-crush-washer-m22', pn: 'HL-8022-10', seal: washer('crush-washer', 'M22'), compound: 'copper', price: 340 },
  // Fluorocarbon O-rings for ethanol fuel (E85) and hot oil; bonded washers for washer-sealed ports.
  { id: 'demo-oring-906-fkm', pn: 'RF-40108', seal: oring('906'), compound: 'fluorocarbon', hardnessShoreA: 90, price: 690 },
  { id: 'demo-oring-908-fkm', pn: 'RF-40109', seal: oring('908'), compound: 'fluorocarbon', hardnessShoreA: 90, price: 740 },
  { id: 'demo-oring-910-fkm', pn: 'RF-40110', seal: oring('910'), compound: 'fluorocarbon', hardnessShoreA: 90, price: 790 },
  { id: 'demo-oring-m22-fkm', pn: 'RF-40113', seal: oring('ISO 6149-1 M22x1.5 (19.3x2.2)'), compound: 'fluorocarbon', hardnessShoreA: 90, price: 880 }, // hot engine oil (300 °F) is past nitrile
  { id: 'demo-oring-m14', pn: 'RF-40111', seal: oring('ISO 6149-1 M14x1.5 (11.3x2.2)'), compound: 'nitrile', hardnessShoreA: 90, price: 480 },
  { id: 'demo-oring-orfs-012', pn: 'RF-40112', seal: oring('012'), compound: 'nitrile', hardnessShoreA: 90, price: 330 },
  { id: 'demo-bonded-washer-m14', pn: 'HL-40031', seal: washer('bonded-washer', 'M14'), compound: 'nitrile', price: 360 },
  { id: 'demo-bonded-washer-m14-fkm', pn: 'HL-40032', seal: washer('bonded-washer', 'M14'), compound: 'fluorocarbon', price: 620 },
  { id: 'demo-bonded-washer-m16', pn: 'HL-40033', seal: washer('bonded-washer', 'M16'), compound: 'nitrile', price: 380 },
  { id: 'demo-bonded-washer-12bsp', pn: 'HL-40034', seal: washer('bonded-washer', '1/2 BSP'), compound: 'nitrile', price: 420 },
  { id: 'demo-bonded-washer-38bsp', pn: 'HL-40035', seal: washer('bonded-washer', '3/8 BSP'), compound: 'nitrile', price: 400 },
];

/** How the catalogue names a seal: kind and size, then hardness and compound ("O-ring AS568-906, 90 Shore A fluorocarbon"). */
function sealWords(row: SealRow): string {
  const need = row.seal;
  const kind =
    need.type === 'o-ring' ? (/^\d+$/.test(need.as568) ? `O-ring AS568-${need.as568}` : `O-ring ${need.as568}`) : `${need.type === 'bonded-washer' ? 'Bonded washer' : 'Crush washer'} ${need.size}`;
  const material = row.hardnessShoreA === undefined ? row.compound : `${row.hardnessShoreA} Shore A ${row.compound}`;
  return `${kind}, ${material}, pack of 10`;
}

const seals: PartOf<'seal'>[] = sealRows.map((s) => ({
  ...common({ id: s.id, supplierId: s.pn.startsWith('RF') ? RIDGEBACK : HARBOR, supplierPartNumber: s.pn, description: sealWords(s), priceCents: s.price, saleUnit: packOf10, stockOnHand: 1 }),
  kind: 'seal' as const,
  attributes: { seal: s.seal, compound: s.compound, ...(s.hardnessShoreA === undefined ? {} : { hardnessShoreA: s.hardnessShoreA }) },
}));

export const demoParts: Part[] = [...hoses, ...hoseEnds, ...adapters, ...bulkheads, ...plugs, ...clamps, ...sleeves, ...seals];
