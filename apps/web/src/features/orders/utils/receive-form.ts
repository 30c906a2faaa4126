import { z } from 'zod';
import type { OrderLine, ReceiveInput } from '../api/order-schema';

/** Still to come for a line, never below zero. */
export function outstanding(line: OrderLine): number {
  return Math.max(0, Math.round((line.quantity - line.receivedQuantity) * 1000) / 1000);
}

const quantityText = z
  .string()
  .trim()
  .transform((text) => (text === '' ? 0 : Number(text)))
  .refine((n) => Number.isFinite(n) && n >= 0, 'Enter 0 or more.');

/** Per-line quantities as typed → the receive body (lines with 0 left out); errors keyed by line id. */
export function receiveInputOf(
  lines: readonly OrderLine[],
  typed: Record<string, string>,
): { ok: true; input: ReceiveInput } | { ok: false; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const input: ReceiveInput = { lines: [] };
  for (const line of lines) {
    const parsed = quantityText.safeParse(typed[line.id] ?? '');
    if (!parsed.success) errors[line.id] = parsed.error.issues[0].message;
    else if (parsed.data > outstanding(line)) errors[line.id] = `Only ${outstanding(line)} still to come.`;
    else if (parsed.data > 0) input.lines.push({ orderLineId: line.id, quantity: parsed.data });
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  if (input.lines.length === 0) return { ok: false, errors: { form: 'Enter the quantity that arrived for at least one line.' } };
  return { ok: true, input };
}
