import { can } from '@shared/permissions';
import { PageHeader } from '@/components/ui/page';
import { useSession } from '@/features/auth/api/get-session';
import { PlannerScreen } from '@/features/planner';
import { ProgrammeGate, ProgrammePicker, useProgrammeParam } from '@/features/programmes';

export function PlanRoute() {
  const { data: user } = useSession();
  const selection = useProgrammeParam();
  return (
    <>
      <PageHeader
        title="Planner"
        subtitle="Start from the state you want: Gelwright searches the compositions of your materials for those predicted to reach it with room to spare, ranks them, and proposes the few samples that would teach the map most."
        actions={<ProgrammePicker programmes={selection.programmes} value={selection.programmeId} onChange={selection.setProgrammeId} />}
      />
      <ProgrammeGate selection={selection} canCreate={can(user?.role, 'programmes.write')}>
        {(programme) => <PlannerScreen key={programme.id} programme={programme} canPlan={can(user?.role, 'plans.write')} />}
      </ProgrammeGate>
    </>
  );
}
