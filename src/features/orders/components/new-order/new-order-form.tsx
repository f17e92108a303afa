import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { useQuery } from '@tanstack/react-query';
import { CreateOrderSchema, CustomerSchema, WearerSchema, type OrderFit } from '@shared/schemas/orders.ts';
import type { CustomerView, ShopPricingView } from '@shared/schemas/order-views.ts';
import type { PatternView } from '@shared/schemas/library.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { applyServerErrors } from '@/lib/form-errors.ts';
import { customerQueryOptions, patternChoiceQueryOptions } from '../../api/queries.ts';
import { useCreateCustomerWithWearer, useCreateOrder, useCreateWearer } from '../../api/mutations.ts';
import { ORDER_DETAIL_FIELDS, OrderDetailFields, detailBody } from '../order-detail-fields.tsx';
import { parseInto } from '../zod-to-form.ts';
import { CustomerPicker } from './customer-picker.tsx';
import { FitPicker, latestFor } from './fit-picker.tsx';
import { defaultDueDate, type NewOrderValues } from './new-order-values.ts';

export interface NewOrderFormProps {
  customers: CustomerView[];
  patterns: PatternView[];
  leathers: ShopPricingView['leathers'];
  initial: { customerId?: number; wearerId?: number };
  onCreated: (orderId: number) => void;
}

/**
 * A new order: who it is for (existing or new customer and wearer), which saved pattern,
 * where its girth comes from, and the order's own details. Every part is checked with the
 * shared schemas before anything is sent, so a refusal never leaves half an order behind.
 */
export function NewOrderForm({ customers, patterns, leathers, initial, onCreated }: NewOrderFormProps) {
  const createOrder = useCreateOrder();
  const createBoth = useCreateCustomerWithWearer();
  const [problem, setProblem] = useState<string>();
  const { register, control, handleSubmit, setError, formState, watch } = useForm<NewOrderValues>({
    defaultValues: {
      customerId: initial.customerId ? String(initial.customerId) : '',
      newCustomer: { name: '', email: '', phone: '' },
      wearerId: initial.wearerId ? String(initial.wearerId) : '',
      newWearer: { name: '', kind: 'dog' },
      patternId: '',
      fitFrom: 'later',
      sizeName: '',
      dueDate: defaultDueDate(),
      quantity: 1,
      leatherId: '',
      leatherColour: '',
      leatherFinish: '',
      thread: '',
      notes: '',
      benchMinutes: 60,
      hardwareFrom: 'pattern',
      hardware: [],
    },
  });
  const customerId = watch('customerId');
  const wearerId = watch('wearerId');
  const patternId = watch('patternId');
  const fitFrom = watch('fitFrom');
  const existingCustomer = Number(customerId) > 0 ? Number(customerId) : 0;
  const customer = useQuery({ ...customerQueryOptions(existingCustomer), enabled: existingCustomer > 0 });
  const createWearer = useCreateWearer(existingCustomer);
  const pattern = patterns.find((p) => String(p.id) === patternId);
  const head = useQuery({ ...patternChoiceQueryOptions(pattern?.id ?? 0), enabled: Boolean(pattern) });
  const wearers = customer.data?.wearers ?? [];
  const wearer = wearers.find((w) => String(w.id) === wearerId);
  const latest = pattern && wearer ? latestFor(pattern.kind, wearer.measurements) : null;
  const spec = head.data?.head.spec;
  const email = customerId === 'new' ? watch('newCustomer.email') : (customers.find((c) => String(c.id) === customerId)?.email ?? '');
  const noLinkPossible = Boolean(pattern) && fitFrom === 'later' && Boolean(customerId) && email.trim() === '';

  const onSubmit = handleSubmit(async (v) => {
    setProblem(undefined);
    // Check every part first: nothing is created until the whole order is acceptable.
    let ok = true;
    const refuse = (field: 'customerId' | 'wearerId' | 'patternId', message: string) => {
      setError(field, { message });
      ok = false;
    };
    if (!v.customerId) refuse('customerId', 'Customer is required: choose one or “New customer”');
    const newCustomer = v.customerId === 'new' ? parseInto(CustomerSchema, v.newCustomer, setError, 'newCustomer.') : null;
    if (v.customerId === 'new' && !newCustomer) ok = false;
    const needsWearer = v.customerId === 'new' || v.wearerId === 'new';
    if (v.customerId !== 'new' && v.customerId && !v.wearerId) refuse('wearerId', 'Wearer is required: choose one or “New wearer”');
    const newWearer = needsWearer ? parseInto(WearerSchema, v.newWearer, setError, 'newWearer.') : null;
    if (needsWearer && !newWearer) ok = false;
    if (!v.patternId) refuse('patternId', 'Pattern is required');
    const fit: OrderFit = v.fitFrom === 'size' ? { from: 'size', sizeName: v.sizeName } : v.fitFrom === 'measurement' ? { from: 'measurement', ...(latest ? { measurementId: latest.id } : {}) } : { from: 'later' };
    const draft = { wearerId: 1, patternId: Number(v.patternId) || 1, fit, ...detailBody(v) };
    const checked = parseInto(CreateOrderSchema, draft, setError, '', { 'fit.sizeName': 'sizeName', fit: 'fitFrom' });
    if (!ok || !checked) return;
    try {
      let targetWearer = Number(v.wearerId);
      if (v.customerId === 'new' && newCustomer && newWearer) targetWearer = (await createBoth.mutateAsync({ customer: newCustomer, wearer: newWearer })).wearer.id;
      else if (v.wearerId === 'new' && newWearer) targetWearer = (await createWearer.mutateAsync(newWearer)).id;
      const order = await createOrder.mutateAsync({ ...checked, wearerId: targetWearer, ...(head.data ? { revision: head.data.head.number } : {}) });
      onCreated(order.id);
    } catch (err) {
      setProblem(applyServerErrors(err, setError, [...ORDER_DETAIL_FIELDS, 'sizeName', 'patternId']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-6" aria-label="New order">
      <Panel title="Who it is for">
        <CustomerPicker register={register} errors={formState.errors} customers={customers} customerId={customerId} wearers={wearers} wearerId={wearerId} />
      </Panel>
      <Panel title="What to make">
        {patterns.length === 0 ? (
          <p className="text-sm text-hide-700">The library has no saved pattern yet; a maker or the owner saves one first.</p>
        ) : (
          <FitPicker
            register={register}
            errors={formState.errors}
            patterns={patterns}
            pattern={pattern}
            headNumber={head.data?.head.number}
            sizes={spec?.sizes ?? []}
            unit={spec?.units ?? 'in'}
            latest={latest}
            fitFrom={fitFrom}
          />
        )}
      </Panel>
      {noLinkPossible && (
        <Notice tone="warning" title="No e-mail for the measuring link">
          This customer has no e-mail address, so the order cannot send them a measuring link. Add one, or measure at the bench and add it on the customer’s page.
        </Notice>
      )}
      <Panel title="Details">
        <OrderDetailFields register={register} control={control} errors={formState.errors} leathers={leathers} />
      </Panel>
      {problem && (
        <Notice tone="danger" role="alert" title="The order was not made">
          {problem}
        </Notice>
      )}
      <div>
        <Button type="submit" busy={formState.isSubmitting}>
          Create order
        </Button>
      </div>
    </form>
  );
}
