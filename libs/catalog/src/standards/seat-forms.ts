import type { ConnectionSpec, Family, SeatForm } from '../connections.js';
import { cone24TubeOdMm, metricSeatSizes } from './metric.table.js';

/** What one seat form is, where it comes from, and which port it goes in. */
export interface SeatFormInfo {
  seat: SeatForm;
  /** Plain words for pickers and the Reference page. */
  label: string;
  /** Standard (and form letter) the seat form follows. */
  standard: string;
  /**
   * Seat forms with the same group fit the same port: ISO 9974-1 ports take both the washer
   * (type E) and the sealing-edge (type B) stud; ISO 1179-1 ports take types E, G/H and B.
   */
  group: string;
  /** How to recognise it on the bench. */
  telltale: string;
  /** The separate seal the joint needs, if any. */
  seal: 'o-ring' | 'bonded-washer' | 'none';
}

const metricSeats: readonly SeatFormInfo[] = [
  {
    seat: 'o-ring',
    label: 'O-ring port (ISO 6149)',
    standard: 'ISO 6149-1 port, ISO 6149-2/-3 stud ends',
    group: 'iso6149',
    telltale: 'an ISO 6149 port has an O-ring chamfer and a raised identification ring on its spot face, and its stud has an identification groove on the hex (marking from memory)',
    seal: 'o-ring',
  },
  {
    seat: 'bonded-washer',
    label: 'Washer seal (ISO 9974-2 / DIN 3852)',
    standard: 'ISO 9974-1 port, ISO 9974-2 stud end type E; DIN 3852 washer forms',
    group: 'iso9974',
    telltale: 'a washer-sealed stud has a flat shoulder with a bonded, profile or crush washer under it, against a flat spot face with no chamfer',
    seal: 'bonded-washer',
  },
  {
    seat: 'sealing-edge',
    label: 'Sealing edge (ISO 9974-3 / DIN 3852 form B)',
    standard: 'ISO 9974-1 port, ISO 9974-3 stud end type B',
    group: 'iso9974',
    telltale: 'a sealing-edge stud has a sharp ring cut into the underside of its shoulder that bites the flat spot face, with no washer',
    seal: 'none',
  },
  {
    seat: 'cone24-l',
    label: '24° cone, L series (ISO 8434-1)',
    standard: 'ISO 8434-1 24° cone connector, light series',
    group: 'cone24-l',
    telltale: 'a 24° cone body has an internal 24° cone for a cutting ring or an O-ring cone nose; the L series takes the larger tube for a given thread',
    seal: 'none',
  },
  {
    seat: 'cone24-s',
    label: '24° cone, S series (ISO 8434-1)',
    standard: 'ISO 8434-1 24° cone connector, heavy series',
    group: 'cone24-s',
    telltale: 'a 24° cone body has an internal 24° cone; the S series takes a smaller, thicker-walled tube for a given thread than the L series',
    seal: 'none',
  },
];

const bsppSeats: readonly SeatFormInfo[] = [
  {
    seat: 'bonded-washer',
    label: 'Washer seal (ISO 1179-2)',
    standard: 'ISO 1179-1 port, ISO 1179-2 stud end type E (or a bonded washer)',
    group: 'iso1179',
    telltale: 'a washer-sealed BSP stud has a flat shoulder with a bonded or profile washer under it',
    seal: 'bonded-washer',
  },
  {
    seat: 'o-ring',
    label: 'O-ring with retaining ring (ISO 1179-3)',
    standard: 'ISO 1179-1 port, ISO 1179-3 stud end type G/H',
    group: 'iso1179',
    telltale: 'an ISO 1179-3 stud carries an O-ring with a retaining ring under the shoulder',
    seal: 'o-ring',
  },
  {
    seat: 'sealing-edge',
    label: 'Sealing edge (ISO 1179-4)',
    standard: 'ISO 1179-1 port, ISO 1179-4 stud end type B',
    group: 'iso1179',
    telltale: 'a sealing-edge BSP stud has a sharp ring under its shoulder and no washer',
    seal: 'none',
  },
  {
    seat: 'cone60',
    label: '60° cone',
    standard: 'BSP parallel 60° cone seat (common practice, from memory)',
    group: 'cone60',
    telltale: 'a BSP 60° cone end has a 60° cone seat (a female swivel nut on a male with a 60° recessed cone)',
    seal: 'none',
  },
];

const seatTables: Readonly<Partial<Record<Family, readonly SeatFormInfo[]>>> = { metric: metricSeats, bspp: bsppSeats };

/** Families whose connections state a seat form. */
export function hasSeatForms(family: Family): boolean {
  return seatTables[family] !== undefined;
}

/** The seat forms a family is made in, in picker order; empty for families with one seat. */
export function seatFormsOf(family: Family): readonly SeatFormInfo[] {
  return seatTables[family] ?? [];
}

export function seatFormInfo(family: Family, seat: SeatForm): SeatFormInfo | undefined {
  return seatTables[family]?.find((s) => s.seat === seat);
}

/** The seat assumed when a connection of a seat-form family leaves it out (see connections.ts). */
export function defaultSeat(family: Family): SeatForm | undefined {
  return family === 'metric' ? 'o-ring' : family === 'bspp' ? 'bonded-washer' : undefined;
}

/** The seat form that applies to a connection: its own, or its family's default; undefined for single-seat families. */
export function seatOf(spec: Pick<ConnectionSpec, 'family' | 'seat'>): SeatForm | undefined {
  if (!hasSeatForms(spec.family)) return undefined;
  return spec.seat ?? defaultSeat(spec.family);
}

/** Whether a canonical size is made in a seat form (every bspp size takes every bspp seat form). */
export function sizeHasSeat(family: Family, size: string, seat: SeatForm): boolean {
  if (!seatFormInfo(family, seat)) return false;
  if (family === 'metric') return metricSeatSizes[seat]?.includes(size) ?? false;
  return true;
}

/** Tube OD (mm) a 24° cone size is made for; undefined for other seats. */
export function cone24TubeOd(size: string, seat: SeatForm): number | undefined {
  return seat === 'cone24-l' || seat === 'cone24-s' ? cone24TubeOdMm[seat][size] : undefined;
}
