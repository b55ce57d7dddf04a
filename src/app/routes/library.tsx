import { useSearchParams } from 'react-router-dom';
import { can } from '@shared/permissions';
import { PageHeader } from '@/components/ui/page';
import { useSession } from '@/features/auth/api/get-session';
import { isMaterialKind, LibraryScreen } from '@/features/library/components/library-screen';
import { LineSources } from '@/features/map/components/line-sources';

export function LibraryRoute() {
  const { data: user } = useSession();
  const [params, setParams] = useSearchParams();
  const raw = params.get('kind');
  const kind = isMaterialKind(raw) ? raw : 'particles';
  if (!user) return null;
  const canWrite = can(user.role, 'materials.write');
  return (
    <>
      <PageHeader
        title="Library"
        subtitle={`The particles, depletants, solvents and salts your recipes are made from. ${
          canWrite ? 'Archiving an entry hides it from new recipes and keeps it on the ones that use it.' : 'Formulators and managers edit the library.'
        }`}
      />
      <LibraryScreen kind={kind} canWrite={canWrite} onKindChange={(next) => setParams({ kind: next }, { replace: true })} />
      <section className="mt-6 rounded-md border border-line bg-panel p-4" aria-label="Where the map's lines come from">
        <LineSources title="How these materials become a state map: where each line comes from" />
      </section>
    </>
  );
}
