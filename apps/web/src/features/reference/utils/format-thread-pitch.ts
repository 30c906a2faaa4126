import type { ReferenceRow } from '@linesmith/catalog';

/** A thread's pitch in the row's own terms: threads per inch for inch threads, mm for metric. */
export function formatThreadPitch(row: Pick<ReferenceRow, 'tpi' | 'pitchMm'>): string {
  if (row.tpi !== undefined) return `${row.tpi} TPI`;
  if (row.pitchMm !== undefined) return `${row.pitchMm} mm pitch`;
  return 'no thread';
}
