import type { WearerKind } from '@shared/schemas/orders.ts';
import type { OrderDetailValues } from '../order-detail-fields.tsx';

/** Everything the new-order form holds; `'new'` in a picker means "make one now". */
export interface NewOrderValues extends OrderDetailValues {
  customerId: string;
  newCustomer: { name: string; email: string; phone: string };
  wearerId: string;
  newWearer: { name: string; kind: WearerKind };
  patternId: string;
  fitFrom: 'size' | 'measurement' | 'later';
  sizeName: string;
}

/** Two weeks from today, as YYYY-MM-DD in the reader's own calendar. */
export function defaultDueDate(now: Date = new Date()): string {
  const d = new Date(now.getFullYear(), now.getMonth(), now.getDate() + 14);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}
