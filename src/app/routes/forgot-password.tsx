import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link } from 'react-router-dom';
import { requestPasswordResetSchema, type RequestPasswordResetInput } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useRequestPasswordReset } from '@/features/auth/api/password-reset';
import { PublicShell } from '../layout/public-shell';

export function ForgotPasswordRoute() {
  const request = useRequestPasswordReset();
  const { register, handleSubmit, formState } = useForm<RequestPasswordResetInput>({ resolver: zodResolver(requestPasswordResetSchema) });
  return (
    <PublicShell title="Reset your password" intro="We e-mail a link that works once and for an hour.">
      {request.isSuccess ? (
        <Notice tone="success">{request.data.message}</Notice>
      ) : (
        <form onSubmit={handleSubmit((values) => request.mutate(values))} noValidate className="flex flex-col gap-4" aria-label="Request a reset link">
          {request.isError && <Notice tone="error">{request.error instanceof ApiError ? request.error.message : 'Try again.'}</Notice>}
          <Field label="E-mail" error={formState.errors.email?.message}>
            {(props) => <TextInput type="email" autoComplete="username" {...props} {...register('email')} />}
          </Field>
          <Button type="submit" busy={request.isPending}>
            Send the link
          </Button>
        </form>
      )}
      <p className="mt-4 text-sm">
        <Link to="/sign-in">Back to sign-in</Link>
      </p>
    </PublicShell>
  );
}
