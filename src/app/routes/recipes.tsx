import { Link } from 'react-router-dom';
import { can } from '@shared/permissions';
import { PageHeader } from '@/components/ui/page';
import { useSession } from '@/features/auth/api/get-session';
import { ProgrammeGate, ProgrammePicker, useProgrammeParam, withProgramme } from '@/features/programmes';
import { RecipesScreen } from '@/features/recipes/components/recipes-screen';

export function RecipesRoute() {
  const { data: user } = useSession();
  const selection = useProgrammeParam();
  return (
    <>
      <PageHeader
        title="Recipes"
        subtitle="Every composition the programme may mix, with the state Gelwright predicts for it and how far it sits from the nearest boundary."
        actions={
          can(user?.role, 'recipes.write') && selection.programmeId !== null ? (
            <Link to={withProgramme('/recipes/new', selection.programmeId)} className="rounded-md bg-fjord-500 px-4 py-2 text-sm font-medium text-white no-underline hover:bg-fjord-600 hover:no-underline">
              New recipe
            </Link>
          ) : null
        }
      />
      <div className="mb-4">
        <ProgrammePicker programmes={selection.programmes} value={selection.programmeId} onChange={selection.setProgrammeId} />
      </div>
      <ProgrammeGate selection={selection} canCreate={can(user?.role, 'programmes.write')}>
        {(programme) => <RecipesScreen programme={programme} />}
      </ProgrammeGate>
    </>
  );
}
