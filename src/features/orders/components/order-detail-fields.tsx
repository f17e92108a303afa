import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import type { ShopPricingView } from '@shared/schemas/order-views.ts';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field.tsx';

/** The order's own fields, shared by the new-order form and the edit form. */
export interface OrderDetailValues {
  dueDate: string;
  quantity: string | number;
  leatherId: string;
  leatherColour: string;
  leatherFinish: string;
  thread: string;
  notes: string;
  benchMinutes: string | number;
}

export const ORDER_DETAIL_FIELDS = ['dueDate', 'quantity', 'leatherId', 'leatherColour', 'leatherFinish', 'thread', 'notes', 'benchMinutes'] as const;

/** The form's values as the API's (an empty leather choice is "not priced yet"). */
export function detailBody(v: OrderDetailValues) {
  return {
    dueDate: v.dueDate,
    quantity: v.quantity,
    leatherId: v.leatherId === '' ? null : v.leatherId,
    leatherColour: v.leatherColour,
    leatherFinish: v.leatherFinish,
    thread: v.thread,
    notes: v.notes,
    benchMinutes: v.benchMinutes,
  };
}

export function OrderDetailFields<T extends OrderDetailValues>({
  register,
  errors,
  leathers,
}: {
  register: UseFormRegister<T>;
  errors: FieldErrors<T>;
  leathers: ShopPricingView['leathers'];
}) {
  // The generic form type still has these names; narrow once for the registrations below.
  const r = register as unknown as UseFormRegister<OrderDetailValues>;
  const e = errors as FieldErrors<OrderDetailValues>;
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <TextField label="Due date" type="date" {...r('dueDate')} error={e.dueDate?.message} />
      <TextField label="Quantity" type="number" inputMode="numeric" min={1} {...r('quantity')} error={e.quantity?.message} />
      <SelectField label="Leather" {...r('leatherId')} error={e.leatherId?.message} hint={leathers.length === 0 ? 'The owner lists leathers and prices under Pricing.' : undefined}>
        <option value="">Not chosen yet</option>
        {leathers.map((l) => (
          <option key={l.id} value={l.id}>
            {l.name}
          </option>
        ))}
      </SelectField>
      <TextField label="Leather colour" {...r('leatherColour')} error={e.leatherColour?.message} placeholder="e.g. Chestnut" />
      <TextField label="Finish" {...r('leatherFinish')} error={e.leatherFinish?.message} placeholder="e.g. Burnished edges, matte top" />
      <TextField label="Thread" {...r('thread')} error={e.thread?.message} placeholder="e.g. 0.8 mm waxed polyester, natural" />
      <TextField label="Bench time" unit="min per piece" type="number" inputMode="numeric" min={0} {...r('benchMinutes')} error={e.benchMinutes?.message} />
      <TextAreaField label="Notes" wrapperClassName="sm:col-span-2" {...r('notes')} error={e.notes?.message} />
    </div>
  );
}
