import { Link } from 'react-router-dom';
import { can } from '@shared/permissions';
import { ROLE_LABELS, ROLE_SUMMARIES } from '@shared/roles';
import { Card, PageHeader } from '@/components/ui/page';
import { SafetyNote } from '@/features/cautions/safety-note';
import { useSession } from '@/features/auth/api/get-session';
import { NAV_ITEMS } from '../navigation';

export function OverviewRoute() {
  const { data: user } = useSession();
  if (!user) return null;
  const screens = NAV_ITEMS.filter((item) => item.to !== '/' && can(user.role, item.capability));
  return (
    <>
      <PageHeader
        title={`Good to see you, ${user.name.split(' ')[0]}`}
        subtitle="Gelwright places each recipe on a state map computed from published colloid theory, overlays what your bench observed, and carries candidate recipes through approval."
      />
      <div className="grid gap-5 lg:grid-cols-[2fr_1fr]">
        <Card title="Your role">
          <p className="font-medium">{ROLE_LABELS[user.role]}</p>
          <p className="mt-1 text-sm text-ink-soft">{ROLE_SUMMARIES[user.role]}</p>
          {screens.length > 0 && (
            <ul className="mt-4 grid gap-2 sm:grid-cols-2">
              {screens.map((item) => (
                <li key={item.to} className="rounded-md border border-line p-3">
                  <Link to={item.to} className="font-medium">
                    {item.label}
                  </Link>
                  <p className="text-xs text-ink-soft">{item.description}</p>
                </li>
              ))}
            </ul>
          )}
        </Card>
        <SafetyNote />
      </div>
    </>
  );
}
