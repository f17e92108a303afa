import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { MeResponse } from '@shared/schemas/auth.ts';
import { AcceptInviteSchema } from '@shared/schemas/library.ts';
import { applyServerErrors } from '@/lib/form-errors.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import type { InviteLookup } from '@shared/schemas/library-views.ts';
import { useAcceptInvite } from '../api/queries.ts';

export interface AcceptInviteFormProps {
  token: string;
  lookup: InviteLookup;
  /** Signed in as the invited address: nothing to type. */
  signedInAsInvitee: boolean;
  onJoined: (me: MeResponse) => void | Promise<void>;
}

/** Joins the shop: a new account (name and password), an existing one (its password), or the signed-in one. */
export function AcceptInviteForm({ token, lookup, signedInAsInvitee, onJoined }: AcceptInviteFormProps) {
  const accept = useAcceptInvite(token);
  const [formError, setFormError] = useState<string>();
  const needsName = !signedInAsInvitee && !lookup.accountExists;
  const needsPassword = !signedInAsInvitee;
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(AcceptInviteSchema),
    defaultValues: needsName ? { name: '', password: '' } : needsPassword ? { password: '' } : {},
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(undefined);
    try {
      await onJoined(await accept.mutateAsync(values));
    } catch (err) {
      setFormError(applyServerErrors(err, setError, ['name', 'password']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4" aria-label="Accept the invite">
      {formError && (
        <Notice tone="danger" role="alert">
          {formError}
        </Notice>
      )}
      <TextField label="E-mail" value={lookup.invite.email} readOnly disabled hint="Invites belong to one address." />
      {needsName && <TextField label="Your name" autoComplete="name" {...register('name')} error={formState.errors.name?.message} />}
      {needsPassword && (
        <TextField
          label={lookup.accountExists ? 'Password of your account' : 'Choose a password'}
          type="password"
          autoComplete={lookup.accountExists ? 'current-password' : 'new-password'}
          {...register('password')}
          error={formState.errors.password?.message}
        />
      )}
      <Button type="submit" busy={formState.isSubmitting} className="w-full">
        Join {lookup.invite.shopName}
      </Button>
    </form>
  );
}
