import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { CustomerSchema, type CustomerInput } from '@shared/schemas/orders.ts';
import type { CustomerView } from '@shared/schemas/order-views.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextAreaField, TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { applyServerErrors } from '@/lib/form-errors.ts';
import { parseInto } from '../zod-to-form.ts';

type Values = { name: string; email: string; phone: string; notes: string };
const FIELDS = ['name', 'email', 'phone', 'notes'] as const;

/** A customer's name, e-mail, phone and notes: for a new customer, or to change one. */
export function CustomerForm({
  customer,
  submitLabel,
  onSubmit,
  onCancel,
}: {
  customer?: CustomerView;
  submitLabel: string;
  onSubmit: (body: CustomerInput) => Promise<unknown>;
  onCancel?: () => void;
}) {
  const [problem, setProblem] = useState<string>();
  const { register, handleSubmit, setError, formState, reset } = useForm<Values>({
    defaultValues: { name: customer?.name ?? '', email: customer?.email ?? '', phone: customer?.phone ?? '', notes: customer?.notes ?? '' },
  });
  const submit = handleSubmit(async (v) => {
    setProblem(undefined);
    const body = parseInto(CustomerSchema, v, setError);
    if (!body) return;
    try {
      await onSubmit(body);
      if (!customer) reset();
    } catch (err) {
      setProblem(applyServerErrors(err, setError, FIELDS));
    }
  });
  return (
    <form onSubmit={submit} noValidate className="grid gap-3 sm:grid-cols-2" aria-label={submitLabel}>
      <TextField label="Customer name" autoComplete="off" {...register('name')} error={formState.errors.name?.message} />
      <TextField label="E-mail" type="email" autoComplete="off" {...register('email')} error={formState.errors.email?.message} />
      <TextField label="Phone" type="tel" autoComplete="off" {...register('phone')} error={formState.errors.phone?.message} />
      <TextAreaField label="Notes" wrapperClassName="sm:col-span-2" {...register('notes')} error={formState.errors.notes?.message} />
      {problem && (
        <Notice tone="danger" role="alert" className="sm:col-span-2">
          {problem}
        </Notice>
      )}
      <div className="flex gap-2 sm:col-span-2">
        <Button type="submit" busy={formState.isSubmitting}>
          {submitLabel}
        </Button>
        {onCancel && (
          <Button variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
