import type { ConnectionSpec, Family, Gender } from '../connections.js';
import { seatFormInfo, seatFormsOf, seatOf } from '../standards/seat-forms.js';
import { canonicalSize, isValidConnection } from '../standards/tables.js';

/** The seat group of a seat-form connection ("iso9974"), or undefined for single-seat families. */
function seatGroupOf(spec: ConnectionSpec): string | undefined {
  const seat = seatOf(spec);
  return seat === undefined ? undefined : seatFormInfo(spec.family, seat)?.group;
}

function key(family: Family, size: string, gender: Gender, group: string | undefined): string {
  return group === undefined ? `${family}|${size}|${gender}` : `${family}|${size}|${gender}|${group}`;
}

/**
 * Canonical identity of a connection end for the solver: "orb|-6|male"; seat-form families add
 * the seat group, since ends of one group fit the same ports ("metric|M14x1.5|female|iso9974").
 */
export function connectionKey(spec: ConnectionSpec): string {
  return key(spec.family, canonicalSize(spec.family, spec.size), spec.gender, seatGroupOf(spec));
}

const opposite: Readonly<Record<Gender, Gender>> = { male: 'female', female: 'male' };

/** Every seat group of a family (one undefined entry for single-seat families). */
function groupsOf(family: Family): Array<string | undefined> {
  const seats = seatFormsOf(family);
  return seats.length === 0 ? [undefined] : [...new Set(seats.map((s) => s.group))];
}

/**
 * Families whose ends join across families at the same nominal size (mate() answers ok, with a
 * caution): NPT with NPTF either way round; a taper male into a parallel female (BSPT into BSPP,
 * NPT or NPTF into an NPSM swivel).
 */
const crossFamily: ReadonlyArray<{ male: Family; female: Family }> = [
  { male: 'npt', female: 'nptf' },
  { male: 'nptf', female: 'npt' },
  { male: 'bspt', female: 'bspp' },
  { male: 'npt', female: 'npsm' },
  { male: 'nptf', female: 'npsm' },
];

/**
 * Keys of every end that joins this one — same family, size and seat group, other gender, plus
 * the cross-family joins above — or none when nothing can (a barb, or a size or seat form not in
 * the tables). Mirrors mate()'s ok answers; symmetric by construction.
 */
export function matingKeys(spec: ConnectionSpec): string[] {
  if (spec.family === 'barb' || !isValidConnection(spec)) return [];
  const size = canonicalSize(spec.family, spec.size);
  const other = opposite[spec.gender];
  const keys = [key(spec.family, size, other, seatGroupOf(spec))];
  for (const pair of crossFamily) {
    const [mine, theirs] = spec.gender === 'male' ? [pair.male, pair.female] : [pair.female, pair.male];
    if (mine !== spec.family) continue;
    for (const group of groupsOf(theirs)) {
      const candidate = { family: theirs, size, gender: other };
      if (!isValidConnection(candidate)) continue;
      keys.push(key(theirs, size, other, group));
    }
  }
  return keys;
}
