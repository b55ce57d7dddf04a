import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { ErrorState, Loading } from '@/components/ui/states';
import { useSession } from '@/features/auth/api/get-session';

/** Shows the signed-in area, or sends the visitor to sign in and back afterwards. */
export function RequireSession() {
  const session = useSession();
  const location = useLocation();
  if (session.isPending) return <Loading label="Checking your session…" />;
  if (session.isError) return <div className="p-8"><ErrorState error={session.error} retry={() => session.refetch()} /></div>;
  if (!session.data) return <Navigate to={`/sign-in?next=${encodeURIComponent(location.pathname + location.search)}`} replace />;
  return <Outlet />;
}
