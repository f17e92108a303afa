import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { WEARER_KINDS, WEARER_KIND_LABELS, WearerSchema, type WearerKind } from '@shared/schemas/orders.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { applyServerErrors } from '@/lib/form-errors.ts';
import { useCreateWearer } from '../../api/mutations.ts';
import { parseInto } from '../zod-to-form.ts';

/** Adds a wearer (a dog, a cat, a person…) to a customer. */
export function WearerForm({ customerId }: { customerId: number }) {
  const create = useCreateWearer(customerId);
  const [problem, setProblem] = useState<string>();
  const { register, handleSubmit, setError, formState, reset } = useForm<{ name: string; kind: WearerKind; notes: string }>({
    defaultValues: { name: '', kind: 'dog', notes: '' },
  });
  const submit = handleSubmit(async (v) => {
    setProblem(undefined);
    const body = parseInto(WearerSchema, v, setError);
    if (!body) return;
    try {
      await create.mutateAsync(body);
      reset();
    } catch (err) {
      setProblem(applyServerErrors(err, setError, ['name', 'kind', 'notes']));
    }
  });
  return (
    <form onSubmit={submit} noValidate className="grid gap-3 sm:grid-cols-[2fr_1fr_auto] sm:items-start" aria-label="Add a wearer">
      <TextField label="Wearer name" autoComplete="off" {...register('name')} error={formState.errors.name?.message} />
      <SelectField label="Wearer is a" {...register('kind')} error={formState.errors.kind?.message}>
        {WEARER_KINDS.map((k) => (
          <option key={k} value={k}>
            {WEARER_KIND_LABELS[k]}
          </option>
        ))}
      </SelectField>
      <Button type="submit" variant="secondary" busy={formState.isSubmitting} className="sm:mt-6">
        Add wearer
      </Button>
      {problem && (
        <Notice tone="danger" role="alert" className="sm:col-span-3">
          {problem}
        </Notice>
      )}
    </form>
  );
}
