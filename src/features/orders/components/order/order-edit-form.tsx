import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { UpdateOrderSchema } from '@shared/schemas/orders.ts';
import type { OrderDetail, ShopPricingView } from '@shared/schemas/order-views.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { applyServerErrors } from '@/lib/form-errors.ts';
import { useUpdateOrder } from '../../api/mutations.ts';
import { ORDER_DETAIL_FIELDS, OrderDetailFields, detailBody, type OrderDetailValues } from '../order-detail-fields.tsx';
import { parseInto } from '../zod-to-form.ts';

/** Due date, quantity, leather, thread, notes, bench time and hardware of an order, changed in place. */
export function OrderEditForm({ order, leathers, onDone }: { order: OrderDetail; leathers: ShopPricingView['leathers']; onDone: () => void }) {
  const update = useUpdateOrder(order.id);
  const [problem, setProblem] = useState<string>();
  const { register, control, handleSubmit, setError, formState } = useForm<OrderDetailValues>({
    defaultValues: {
      dueDate: order.dueDate,
      quantity: order.quantity,
      leatherId: order.leatherId ?? '',
      leatherColour: order.leatherColour,
      leatherFinish: order.leatherFinish,
      thread: order.thread,
      notes: order.notes,
      benchMinutes: order.benchMinutes,
      // The lines the order uses now (matched ones too), so "Choose lines" starts from them.
      hardwareFrom: order.hardwareChosen ? 'lines' : 'pattern',
      hardware: order.hardware.map((h) => ({ itemId: h.itemId, quantity: h.quantity })),
    },
  });
  const onSubmit = handleSubmit(async (v) => {
    setProblem(undefined);
    const body = parseInto(UpdateOrderSchema, detailBody(v), setError);
    if (!body) return;
    try {
      await update.mutateAsync(body);
      onDone();
    } catch (err) {
      setProblem(applyServerErrors(err, setError, ORDER_DETAIL_FIELDS));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4" aria-label="Edit the order">
      <OrderDetailFields register={register} control={control} errors={formState.errors} leathers={leathers} />
      {problem && (
        <Notice tone="danger" role="alert">
          {problem}
        </Notice>
      )}
      <div className="flex gap-2">
        <Button type="submit" busy={formState.isSubmitting}>
          Save changes
        </Button>
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
