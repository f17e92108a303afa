// The order's own section at the top of its job sheet: what the pattern cannot say and a maker
// at the bench needs before cutting (who it is for, how many, which leather in which colour
// and finish, which thread, the hardware to take from the shop's stock, the customer's notes).
import { WEARER_KIND_LABELS, type WearerKind } from '@shared/schemas/orders.ts';
import type { PriceView } from '@shared/schemas/order-views.ts';
import type { ListedOrderRow } from './orders.repository.ts';

/**
 * Notes longer than this are cut on the sheet (with a pointer to the order): the job sheet is
 * one page and its cautions, printed last, must never be pushed off it. About six lines at
 * A4 or Letter width; the order screen keeps every word.
 */
export const JOB_SHEET_NOTES_MAX_CHARS = 600;

const orNotSet = (s: string) => (s.trim() ? s.trim() : 'not set');

/** Cuts text at a word boundary to at most `max` characters, marking the cut. */
export function clipNotes(text: string, max = JOB_SHEET_NOTES_MAX_CHARS): string {
  const flat = text.replace(/\s+/g, ' ').trim();
  if (flat.length <= max) return flat;
  const cut = flat.slice(0, max);
  const atWord = cut.slice(0, Math.max(cut.lastIndexOf(' '), max * 0.8));
  return `${atWord.trimEnd()}… (the rest is in the order's notes)`;
}

/** The lines of the order's section, in the words of the order form. */
export function jobSheetOrderSection(row: ListedOrderRow, price: PriceView | null): { heading: string; lines: string[] } {
  const kind = WEARER_KIND_LABELS[row.wearer_kind as WearerKind]?.toLowerCase() ?? row.wearer_kind;
  const lines = [
    `For ${row.wearer_name} (${kind}), ordered by ${row.customer_name}`,
    `Quantity: ${row.quantity}${row.quantity > 1 ? ' (cut, punch and set hardware for each)' : ''}`,
    `Leather: ${price?.leather.name ?? 'not chosen'} · Colour: ${orNotSet(row.leather_colour)} · Finish: ${orNotSet(row.leather_finish)}`,
    `Thread: ${orNotSet(row.thread)}`,
  ];
  const stock = price?.hardware ?? [];
  if (stock.length) lines.push(`From the shop's hardware, per piece: ${stock.map((h) => `${h.quantity} x ${h.name}`).join(', ')}`);
  lines.push(`Notes: ${row.notes.trim() ? clipNotes(row.notes) : 'none'}`);
  return { heading: `Order ${row.number}`, lines };
}
