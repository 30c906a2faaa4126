import { families, familyLabel, type Family } from '@linesmith/catalog';

/**
 * Assembly notes for the shop sheet, one list per connection family, plus the notes for every
 * hose. All are common practice of the trade (not taken from one standard); the makers' own
 * instructions for their fittings take precedence.
 */
export const assemblyNotesByFamily: Readonly<Record<Family, readonly string[]>> = {
  flare37: [
    'The 37° cone seals metal to metal: no sealant, tape or thread compound on the threads or the flare seat (common practice).',
    'Wipe the cone clean, start the nut by hand, then tighten the specified flats from finger-tight; do not overtighten (common practice).',
  ],
  flare45: [
    'The 45° flare seals metal to metal: no sealant or tape on the threads or the flare seat (common practice).',
    'Check the flare for cracks and centring before assembly; a light film of the system fluid on the threads is enough (common practice).',
  ],
  invflare45: [
    'The inverted flare seals on its 45° seat: no sealant or tape on the threads or the seat (common practice).',
    'Start the tube nut by hand to avoid cross-threading in the soft port; tighten to the maker’s value (common practice).',
  ],
  orb: [
    'The O-ring seals, not the thread: no sealant or tape on O-ring boss threads or seats (common practice).',
    'Lubricate the O-ring with the system fluid or a compatible assembly lube before fitting; use a new O-ring of the right compound for the fluid (common practice).',
    'On adjustable fittings, back the lock nut off fully, seat the fitting, turn it to its position, then tighten the lock nut (common practice).',
  ],
  npt: [
    'Pipe threads seal on the taper: use a thread sealant or PTFE tape rated for the fluid, on the male thread only, starting two threads back from the end (common practice).',
    'Sealant or tape goes on pipe threads only — never on flare seats or O-ring joints (common practice).',
    'Do not back a tapered fitting off to align it; tighten past to the position instead (common practice).',
  ],
  nptf: [
    'Dryseal threads seal on the thread flanks and crests; between two NPTF ends a sealant is not needed, but a sealant rated for the fluid is common practice on fuel (common practice).',
    'NPTF against NPT: use a sealant on the male thread, never on a flare or O-ring seat, and leak-test (common practice).',
  ],
  npsm: [
    'NPSM swivels seal on the 30° seat, not the thread: no sealant or tape; check the male has the 30° seat before fitting (common practice).',
  ],
  bspp: [
    'BSP parallel ports seal on a washer, O-ring or cone, not the thread: no sealant or tape on the threads (common practice).',
    'Use a new bonded washer or O-ring of a compound rated for the fluid each time (common practice).',
  ],
  bspt: [
    'BSP taper threads seal on the thread: use a sealant rated for the fluid on the male thread only; never mix with NPT (55° against 60° flanks) (common practice).',
  ],
  orfs: [
    'The face O-ring seals: fit a new O-ring of the right compound in the groove, keep it in place with a little system fluid, and tighten the nut face to face; no sealant (common practice).',
  ],
  metric: [
    'Metric ports seal with an O-ring, a washer, a sealing edge or a 24° cone: no sealant or tape on the threads (common practice).',
    'Use a new sealing washer or O-ring each time, of a compound rated for the fluid; lubricate O-rings with the system fluid (common practice).',
  ],
  banjo: [
    'Fit a new crush washer on each face of the banjo eye (two per joint); tighten the bolt to the maker’s value, no sealant (common practice).',
    'Check the bolt’s cross drilling is clear and lines up with the eye’s groove before fitting (common practice).',
  ],
  qc: [
    'Push the end form in until the retainer locks, then pull back to check it holds; replace a damaged retainer (common practice).',
    'Keep the end form clean and free of nicks: the seal is on the O-rings inside the connector (common practice).',
  ],
  barb: [
    'Push the hose fully over the barb and clamp behind the last barb ridge with a clamp sized for the hose OD; no sealant (common practice).',
    'Barbed joints suit low-pressure lines only; check the hose and clamp ratings against the circuit (common practice).',
  ],
};

/** Notes for every hose assembly, whatever its ends. */
export const hoseAssemblyNotes: readonly string[] = [
  'Do not twist the hose when tightening the second end: hold the hose end and turn the nut; the lay line printed on the hose must stay straight (common practice).',
  'Clean the hose bore after cutting and before assembly, then cap the ends until the line goes on the vehicle (common practice).',
  'Keep bends at or above the hose’s minimum bend radius and clear of edges; clamp at the support positions listed (common practice).',
];

export interface FamilyNotes {
  family: Family;
  label: string;
  notes: readonly string[];
}

/** The notes of the families present, in the Reference page's family order. */
export function assemblyNotesFor(present: Iterable<Family>): FamilyNotes[] {
  const set = new Set(present);
  return families.filter((f) => set.has(f)).map((family) => ({ family, label: familyLabel(family), notes: assemblyNotesByFamily[family] }));
}
