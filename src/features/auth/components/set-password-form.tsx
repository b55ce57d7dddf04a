import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { LIMITS } from '@shared/limits';
import { setPasswordFormSchema, type SetPasswordFormInput } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { placeServerError } from '@/lib/form-errors';

/** Choose a password twice; used by the invitation and the reset pages. */
export function SetPasswordForm({ submitLabel, onSubmit }: { submitLabel: string; onSubmit: (password: string) => Promise<void> }) {
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<SetPasswordFormInput>({
    resolver: zodResolver(setPasswordFormSchema),
    defaultValues: { password: '', repeat: '' },
  });
  const submit = handleSubmit(async ({ password }) => {
    setFormError(null);
    try {
      await onSubmit(password);
    } catch (error) {
      setFormError(placeServerError(error, setError, ['password']));
    }
  });
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4" aria-label="Choose a password">
      {formError && <Notice tone="error">{formError}</Notice>}
      <Field label="New password" hint={`At least ${LIMITS.passwordMin} characters.`} error={formState.errors.password?.message}>
        {(props) => <TextInput type="password" autoComplete="new-password" {...props} {...register('password')} />}
      </Field>
      <Field label="Repeat the password" error={formState.errors.repeat?.message}>
        {(props) => <TextInput type="password" autoComplete="new-password" {...props} {...register('repeat')} />}
      </Field>
      <Button type="submit" busy={formState.isSubmitting}>
        {submitLabel}
      </Button>
    </form>
  );
}
