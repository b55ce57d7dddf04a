import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { useConfirmPasswordReset } from '@/features/auth/api/password-reset';
import { SetPasswordForm } from '@/features/auth/components/set-password-form';
import { Notice } from '@/components/ui/notice';
import { PublicShell } from '../layout/public-shell';

export function ResetPasswordRoute() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const confirm = useConfirmPasswordReset();
  const navigate = useNavigate();
  return (
    <PublicShell title="Choose a new password">
      {!token ? (
        <Notice tone="error">
          This link is incomplete. <Link to="/forgot-password">Ask for a new one</Link>.
        </Notice>
      ) : (
        <SetPasswordForm
          submitLabel="Save the new password"
          onSubmit={async (password) => {
            await confirm.mutateAsync({ token, password });
            navigate('/sign-in?done=password', { replace: true });
          }}
        />
      )}
    </PublicShell>
  );
}
