import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { CreateInviteSchema } from '@shared/schemas/library.ts';
import { applyServerErrors } from '@/lib/form-errors.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { useCreateInvite } from '../api/mutations.ts';
import { ROLE_OPTIONS } from './role-options.ts';
import { formatWhen } from '@/lib/format-when.ts';

/** Invite someone by e-mail with a role; the server sends the message with a one-time link. */
export function InviteForm() {
  const create = useCreateInvite();
  const [result, setResult] = useState<{ tone: 'success' | 'danger'; text: string }>();
  const { register, handleSubmit, setError, formState, reset } = useForm({
    resolver: zodResolver(CreateInviteSchema),
    defaultValues: { email: '', role: 'maker' as const },
  });

  const onSubmit = handleSubmit(async (v) => {
    setResult(undefined);
    try {
      const sent = await create.mutateAsync(v);
      setResult({ tone: 'success', text: `Invite sent to ${sent.invite.email} as ${sent.invite.role}. The link works once and runs out ${formatWhen(sent.invite.expiresAt)}.` });
      reset({ email: '', role: v.role });
    } catch (err) {
      const rest = applyServerErrors(err, setError, ['email', 'role']);
      if (rest) setResult({ tone: 'danger', text: rest });
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-3" aria-label="Invite someone">
      {result && (
        <Notice tone={result.tone} role={result.tone === 'danger' ? 'alert' : 'status'}>
          {result.text}
        </Notice>
      )}
      <div className="grid gap-3 sm:grid-cols-[2fr_1fr_auto] sm:items-start">
        <TextField label="E-mail to invite" type="email" autoComplete="off" {...register('email')} error={formState.errors.email?.message} />
        <SelectField label="Role" {...register('role')} error={formState.errors.role?.message}>
          {ROLE_OPTIONS.map((r) => (
            <option key={r.value} value={r.value}>
              {r.label}
            </option>
          ))}
        </SelectField>
        <Button type="submit" busy={formState.isSubmitting} className="sm:mt-6">
          Send invite
        </Button>
      </div>
      <p className="text-xs text-hide-600">{ROLE_OPTIONS.map((r) => `${r.label}: ${r.duty}.`).join(' ')}</p>
    </form>
  );
}
