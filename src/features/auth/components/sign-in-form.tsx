import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { SignInSchema } from '@shared/schemas/auth.ts';
import { applyServerErrors } from '@/lib/form-errors.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { useSignIn } from '../api/mutations.ts';

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(SignInSchema),
    defaultValues: { email: '', password: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(undefined);
    try {
      await signIn.mutateAsync(values);
      onSignedIn();
    } catch (err) {
      setFormError(applyServerErrors(err, setError, ['email', 'password']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4" aria-label="Sign in">
      {formError && (
        <Notice tone="danger" role="alert">
          {formError}
        </Notice>
      )}
      <TextField label="E-mail" type="email" autoComplete="email" {...register('email')} error={formState.errors.email?.message} />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        {...register('password')}
        error={formState.errors.password?.message}
      />
      <Button type="submit" busy={formState.isSubmitting} className="mt-2 w-full">
        Sign in
      </Button>
    </form>
  );
}
