import { Link } from 'react-router-dom';
import { PREDICTED_STATES, type PredictedState } from '@shared/states';
import type { RecipeView } from '@shared/views/recipe';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { SelectInput, TextInput } from '@/components/ui/inputs';
import { StateBadge } from '@/components/ui/state-badge';
import { EmptyState, ErrorState, Loading } from '@/components/ui/states';
import { Table, Td, Th } from '@/components/ui/table';
import { formatNumber } from '@/lib/format';
import { useRecipes } from '../api/get-recipes';
import type { RecipeFilters } from '../api/recipe-keys';
import { StateOptions } from '@/components/ui/state-options';

type Sort = NonNullable<RecipeFilters['sort']>;

const COLUMNS: { key: Sort | null; label: string; className?: string }[] = [
  { key: 'code', label: 'Code' },
  { key: 'name', label: 'Name' },
  { key: 'phi', label: 'φ', className: 'text-right' },
  { key: null, label: 'B2*', className: 'text-right' },
  { key: 'predictedState', label: 'Predicted' },
  { key: 'margin', label: 'Margin', className: 'text-right' },
  { key: null, label: 'Observations', className: 'text-right' },
];

/** The recipes of a programme with filters, sort by column and paging; the view lives in the URL. */
export function RecipesTable({ filters, onChange }: { filters: RecipeFilters; onChange: (next: RecipeFilters) => void }) {
  const recipes = useRecipes(filters, filters.programme !== undefined);
  const sort = filters.sort ?? 'code';
  const order = filters.order ?? 'asc';
  const setSort = (key: Sort) => onChange({ ...filters, sort: key, order: sort === key && order === 'asc' ? 'desc' : 'asc', page: 1 });
  return (
    <div className="flex flex-col gap-3">
      <form role="search" aria-label="Filter recipes" className="flex flex-wrap items-end gap-3" onSubmit={(e) => e.preventDefault()}>
        <Field label="Search code, name or notes" className="w-72">
          {(props) => <TextInput {...props} type="search" defaultValue={filters.q ?? ''} onChange={(e) => onChange({ ...filters, q: e.target.value || undefined, page: 1 })} />}
        </Field>
        <Field label="Predicted state" className="w-44">
          {(props) => (
            <SelectInput {...props} value={filters.state ?? ''} onChange={(e) => onChange({ ...filters, state: (e.target.value || undefined) as PredictedState | undefined, page: 1 })}>
              <option value="">Any</option>
              <StateOptions states={PREDICTED_STATES} />
            </SelectInput>
          )}
        </Field>
        <Field label="Show" className="w-40">
          {(props) => (
            <SelectInput {...props} value={filters.archived ?? 'false'} onChange={(e) => onChange({ ...filters, archived: e.target.value as RecipeFilters['archived'], page: 1 })}>
              <option value="false">Live recipes</option>
              <option value="true">Archived</option>
              <option value="all">Both</option>
            </SelectInput>
          )}
        </Field>
      </form>
      {recipes.isPending ? (
        <Loading label="Loading recipes…" />
      ) : recipes.isError ? (
        <ErrorState error={recipes.error} retry={() => recipes.refetch()} />
      ) : recipes.data.items.length === 0 ? (
        <EmptyState title="No recipes match">Change the filters, or create the programme's first recipe.</EmptyState>
      ) : (
        <>
          <Table caption="Recipes">
            <thead>
              <tr>
                {COLUMNS.map((c) => (
                  <Th key={c.label} className={c.className} aria-sort={c.key && sort === c.key ? (order === 'asc' ? 'ascending' : 'descending') : undefined}>
                    {c.key ? (
                      <button type="button" className="inline-flex items-center gap-1 uppercase hover:text-ink" onClick={() => setSort(c.key!)}>
                        {c.label}
                        <span aria-hidden>{sort === c.key ? (order === 'asc' ? '▲' : '▼') : '↕'}</span>
                      </button>
                    ) : (
                      c.label
                    )}
                  </Th>
                ))}
              </tr>
            </thead>
            <tbody>
              {recipes.data.items.map((r: RecipeView) => (
                <tr key={r.id} className={r.archived ? 'text-ink-faint' : ''}>
                  <Td className="whitespace-nowrap font-medium">
                    <Link to={`/recipes/${r.code}`}>{r.code}</Link>
                  </Td>
                  <Td>
                    {r.name}
                    {r.archived && <span className="ml-2 text-xs">(archived)</span>}
                  </Td>
                  <Td className="text-right tabular-nums">{formatNumber(r.derived.phi, 3)}</Td>
                  <Td className="text-right tabular-nums">{formatNumber(r.derived.reducedB2, 3)}</Td>
                  <Td>
                    <StateBadge state={r.derived.predictedState} />
                  </Td>
                  <Td className="text-right tabular-nums">{formatNumber(r.derived.margin, 2)}</Td>
                  <Td className="text-right tabular-nums">{r.observationCount ?? 0}</Td>
                </tr>
              ))}
            </tbody>
          </Table>
          <Pager total={recipes.data.total} page={recipes.data.page} pageSize={recipes.data.pageSize} onPage={(page) => onChange({ ...filters, page })} />
        </>
      )}
    </div>
  );
}

function Pager({ total, page, pageSize, onPage }: { total: number; page: number; pageSize: number; onPage: (page: number) => void }) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <nav aria-label="Recipe pages" className="flex items-center gap-3 text-sm">
      <Button variant="secondary" size="sm" disabled={page <= 1} onClick={() => onPage(page - 1)}>
        Previous
      </Button>
      <span className="text-ink-soft">
        Page {page} of {pages} · {total} recipe{total === 1 ? '' : 's'}
      </span>
      <Button variant="secondary" size="sm" disabled={page >= pages} onClick={() => onPage(page + 1)}>
        Next
      </Button>
    </nav>
  );
}
