import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/states';
import { useSession } from '@/features/auth/api/get-session';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { PublicShell } from '../layout/public-shell';

/** Only same-site paths are followed after sign-in, never another host. */
function safeNext(next: string | null) {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : '/';
}

export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const session = useSession();
  const next = safeNext(params.get('next'));
  if (session.isPending) return <Loading />;
  if (session.data) return <Navigate to={next} replace />;
  return (
    <PublicShell title="Sign in" intro="Use the e-mail address your administrator invited.">
      {params.get('done') === 'password' && (
        <Notice tone="success" className="mb-4">
          Your password is set. Sign in with it now.
        </Notice>
      )}
      <SignInForm defaultEmail={params.get('email') ?? ''} onSignedIn={() => navigate(next, { replace: true })} />
    </PublicShell>
  );
}
