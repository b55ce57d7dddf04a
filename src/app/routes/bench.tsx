import { can } from '@shared/permissions';
import { PageHeader } from '@/components/ui/page';
import { useSession } from '@/features/auth/api/get-session';
import { BenchScreen } from '@/features/bench/components/bench-screen';
import { ProgrammeGate, ProgrammePicker, useProgrammeParam } from '@/features/programmes';

export function BenchRoute() {
  const { data: user } = useSession();
  const selection = useProgrammeParam();
  if (!user) return null;
  const canWrite = can(user.role, 'observations.write');
  return (
    <>
      <PageHeader
        title="Bench log"
        subtitle={`What the bench saw: each outcome beside the state Gelwright predicted for its recipe.${canWrite ? ' Record outcomes one at a time or import a batch from CSV.' : ''}`}
        actions={<ProgrammePicker programmes={selection.programmes} value={selection.programmeId} onChange={selection.setProgrammeId} />}
      />
      <ProgrammeGate selection={selection} canCreate={can(user.role, 'programmes.write')}>
        {(programme) => <BenchScreen programmeId={programme.id} canWrite={canWrite} />}
      </ProgrammeGate>
    </>
  );
}
