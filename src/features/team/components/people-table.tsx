import { useState } from 'react';
import { ROLES, ROLE_LABELS, type Role } from '@shared/roles';
import type { UserView } from '@shared/views/user';
import { Badge } from '@/components/ui/page';
import { Button } from '@/components/ui/button';
import { SelectInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { EmptyState, ErrorState, Loading } from '@/components/ui/states';
import { Table, Td, Th } from '@/components/ui/table';
import { ApiError } from '@/lib/api-client';
import { formatDateTime } from '@/lib/format';
import { useUsers } from '../api/get-users';
import { useUpdateUser } from '../api/update-user';

export function PeopleTable({ me }: { me: UserView }) {
  const users = useUsers();
  const update = useUpdateUser();
  const [message, setMessage] = useState<string | null>(null);
  if (users.isPending) return <Loading label="Loading people…" />;
  if (users.isError) return <ErrorState error={users.error} retry={() => users.refetch()} />;
  if (users.data.items.length === 0) return <EmptyState title="Nobody here yet" />;

  const change = async (user: UserView, input: { role?: Role; active?: boolean }) => {
    setMessage(null);
    try {
      await update.mutateAsync({ id: user.id, ...input });
    } catch (error) {
      setMessage(error instanceof ApiError ? error.message : 'The change was not saved.');
    }
  };

  return (
    <div className="flex flex-col gap-3">
      {message && <Notice tone="error">{message}</Notice>}
      <Table caption="People in this installation">
        <thead>
          <tr>
            <Th>Name</Th>
            <Th>E-mail</Th>
            <Th>Role</Th>
            <Th>Status</Th>
            <Th>Last sign-in</Th>
            <Th>
              <span className="sr-only">Actions</span>
            </Th>
          </tr>
        </thead>
        <tbody>
          {users.data.items.map((user) => (
            <tr key={user.id}>
              <Td className="font-medium">{user.name}</Td>
              <Td>{user.email}</Td>
              <Td>
                <label className="sr-only" htmlFor={`role-${user.id}`}>
                  Role of {user.name}
                </label>
                <SelectInput
                  id={`role-${user.id}`}
                  className="py-1"
                  value={user.role}
                  disabled={update.isPending || user.id === me.id}
                  onChange={(event) => change(user, { role: event.target.value as Role })}
                >
                  {ROLES.map((role) => (
                    <option key={role} value={role}>
                      {ROLE_LABELS[role]}
                    </option>
                  ))}
                </SelectInput>
              </Td>
              <Td>
                {user.invitationPending ? <Badge tone="amber">Invited</Badge> : user.active ? <Badge tone="leaf">Active</Badge> : <Badge tone="brick">Deactivated</Badge>}
              </Td>
              <Td className="text-ink-soft">{user.lastSignInAt ? formatDateTime(user.lastSignInAt) : '—'}</Td>
              <Td className="text-right">
                {!user.invitationPending && user.id !== me.id && (
                  <Button
                    variant={user.active ? 'secondary' : 'quiet'}
                    size="sm"
                    disabled={update.isPending}
                    aria-label={`${user.active ? 'Deactivate' : 'Reactivate'} ${user.name}`}
                    onClick={() => change(user, { active: !user.active })}
                  >
                    {user.active ? 'Deactivate' : 'Reactivate'}
                  </Button>
                )}
              </Td>
            </tr>
          ))}
        </tbody>
      </Table>
    </div>
  );
}
