import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { ROLES, ROLE_LABELS } from '@shared/roles';
import { createInvitationSchema, type CreateInvitationInput } from '@shared/schemas/team';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { SelectInput, TextInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { placeServerError } from '@/lib/form-errors';
import { useCreateInvitation } from '../api/create-invitation';

export function InviteForm() {
  const invite = useCreateInvitation();
  const [result, setResult] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<CreateInvitationInput>({
    resolver: zodResolver(createInvitationSchema),
    defaultValues: { name: '', email: '', role: 'viewer' },
  });
  const submit = handleSubmit(async (values) => {
    setResult(null);
    try {
      const { user } = await invite.mutateAsync(values);
      setResult({ tone: 'success', text: `Invitation sent to ${user.email}. The link is in the outbox too.` });
      reset();
    } catch (error) {
      const message = placeServerError(error, setError, ['name', 'email', 'role']);
      if (message) setResult({ tone: 'error', text: message });
    }
  });
  return (
    <form onSubmit={submit} noValidate className="grid gap-4 md:grid-cols-[1fr_1fr_12rem_auto] md:items-start" aria-label="Invite a person">
      <Field label="Name" error={formState.errors.name?.message}>
        {(props) => <TextInput autoComplete="off" {...props} {...register('name')} />}
      </Field>
      <Field label="E-mail" error={formState.errors.email?.message}>
        {(props) => <TextInput type="email" autoComplete="off" {...props} {...register('email')} />}
      </Field>
      <Field label="Role" error={formState.errors.role?.message}>
        {(props) => (
          <SelectInput {...props} {...register('role')}>
            {ROLES.map((role) => (
              <option key={role} value={role}>
                {ROLE_LABELS[role]}
              </option>
            ))}
          </SelectInput>
        )}
      </Field>
      <div className="md:pt-6">
        <Button type="submit" busy={invite.isPending}>
          Send invitation
        </Button>
      </div>
      {result && (
        <Notice tone={result.tone} className="md:col-span-4">
          {result.text}
        </Notice>
      )}
    </form>
  );
}
