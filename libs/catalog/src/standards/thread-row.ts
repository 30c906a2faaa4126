import type { Family } from '../connections.js';

/** One size of one connection family, as shown on the Reference page and used by mating. */
export interface ThreadRow {
  family: Family;
  /** Size string as in DOMAIN.md §1: "-6", "3/8", "1/4", "M14x1.5", "8mm". */
  size: string;
  /** "9/16-18 UNF", "1/4-18 NPT", "M14x1.5", "1/4-19 BSPP (G 1/4)", or "-6 hose barb" (no thread). */
  designation: string;
  /**
   * Basic major diameter (NPT/NPTF: pipe OD; BSPT: major diameter at the gauge plane; NPSM: the
   * male's largest major diameter; barb: the hose inside diameter it takes; quick-connect: the tube OD), in.
   */
  majorDiameterIn: number;
  tpi?: number;
  pitchMm?: number;
  tapered: boolean;
  /** Included angle of the thread flanks: 60° for unified, NPT and metric threads, 55° for BSP (Whitworth form). */
  flankAngleDeg?: 55 | 60;
  /** Tapered BSP only: gauge length (small end to gauge plane), in. */
  gaugeLengthIn?: number;
  /** Tube OD the size is made for, where the family is a tube or hose family. */
  tubeOdIn?: number;
  /** False for hose barbs and quick-connect end forms: nothing to thread into. */
  threaded: boolean;
  /** Where the row's numbers come from: standard + table, "common practice" or "from memory". */
  source: string;
}
