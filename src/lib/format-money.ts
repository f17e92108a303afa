/** Integer cents of an ISO 4217 currency as the reader's locale writes money ("$48.50"). */
export function formatMoney(cents: number, currency: string): string {
  try {
    return new Intl.NumberFormat(undefined, { style: 'currency', currency }).format(cents / 100);
  } catch {
    // An unknown code still shows the amount rather than failing the screen.
    return `${(cents / 100).toFixed(2)} ${currency}`;
  }
}

/** A money field's text ("48.5") as integer cents, or NaN when it is not an amount. */
export function moneyTextToCents(text: string): number {
  const t = text.trim().replace(/,/g, '');
  if (!/^\d+(\.\d{0,2})?$/.test(t)) return Number.NaN;
  return Math.round(Number(t) * 100);
}

/** Cents as the text a money field shows ("48.50"). */
export function centsToMoneyText(cents: number): string {
  return (cents / 100).toFixed(2);
}
