/**
 * Dash size → tube OD → thread, SAE J514 (37° flared tube fittings, also AN/MS flared tube
 * fittings). The same threads are used by O-ring boss ports, SAE J1926-1 / AS5202, so both
 * families read this one table.
 */
export const SAE_J514_SOURCE = 'SAE J514, 37° flare fitting thread table (also AN/MS flared tube)';

export const dashThreads: ReadonlyArray<{ dash: number; thread: string }> = [
  { dash: 2, thread: '5/16-24 UNF' }, // SAE J514
  { dash: 3, thread: '3/8-24 UNF' }, // SAE J514
  { dash: 4, thread: '7/16-20 UNF' }, // SAE J514
  { dash: 5, thread: '1/2-20 UNF' }, // SAE J514
  { dash: 6, thread: '9/16-18 UNF' }, // SAE J514
  { dash: 8, thread: '3/4-16 UNF' }, // SAE J514
  { dash: 10, thread: '7/8-14 UNF' }, // SAE J514
  { dash: 12, thread: '1-1/16-12 UN' }, // SAE J514
  { dash: 14, thread: '1-3/16-12 UN' }, // SAE J514
  { dash: 16, thread: '1-5/16-12 UN' }, // SAE J514
  { dash: 20, thread: '1-5/8-12 UN' }, // SAE J514
  { dash: 24, thread: '1-7/8-12 UN' }, // SAE J514
  { dash: 32, thread: '2-1/2-12 UN' }, // SAE J514
];
