import { can } from '@shared/permissions';
import { PageHeader } from '@/components/ui/page';
import { useSession } from '@/features/auth/api/get-session';
import { MapScreen } from '@/features/map/components/map-screen';
import { ProgrammeGate, ProgrammePicker, useProgrammeParam } from '@/features/programmes';

export function MapRoute() {
  const { data: user } = useSession();
  const selection = useProgrammeParam();
  return (
    <>
      <PageHeader
        title="State map"
        subtitle="Where the programme's recipes sit on the state diagram computed from published theory, with what the bench observed laid over it."
      />
      <div className="mb-4">
        <ProgrammePicker programmes={selection.programmes} value={selection.programmeId} onChange={selection.setProgrammeId} />
      </div>
      <ProgrammeGate selection={selection} canCreate={can(user?.role, 'programmes.write')}>
        {(programme) => <MapScreen programme={programme} canShortlist={can(user?.role, 'shortlists.write')} />}
      </ProgrammeGate>
    </>
  );
}
