// The sentences of an order's history, in the words and units people use.
import { ORDER_STAGE_LABELS, type OrderStage } from '@shared/schemas/orders.ts';
import type { LengthUnit } from '@shared/units/length.ts';
import { formatLength } from '@shared/units/format-length.ts';

export const stageLabel = (s: string) => ORDER_STAGE_LABELS[s as OrderStage] ?? s;
export const girthWords = (mm: number | null, unit: LengthUnit) => (mm === null ? 'no girth yet' : `${formatLength(mm, unit)} girth`);

/** The order's fields as the form labels them (for "Changed due date, notes."). */
const FIELD_LABELS: Record<string, string> = {
  dueDate: 'due date',
  quantity: 'quantity',
  leatherId: 'leather',
  leatherColour: 'leather colour',
  leatherFinish: 'finish',
  thread: 'thread',
  notes: 'notes',
  benchMinutes: 'bench time',
  hardware: 'hardware',
  fit: 'girth',
};

export function changedWords(keys: string[]): string {
  // A key without a label is spelled out in words, never shown as a camelCase name.
  const words = keys.map((k) => FIELD_LABELS[k] ?? k.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase());
  return `Changed ${words.join(', ')}.`;
}

/** Today as YYYY-MM-DD in UTC (due dates are calendar days). */
export const todayOf = (nowMs: number) => new Date(nowMs).toISOString().slice(0, 10);
