import { ORDER_STAGES, ORDER_STAGE_LABELS, type OrderStage } from '@shared/schemas/orders.ts';
import type { BadgeTone } from '@/components/ui/badge.tsx';

export { ORDER_STAGES, ORDER_STAGE_LABELS };

/** The stage after `stage` in the flow, or null at the end. */
export function nextStage(stage: OrderStage): OrderStage | null {
  return ORDER_STAGES[ORDER_STAGES.indexOf(stage) + 1] ?? null;
}

/** The stage before `stage`, or null at the start. */
export function previousStage(stage: OrderStage): OrderStage | null {
  const i = ORDER_STAGES.indexOf(stage);
  return i > 0 ? ORDER_STAGES[i - 1]! : null;
}

export function stageLabel(stage: OrderStage): string {
  return ORDER_STAGE_LABELS[stage];
}

/** Waiting is brass (someone else must act), handed over is moss (done), the bench stages hide. */
export function stageTone(stage: OrderStage): BadgeTone {
  if (stage === 'waiting-for-measurement') return 'brass';
  if (stage === 'handed-over' || stage === 'finished') return 'moss';
  return 'hide';
}

/** "2027-03-14" as the reader's locale writes a day, without shifting it by the time zone. */
export function formatDay(day: string): string {
  const d = new Date(`${day}T12:00:00Z`);
  if (Number.isNaN(d.getTime())) return day;
  return new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeZone: 'UTC' }).format(d);
}
