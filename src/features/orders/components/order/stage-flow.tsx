import { useState } from 'react';
import type { OrderStage } from '@shared/schemas/orders.ts';
import type { OrderDetail } from '@shared/schemas/order-views.ts';
import { Button } from '@/components/ui/button.tsx';
import { cx } from '@/components/ui/cx.ts';
import { SelectField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { useMoveOrder } from '../../api/mutations.ts';
import { ORDER_STAGES, nextStage, previousStage, stageLabel } from '../../stages.ts';

/**
 * The stage flow as a row of steps (a column on a phone) with the way forward as the main
 * button, the way back beside it, and any other stage from a list (a piece recut goes back
 * to "Ready to cut").
 */
export function StageFlow({ order, canMove }: { order: OrderDetail; canMove: boolean }) {
  const move = useMoveOrder();
  const [other, setOther] = useState<OrderStage | ''>('');
  const at = ORDER_STAGES.indexOf(order.stage);
  const forward = nextStage(order.stage);
  const back = previousStage(order.stage);
  const go = (stage: OrderStage) => move.mutate({ id: order.id, stage }, { onSuccess: () => setOther('') });
  return (
    <div className="grid gap-4">
      <ol className="grid gap-1 sm:grid-cols-7 sm:gap-0" aria-label="Stages" data-testid="stage-flow">
        {ORDER_STAGES.map((s, i) => (
          <li
            key={s}
            aria-current={i === at ? 'step' : undefined}
            className={cx(
              'flex items-center gap-2 px-2 py-1 text-xs font-medium sm:flex-col sm:items-start sm:border-t-4 sm:pt-2',
              i < at && 'text-moss-700 sm:border-moss-500',
              i === at && 'rounded bg-hide-800 text-paper sm:rounded-none sm:border-brass-500 sm:bg-transparent sm:text-hide-900',
              i > at && 'text-hide-500 sm:border-hide-200',
            )}
          >
            <span aria-hidden="true" className="tabular-nums">
              {i < at ? '✓' : i + 1}
            </span>
            <span>{stageLabel(s)}</span>
          </li>
        ))}
      </ol>
      {canMove && (
        <div className="flex flex-wrap items-end gap-2">
          {forward && (
            <Button busy={move.isPending} onClick={() => go(forward)}>
              Move to {stageLabel(forward)}
            </Button>
          )}
          {back && (
            <Button variant="secondary" disabled={move.isPending} onClick={() => go(back)}>
              Back to {stageLabel(back)}
            </Button>
          )}
          <div className="flex items-end gap-2">
            <SelectField label="Or move to" value={other} onChange={(e) => setOther(e.target.value as OrderStage | '')} wrapperClassName="min-w-44">
              <option value="">Choose a stage…</option>
              {ORDER_STAGES.filter((s) => s !== order.stage).map((s) => (
                <option key={s} value={s}>
                  {stageLabel(s)}
                </option>
              ))}
            </SelectField>
            <Button variant="secondary" disabled={!other || move.isPending} onClick={() => other && go(other)}>
              Move
            </Button>
          </div>
        </div>
      )}
      {move.isError && (
        <Notice tone="danger" role="alert" title="The order did not move">
          {move.error.message}
        </Notice>
      )}
    </div>
  );
}
