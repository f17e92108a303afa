import { useId } from 'react';
import { useFieldArray, useWatch, type Control, type FieldErrors, type Path, type UseFormRegister } from 'react-hook-form';
import { useQuery } from '@tanstack/react-query';
import type { ShopPricingView } from '@shared/schemas/order-views.ts';
import { HARDWARE_KIND_LABELS, type HardwareItem, type ShopStandardsView } from '@shared/schemas/shop-standards.ts';
import type { LengthUnit } from '@shared/units/length.ts';
import { formatLength } from '@shared/units/format-length.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field.tsx';
import { formatMoney } from '@/lib/format-money.ts';
import { api } from '@/lib/api-client.ts';
import { pricingQueryOptions } from '../api/queries.ts';


/**
 * The shop's hardware list for the order forms. Read under the orders' own key (features do not
 * import each other, as with the pattern picker), so an item listed meanwhile shows after 30 s.
 */
const shopHardwareQuery = () => ({
  queryKey: ['orders', 'shop-hardware'] as const,
  queryFn: ({ signal }: { signal: AbortSignal }) => api.get<ShopStandardsView>('/api/shop/standards', signal),
  select: (v: ShopStandardsView) => ({ items: v.standards.hardware ?? [], unit: v.standards.units ?? ('in' as LengthUnit) }),
  staleTime: 30_000,
});

/** At most this many hardware lines (the API's limit). */
export const HARDWARE_LINES_MAX = 20;

/** One hardware line as the form holds it (the quantity is the input's text). */
export interface HardwareLineValues {
  itemId: string;
  quantity: string | number;
}

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
  /** "pattern": matched from the pattern's hardware by kind (stored as null); "lines": the lines below. */
  hardwareFrom: 'pattern' | 'lines';
  hardware: HardwareLineValues[];
}

/** The form's names of the fields the server may refuse (its keys are the same paths). */
export const ORDER_DETAIL_FIELDS: readonly Path<OrderDetailValues>[] = [
  'dueDate',
  'quantity',
  'leatherId',
  'leatherColour',
  'leatherFinish',
  'thread',
  'notes',
  'benchMinutes',
  'hardware',
  ...Array.from({ length: HARDWARE_LINES_MAX }, (_, i) => [`hardware.${i}.itemId`, `hardware.${i}.quantity`] as const).flat(),
];

/** The form's values as the API's (an empty leather choice is "not priced yet"; hardware "as the pattern" is null). */
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
    hardware: v.hardwareFrom === 'lines' ? v.hardware.map((l) => ({ itemId: l.itemId, quantity: l.quantity })) : null,
  };
}

/** An item of the shop's hardware in words, as the Shop page describes it: "Brass roller buckle (Buckle, 1 in inside), $3.50 each". */
export function hardwareItemWords(item: HardwareItem, unit: LengthUnit, currency: string | undefined): string {
  const size =
    item.insideWidthMm !== undefined ? `${formatLength(item.insideWidthMm, unit)} inside` : item.postLengthMm !== undefined ? `${formatLength(item.postLengthMm, unit)} post` : '';
  const what = [HARDWARE_KIND_LABELS[item.kind], size].filter(Boolean).join(', ');
  const cost = currency ? `, ${formatMoney(item.unitCostCents, currency)} each` : '';
  return `${item.name || 'Unnamed item'} (${what})${cost}`;
}

