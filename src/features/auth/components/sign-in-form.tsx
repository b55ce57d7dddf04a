import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { signInSchema, type SignInInput } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { placeServerError } from '@/lib/form-errors';
import { useSignIn } from '../api/sign-in';

export function SignInForm({ defaultEmail = '', onSignedIn }: { defaultEmail?: string; onSignedIn: () => void }) {
  const signIn = useSignIn();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<SignInInput>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: defaultEmail, password: '' },
  });
  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await signIn.mutateAsync(values);
      onSignedIn();
    } catch (error) {
      setFormError(placeServerError(error, setError, []));
    }
  });
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4" aria-label="Sign in">
      {formError && <Notice tone="error">{formError}</Notice>}
      <Field label="E-mail" error={formState.errors.email?.message}>
        {(props) => <TextInput type="email" autoComplete="username" {...props} {...register('email')} />}
      </Field>
      <Field label="Password" error={formState.errors.password?.message}>
        {(props) => <TextInput type="password" autoComplete="current-password" {...props} {...register('password')} />}
      </Field>
      <Button type="submit" busy={signIn.isPending}>
        Sign in
      </Button>
      <p className="text-sm text-ink-soft">
        <Link to="/forgot-password">Forgot your password?</Link>
      </p>
    </form>
  );
}
