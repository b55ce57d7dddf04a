import { NavLink, Outlet, useNavigate } from 'react-router-dom';
import { can } from '@shared/permissions';
import { ROLE_LABELS } from '@shared/roles';
import { Button } from '@/components/ui/button';
import { useSession } from '@/features/auth/api/get-session';
import { useSignOut } from '@/features/auth/api/sign-out';
import { NAV_ITEMS } from '../navigation';
import { Wordmark } from './wordmark';

/** The signed-in layout: a narrow rail with the screens this role may use, and the page. */
export function AppShell() {
  const { data: user } = useSession();
  const signOut = useSignOut();
  const navigate = useNavigate();
  if (!user) return null;
  const items = NAV_ITEMS.filter((item) => can(user.role, item.capability));
  return (
    <div className="flex min-h-screen">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-panel focus:px-3 focus:py-2">
        Skip to content
      </a>
      <aside className="sticky top-0 flex h-screen w-56 shrink-0 flex-col border-r border-line bg-panel">
        <div className="px-5 pb-4 pt-5">
          <Wordmark />
        </div>
        <nav aria-label="Main" className="flex-1 px-3">
          <ul className="flex flex-col gap-0.5">
            {items.map((item) => (
              <li key={item.to}>
                <NavLink
                  to={item.to}
                  end={item.to === '/'}
                  title={item.description}
                  className={({ isActive }) =>
                    `block rounded-md px-3 py-2 text-sm no-underline hover:no-underline ${isActive ? 'bg-fjord-50 font-semibold text-fjord-700' : 'text-ink-soft hover:bg-paper hover:text-ink'}`
                  }
                >
                  {item.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>
        <div className="border-t border-line px-5 py-4 text-sm">
          <p className="font-medium" data-testid="signed-in-name">{user.name}</p>
          <p className="text-xs text-ink-soft" data-testid="signed-in-role">{ROLE_LABELS[user.role]}</p>
          <Button
            variant="quiet"
            size="sm"
            className="-ml-2.5 mt-2"
            busy={signOut.isPending}
            onClick={async () => {
              await signOut.mutateAsync();
              navigate('/sign-in', { replace: true });
            }}
          >
            Sign out
          </Button>
        </div>
      </aside>
      <main id="main" className="min-w-0 flex-1 px-8 py-7">
        <Outlet />
      </main>
    </div>
  );
}