function HardwareFields({ control, register, errors }: { control: Control<OrderDetailValues>; register: UseFormRegister<OrderDetailValues>; errors: FieldErrors<OrderDetailValues> }) {
  const standards = useQuery(shopHardwareQuery());
  const pricing = useQuery(pricingQueryOptions());
  const { fields, append, remove } = useFieldArray({ control, name: 'hardware', keyName: 'key' });
  const from = useWatch({ control, name: 'hardwareFrom' });
  const lines = useWatch({ control, name: 'hardware' }) ?? [];
  const items = standards.data?.items ?? [];
  const unit = standards.data?.unit ?? 'in';
  const currency = pricing.data?.currency;
  const hintId = useId();
  const listError = errors.hardware?.message ?? errors.hardware?.root?.message;
  return (
    <fieldset className="grid gap-3 sm:col-span-2" data-testid="order-hardware">
      <legend className="mb-1 text-sm font-medium text-hide-900">Hardware</legend>
      {/* The hints sit outside the labels: a radio's name stays its own words ("Matched by kind"), not another field's ("Pattern"). */}
      <div className="flex flex-wrap gap-x-6 gap-y-2">
        <div>
          <label className="flex items-center gap-2 text-sm">
            <input type="radio" value="pattern" aria-describedby={`${hintId}-pattern`} {...register('hardwareFrom')} className="accent-hide-700" />
            Matched by kind
          </label>
          <p id={`${hintId}-pattern`} className="ml-6 text-xs text-hide-600">
            As the pattern: its buckle, rings and rivets from the shop’s hardware list.
          </p>
        </div>
        <div>
          <label className="flex items-center gap-2 text-sm">
            <input
              type="radio"
              value="lines"
              aria-describedby={`${hintId}-lines`}
              {...register('hardwareFrom', {
                onChange: (e: { target: { value: string } }) => {
                  if (e.target.value === 'lines' && lines.length === 0) append({ itemId: '', quantity: 1 });
                },
              })}
              className="accent-hide-700"
            />
            Choose lines
          </label>
          <p id={`${hintId}-lines`} className="ml-6 text-xs text-hide-600">
            Per piece, from the shop’s hardware list.
          </p>
        </div>
      </div>
      {from === 'lines' && (
        <div className="grid gap-3">
          {items.length === 0 && !standards.isPending && <p className="text-sm text-hide-600">The shop’s hardware list is empty; the owner lists hardware on the Shop page.</p>}
          {fields.length === 0 && <p className="text-sm text-hide-600">No hardware: the price counts none.</p>}
          <ul className="grid gap-3">
            {fields.map((f, i) => {
              const chosen = lines[i]?.itemId ?? '';
              const unknown = chosen !== '' && !items.some((h) => h.id === chosen);
              return (
                <li key={f.key} className="grid grid-cols-[minmax(0,1fr)_auto] items-start gap-x-3 gap-y-2 rounded-md border border-hide-200 bg-paper/60 p-3 sm:grid-cols-[minmax(0,1fr)_9.5rem_auto]" data-testid="order-hardware-line">
                  <SelectField label="Hardware item" wrapperClassName="col-span-2 sm:col-span-1" {...register(`hardware.${i}.itemId`)} error={errors.hardware?.[i]?.itemId?.message}>
                    <option value="">Choose an item…</option>
                    {unknown && <option value={chosen}>An item no longer in the shop’s list</option>}
                    {items.map((h) => (
                      <option key={h.id} value={h.id}>
                        {hardwareItemWords(h, unit, currency)}
                      </option>
                    ))}
                  </SelectField>
                  <TextField label="Hardware quantity" type="number" inputMode="numeric" min={1} max={50} step={1} {...register(`hardware.${i}.quantity`)} error={errors.hardware?.[i]?.quantity?.message} />
                  {/* Level with the inputs, below their labels. */}
                  <div className="pt-6">
                    <Button size="sm" variant="ghost" onClick={() => remove(i)} aria-label={`Remove hardware line ${i + 1}`}>
                      Remove
                    </Button>
                  </div>
                </li>
              );
            })}
          </ul>
          {listError && (
            <p role="alert" className="text-sm font-medium text-thread-700">
              {listError}
            </p>
          )}
          <div>
            {fields.length < HARDWARE_LINES_MAX ? (
              <Button size="sm" variant="secondary" onClick={() => append({ itemId: '', quantity: 1 })}>
                Add line
              </Button>
            ) : (
              <p className="text-sm text-hide-600">An order holds at most {HARDWARE_LINES_MAX} hardware lines.</p>
            )}
          </div>
        </div>
      )}
    </fieldset>
  );
}

export function OrderDetailFields<T extends OrderDetailValues>({
  register,
  control,
  errors,
  leathers,
}: {
  register: UseFormRegister<T>;
  control: Control<T>;
  errors: FieldErrors<T>;
  leathers: ShopPricingView['leathers'];
}) {
  // The generic form type still has these names; narrow once for the registrations below.
  const r = register as unknown as UseFormRegister<OrderDetailValues>;
  const c = control as unknown as Control<OrderDetailValues>;
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
      <HardwareFields control={c} register={r} errors={e} />
      <TextAreaField label="Notes" wrapperClassName="sm:col-span-2" {...r('notes')} error={e.notes?.message} />
    </div>
  );
}
