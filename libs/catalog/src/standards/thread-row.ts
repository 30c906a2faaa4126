import type { Family } from '../connections.js';

/** One size of one connection family, as shown on the Reference page and used by mating. */
export interface ThreadRow {
  family: Family;
  /** Size string as in DOMAIN.md §1: "-6", "3/8", "1/4", "M14x1.5". */
  size: string;
  /** "9/16-18 UNF", "1/4-18 NPT", "M14x1.5", or "-6 hose barb" (no thread). */
  designation: string;
  /** Basic major diameter (NPT: pipe OD; barb: the hose inside diameter it takes), in. */
  majorDiameterIn: number;
  tpi?: number;
  pitchMm?: number;
  tapered: boolean;
  /** Tube OD the size is made for, where the family is a tube or hose family. */
  tubeOdIn?: number;
  /** False for hose barbs: nothing to thread into. */
  threaded: boolean;
  /** Where the row's numbers come from: standard + table, "common practice" or "from memory". */
  source: string;
}
