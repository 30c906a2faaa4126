/** Outcome of joining two connection ends. Codes match the rules engine's flag codes. */
export type MateCode = 'ok' | 'joint-gender' | 'joint-seat' | 'joint-thread';

export interface MateResult {
  ok: boolean;
  code: MateCode;
  /** Plain shop words. */
  message: string;
  /** How to tell two look-alike ends apart on the bench. */
  hint?: string;
  /**
   * For a joint that is allowed but needs care a reviewer should acknowledge (NPTF into NPT,
   * a BSP taper male in a parallel port, an NPSM swivel on a pipe-thread male).
   */
  caution?: string;
}
