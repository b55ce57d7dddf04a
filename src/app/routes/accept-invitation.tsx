import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { ROLE_LABELS } from '@shared/roles';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/states';
import { ApiError } from '@/lib/api-client';
import { useAcceptInvitation, useInvitation } from '@/features/auth/api/invitation';
import { SetPasswordForm } from '@/features/auth/components/set-password-form';
import { PublicShell } from '../layout/public-shell';

export function AcceptInvitationRoute() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const invitation = useInvitation(token);
  const accept = useAcceptInvitation();
  const navigate = useNavigate();
  if (token && invitation.isPending) return <Loading />;
  const problem = !token ? 'This link is incomplete.' : invitation.isError ? (invitation.error instanceof ApiError ? invitation.error.message : 'This link could not be checked.') : null;
  return (
    <PublicShell
      title="Join your team on Gelwright"
      intro={invitation.data && <>Welcome, {invitation.data.name}. You are invited as {ROLE_LABELS[invitation.data.role]} with the address {invitation.data.email}.</>}
    >
      {problem ? (
        <Notice tone="error">
          {problem} <Link to="/sign-in">Go to sign-in</Link>
        </Notice>
      ) : (
        <SetPasswordForm
          submitLabel="Set password and continue"
          onSubmit={async (password) => {
            const { user } = await accept.mutateAsync({ token, password });
            navigate(`/sign-in?done=password&email=${encodeURIComponent(user.email)}`, { replace: true });
          }}
        />
      )}
    </PublicShell>
  );
}
