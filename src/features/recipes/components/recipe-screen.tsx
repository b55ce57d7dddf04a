import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { Card, PageHeader } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import { StateBadge } from '@/components/ui/state-badge';
import { ErrorState, Loading } from '@/components/ui/states';
import { ApiError } from '@/lib/api-client';
import { useRecipeObservations } from '@/features/bench';
import { SafetyNote } from '@/features/cautions';
import { RecipeMiniMap, useMapPoints } from '@/features/map';
import { withProgramme } from '@/features/programmes';
import { useProgrammeShelfLife } from '@/features/shelf-life';
import { useArchiveRecipe } from '../api/archive-recipe';
import { useRecipe } from '../api/get-recipe';
import { useRecipeMap } from '../hooks/use-recipe-map';
import { BenchSurvival } from './bench-survival';
import { CheckScheduleForm } from './check-schedule-form';
import { CollapseDrivers } from './collapse-drivers';
import { DerivedPanel } from './derived-panel';
import { nearbyEvidence } from './nearby-evidence';
import { ObservationTimeline } from './observation-timeline';
import { RecipeComposition } from './recipe-composition';
import { ShelfLifePanel } from './shelf-life-panel';
import { SimilarSurvival } from './similar-survival';

/**
 * One recipe: where it sits and why, its shelf life on the bench and among gels like it, what
 * drives collapse, its outcomes by age, its small map, composition and check schedule.
 * `code` as written in the address (any case); `canWrite` edits, archives and restores it;
 * `canSchedule` sets its check schedule.
 */
export function RecipeScreen({ code, canWrite, canSchedule }: { code: string; canWrite: boolean; canSchedule: boolean }) {
  const recipe = useRecipe(code.toUpperCase());
  const observations = useRecipeObservations(recipe.data?.id);
  const map = useRecipeMap(recipe.data);
  const archive = useArchiveRecipe();
  const points = useMapPoints(recipe.data?.programmeId);
  const shelfLife = useProgrammeShelfLife(recipe.data?.programmeId, recipe.data?.id ?? null, recipe.data !== undefined);
  if (recipe.isPending) return <Loading label="Loading the recipe…" />;
  if (recipe.isError) return recipe.error instanceof ApiError && recipe.error.status === 404 ? <Notice tone="warning" title={`No recipe has the code ${code}`}>Check the code, or <Link to="/find">search for it</Link>.</Notice> : <ErrorState error={recipe.error} retry={() => recipe.refetch()} />;
  const r = recipe.data;
  return (
    <>
      <PageHeader
        title={`${r.code} · ${r.name}`}
        subtitle={
          <span className="inline-flex flex-wrap items-center gap-2">
            <StateBadge state={r.derived.predictedState} prefix="Predicted" />
            {r.archived && <span className="text-amber-700">Archived</span>}
            {r.origin?.startsWith('plan:') && <Link to={`/plan?programme=${r.programmeId}&plan=${r.origin.slice(5)}`}>From plan {r.origin.slice(5)}</Link>}
            <span>Created by {r.createdBy?.name ?? 'someone'} · updated {r.updatedAt.slice(0, 10)}</span>
          </span>
        }
        actions={
          <>
            <Link to={withProgramme('/map', r.programmeId)} className="rounded-md border border-line-strong bg-panel px-4 py-2 text-sm no-underline hover:bg-fjord-50 hover:no-underline">
              On the programme map
            </Link>
            {canWrite && !r.archived && (
              <Link to={`/recipes/${r.code}/edit`} className="rounded-md bg-fjord-500 px-4 py-2 text-sm font-medium text-white no-underline hover:bg-fjord-600 hover:no-underline">
                Edit recipe
              </Link>
            )}
            {canWrite && (
              <Button variant="secondary" busy={archive.isPending} onClick={() => archive.mutate({ id: r.id, archived: !r.archived })}>
                {r.archived ? 'Restore' : 'Archive'}
              </Button>
            )}
          </>
        }
      />
      <div className="grid gap-5 xl:grid-cols-[minmax(0,1fr)_minmax(22rem,30rem)]">
        <div className="flex flex-col gap-5">
          <Card title="Where it sits">
            <DerivedPanel derived={r.derived} />
          </Card>
          <Card title="Shelf life">
            <div className="mb-4">
              <BenchSurvival checks={observations.data ?? null} />
            </div>
            <ShelfLifePanel derived={r.derived} evidence={points.data ? nearbyEvidence(r.id, r.derived, points.data) : null} />
          </Card>
          <Card title="Gels like it">
            {shelfLife.isPending ? (
              <Loading label="Pooling the programme's bench…" />
            ) : shelfLife.isError ? (
              <ErrorState error={shelfLife.error} retry={() => shelfLife.refetch()} />
            ) : (
              <SimilarSurvival
                group={shelfLife.data.groups[0] ?? null}
                region={shelfLife.data.regions.find((g) => g.region === shelfLife.data.recipes[0]?.region) ?? null}
                rules={shelfLife.data.rules}
              />
            )}
          </Card>
          <Card title="What drives collapse">
            {shelfLife.isPending ? (
              <Loading label="Fitting what drives collapse…" />
            ) : shelfLife.isError ? (
              <ErrorState error={shelfLife.error} retry={() => shelfLife.refetch()} />
            ) : (
              <CollapseDrivers model={shelfLife.data.drivers} prediction={shelfLife.data.recipes[0]?.predicted?.reading ?? null} predictedState={recipe.data.derived.predictedState} context={shelfLife.data.context} />
            )}
          </Card>
          <Card title="Bench outcomes by age">
            {observations.isPending ? <Loading /> : observations.isError ? <ErrorState error={observations.error} /> : <ObservationTimeline observations={observations.data} />}
          </Card>
        </div>
        <div className="flex flex-col gap-5">
          <Card title="On its state map">
            {map ? (
              <RecipeMiniMap map={map} derived={r.derived} code={r.code} observations={(observations.data ?? []).map((o) => ({ id: o.id, state: o.observedState, ageDays: o.ageDays, agrees: o.agrees }))} />
            ) : (
              <Loading label="Drawing the map…" />
            )}
          </Card>
          <Card title="Composition">
            <RecipeComposition recipe={r} />
          </Card>
          <Card title="Check schedule">
            <CheckScheduleForm recipeId={r.id} canWrite={canSchedule && !r.archived} />
          </Card>
          <SafetyNote />
        </div>
      </div>
    </>
  );
}
