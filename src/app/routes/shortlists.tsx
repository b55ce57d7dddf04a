import { useLocation } from 'react-router-dom';
import { can } from '@shared/permissions';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';
import { useSession } from '@/features/auth/api/get-session';
import { ProgrammeGate, ProgrammePicker, useProgrammeParam } from '@/features/programmes';
import { ShortlistsScreen } from '@/features/shortlists/components/shortlists-screen';

export function ShortlistsRoute() {
  const { data: user } = useSession();
  const selection = useProgrammeParam();
  const location = useLocation();
  const notice = (location.state as { notice?: string } | null)?.notice;
  if (!user) return null;
  return (
    <>
      <PageHeader
        title="Shortlists"
        subtitle="Candidate recipes with a reason for each, carried from draft to a manager's approval before anyone mixes."
        actions={<ProgrammePicker programmes={selection.programmes} value={selection.programmeId} onChange={selection.setProgrammeId} />}
      />
      {notice && (
        <Notice tone="success" className="mb-4">
          {notice}
        </Notice>
      )}
      <ProgrammeGate selection={selection} canCreate={can(user.role, 'programmes.write')}>
        {(programme) => <ShortlistsScreen programme={programme} canWrite={can(user.role, 'shortlists.write')} />}
      </ProgrammeGate>
    </>
  );
}
