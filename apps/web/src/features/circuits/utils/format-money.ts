const formatter = new Intl.NumberFormat(undefined, { minimumFractionDigits: 2, maximumFractionDigits: 2 });

/** Cents as a plain amount; the shop's currency is its own business, so no symbol is guessed. */
export function formatMoney(cents: number): string {
  return formatter.format(cents / 100);
}
