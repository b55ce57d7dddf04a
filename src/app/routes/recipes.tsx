import { Link } from 'react-router-dom';
import { can } from '@shared/permissions';
import { PREDICTED_STATES, type PredictedState } from '@shared/states';
import { RECIPE_SORTS } from '@shared/schemas/recipes';
import { PageHeader } from '@/components/ui/page';
import { useSession } from '@/features/auth/api/get-session';
import { ProgrammeGate } from '@/features/programmes/components/programme-gate';
import { ProgrammePicker } from '@/features/programmes/components/programme-picker';
import { useProgrammeParam, withProgramme } from '@/features/programmes/hooks/use-programme-param';
import type { RecipeFilters } from '@/features/recipes/api/recipe-keys';
import { RecipesTable } from '@/features/recipes/components/recipes-table';
import { useUrlParams } from '@/lib/use-url-params';

/** Reads the table's filters from the URL, so a filtered, sorted page can be linked. */
function filtersFrom(params: URLSearchParams, programme: number): RecipeFilters {
  const state = params.get('state');
  const sort = params.get('sort');
  const archived = params.get('archived');
  const page = Number(params.get('page'));
  return {
    programme,
    q: params.get('q') ?? undefined,
    state: PREDICTED_STATES.includes(state as PredictedState) ? (state as PredictedState) : undefined,
    sort: (RECIPE_SORTS as readonly string[]).includes(sort ?? '') ? (sort as RecipeFilters['sort']) : 'code',
    order: params.get('order') === 'desc' ? 'desc' : 'asc',
    archived: archived === 'true' || archived === 'all' ? archived : 'false',
    page: Number.isInteger(page) && page > 0 ? page : 1,
    pageSize: 25,
  };
}

export function RecipesRoute() {
  const { data: user } = useSession();
  const selection = useProgrammeParam();
  const [params, setParams] = useUrlParams();
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
        {(programme) => (
          <RecipesTable
            filters={filtersFrom(params, programme.id)}
            onChange={(next) =>
              setParams((previous) => {
                const out = new URLSearchParams(previous);
                for (const key of ['q', 'state', 'sort', 'order', 'archived', 'page'] as const) {
                  const value = next[key];
                  if (value === undefined || value === '' || (key === 'page' && value === 1)) out.delete(key);
                  else out.set(key, String(value));
                }
                return out;
              })
            }
          />
        )}
      </ProgrammeGate>
    </>
  );
}
