import { nptTable } from './npt.table.js';
import type { ThreadRow } from './thread-row.js';

/**
 * Dryseal pipe threads (NPTF), ASME B1.20.3: the NPT sizes, pitches, taper and pipe ODs of ASME
 * B1.20.1 Table 2, with crests and roots held so the flanks and crests seal by contact (no
 * sealant needed between two NPTF ends). NPTF against NPT joins but the dry seal is not assured.
 */
const B1_20_3 = 'ASME B1.20.3 dryseal NPTF (sizes, pitches and taper as ASME B1.20.1 Table 2)';

export const nptfTable: readonly ThreadRow[] = nptTable.map((row) => ({
  ...row,
  family: 'nptf' as const,
  designation: row.designation.replace(/ NPT$/, ' NPTF'),
  source: B1_20_3,
}));
