import { PREDICTED_STATES, type PredictedState } from '@shared/states';
import { RECIPE_SORTS } from '@shared/schemas/recipes';
import type { ProgrammeView } from '@shared/views/programme';
import { useUrlParams } from '@/lib/use-url-params';
import type { RecipeFilters } from '../api/recipe-keys';
import { RecipesTable } from './recipes-table';

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

/** A programme's recipes, filtered and sorted as the address says. */
export function RecipesScreen({ programme }: { programme: ProgrammeView }) {
  const [params, setParams] = useUrlParams();
  return (
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
  );
}
