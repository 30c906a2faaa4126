/** Outcome of joining two connection ends. Codes match the rules engine's flag codes. */
export type MateCode = 'ok' | 'joint-gender' | 'joint-seat' | 'joint-thread';

export interface MateResult {
  ok: boolean;
  code: MateCode;
  /** Plain shop words. */
  message: string;
  /** How to tell two look-alike ends apart on the bench. */
  hint?: string;
}
