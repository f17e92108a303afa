import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { PASSWORD_MIN_CHARS, SignUpSchema } from '@shared/schemas/auth.ts';
import { applyServerErrors } from '@/lib/form-errors.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { useSignUp } from '../api/mutations.ts';

export function SignUpForm({ onSignedUp }: { onSignedUp: () => void }) {
  const signUp = useSignUp();
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(SignUpSchema),
    defaultValues: { name: '', shopName: '', email: '', password: '' },
  });
  const { errors } = formState;

  const onSubmit = handleSubmit(async (values) => {
    setFormError(undefined);
    try {
      await signUp.mutateAsync(values);
      onSignedUp();
    } catch (err) {
      setFormError(applyServerErrors(err, setError, ['email', 'password', 'name', 'shopName']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4" aria-label="Create your shop">
      {formError && (
        <Notice tone="danger" role="alert">
          {formError}
        </Notice>
      )}
      <TextField label="Your name" autoComplete="name" {...register('name')} error={errors.name?.message} />
      <TextField
        label="Shop name"
        autoComplete="organization"
        hint="Shown to everyone you invite."
        {...register('shopName')}
        error={errors.shopName?.message}
      />
      <TextField label="E-mail" type="email" autoComplete="email" {...register('email')} error={errors.email?.message} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_CHARS} characters; a phrase of a few words works well.`}
        {...register('password')}
        error={errors.password?.message}
      />
      <Button type="submit" busy={formState.isSubmitting} className="mt-2 w-full">
        Create shop and sign in
      </Button>
    </form>
  );
}
