import { formatGirth } from '@shared/schemas/orders.ts';
import type { OrderSummary } from '@shared/schemas/order-views.ts';

/** The girth an order is made at, as its pattern's unit reads it, or what it waits for. */
export function orderGirthText(order: Pick<OrderSummary, 'girthMm' | 'sizeName' | 'unit'>): string {
  if (order.girthMm === null) return 'Girth to come';
  const girth = formatGirth(order.girthMm, order.unit === 'mm' ? 'mm' : 'in');
  return order.sizeName ? `Size ${order.sizeName}, ${girth}` : girth;
}
