import { describe, expect, it } from 'vitest';
import type { OrderStage } from '@shared/schemas/orders.ts';
import type { OrderSummary } from '@shared/schemas/order-views.ts';
import { columnOrders, HANDED_OVER_SHOWN } from './order-board.tsx';

// Only the fields the board's columns read; the rest of a summary does not matter here.
const order = (id: number, stage: OrderStage, updatedAt: string) => ({ id, stage, updatedAt }) as OrderSummary;

describe('order board columns', () => {
  const handedOver = Array.from({ length: 9 }, (_, i) => order(i + 1, 'handed-over', `2026-11-${String(10 + i).padStart(2, '0')}T10:00:00.000Z`));
  const working = Array.from({ length: 12 }, (_, i) => order(100 + i, 'cut', '2026-01-01T00:00:00.000Z'));

  it('when nine orders have been handed over, then the column shows the five changed last, newest first, and counts the rest', () => {
    const { shown, hidden } = columnOrders([...working, ...handedOver], 'handed-over');
    expect(shown.map((o) => o.id)).toEqual([9, 8, 7, 6, 5]);
    expect(shown).toHaveLength(HANDED_OVER_SHOWN);
    expect(hidden).toBe(4);
  });

  it('when a working stage holds many orders, then every one stays on the board', () => {
    const { shown, hidden } = columnOrders([...working, ...handedOver], 'cut');
    expect(shown).toHaveLength(12);
    expect(hidden).toBe(0);
  });
});
