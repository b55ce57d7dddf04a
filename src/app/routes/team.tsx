import { useSearchParams } from 'react-router-dom';
import { can } from '@shared/permissions';
import { Card, PageHeader } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import { useSession } from '@/features/auth/api/get-session';
import { AuditTrail } from '@/features/team/components/audit-trail';
import { InviteForm } from '@/features/team/components/invite-form';
import { OutboxPanel } from '@/features/team/components/outbox-panel';
import { PeopleTable } from '@/features/team/components/people-table';

const SECTIONS = [
  { id: 'people', label: 'People' },
  { id: 'audit', label: 'Audit trail' },
  { id: 'outbox', label: 'Outbox' },
] as const;
type SectionId = (typeof SECTIONS)[number]['id'];

export function TeamRoute() {
  const { data: user } = useSession();
  const [params, setParams] = useSearchParams();
  const section = (SECTIONS.find((s) => s.id === params.get('section'))?.id ?? 'people') as SectionId;
  if (!user) return null;
  if (!can(user.role, 'team.manage')) return <Notice tone="warning">Only administrators manage the team.</Notice>;
  return (
    <>
      <PageHeader title="Team" subtitle="Invite people, set their roles, and read what the installation recorded and sent." />
      <div role="tablist" aria-label="Team sections" className="mb-5 inline-flex rounded-md border border-line bg-panel p-1">
        {SECTIONS.map((s) => (
          <button
            key={s.id}
            role="tab"
            type="button"
            aria-selected={section === s.id}
            onClick={() => setParams({ section: s.id })}
            className={`rounded px-4 py-1.5 text-sm ${section === s.id ? 'bg-fjord-500 font-medium text-white' : 'text-ink-soft hover:bg-paper'}`}
          >
            {s.label}
          </button>
        ))}
      </div>
      <div role="tabpanel" aria-label={SECTIONS.find((s) => s.id === section)!.label}>
        {section === 'people' && (
          <div className="flex flex-col gap-5">
            <Card title="Invite a person">
              <InviteForm />
            </Card>
            <PeopleTable me={user} />
          </div>
        )}
        {section === 'audit' && <AuditTrail />}
        {section === 'outbox' && <OutboxPanel />}
      </div>
    </>
  );
}
