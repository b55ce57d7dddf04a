import { useNavigate, useParams } from 'react-router-dom';
import { can } from '@shared/permissions';
import type { RecipeInput } from '@shared/schemas/recipes';
import { PageHeader } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import { ErrorState, Loading } from '@/components/ui/states';
import { useSession } from '@/features/auth/api/get-session';
import { SafetyNote } from '@/features/cautions/safety-note';
import { RecipeMiniMap } from '@/features/map/components/recipe-mini-map';
import { ProgrammeGate } from '@/features/programmes/components/programme-gate';
import { useProgrammeParam } from '@/features/programmes/hooks/use-programme-param';
import { useLiveMaterials } from '@/features/library';
import { useRecipe } from '@/features/recipes/api/get-recipe';
import { useSaveRecipe } from '@/features/recipes/api/save-recipe';
import { LiveDerivation } from '@/features/recipes/components/live-derivation';
import { RecipeForm } from '@/features/recipes/components/recipe-form';
import { recipeAsInput } from '@/features/recipes/hooks/use-recipe-map';

function preview(values: RecipeInput) {
  return (
    <>
      <LiveDerivation values={values} renderMap={(map, derived) => <RecipeMiniMap map={map} derived={derived} code="this recipe" height={260} />} />
      <SafetyNote compact />
    </>
  );
}

export function NewRecipeRoute() {
  const { data: user } = useSession();
  const selection = useProgrammeParam();
  const save = useSaveRecipe();
  const navigate = useNavigate();
  const particles = useLiveMaterials('particles');
  const solvents = useLiveMaterials('solvents');
  if (!can(user?.role, 'recipes.write')) return <Notice tone="warning">Only formulators create recipes.</Notice>;
  return (
    <>
      <PageHeader title="New recipe" subtitle="Compose it from the library; Gelwright predicts where it sits while you type." />
      <ProgrammeGate selection={selection} canCreate={can(user?.role, 'programmes.write')}>
        {(programme) =>
          particles.isPending || solvents.isPending ? (
            <Loading label="Loading the library…" />
          ) : !particles.data?.length || !solvents.data?.length ? (
            <Notice tone="warning">Add at least one particle system and one solvent to the library first.</Notice>
          ) : (
            <RecipeForm
              initial={{
                programmeId: programme.id,
                name: '',
                particleId: particles.data[0].id,
                solventId: solvents.data[0].id,
                fraction: { kind: 'volume', value: 0.2 },
                temperatureC: 25,
                attraction: { source: 'none' },
              }}
              submitLabel={`Create in ${programme.name}`}
              onSubmit={async (input) => {
                const recipe = await save.mutateAsync({ input });
                navigate(`/recipes/${recipe.code}`);
              }}
              renderPreview={preview}
            />
          )
        }
      </ProgrammeGate>
    </>
  );
}

export function EditRecipeRoute() {
  const { code = '' } = useParams();
  const { data: user } = useSession();
  const recipe = useRecipe(code.toUpperCase());
  const save = useSaveRecipe();
  const navigate = useNavigate();
  if (!can(user?.role, 'recipes.write')) return <Notice tone="warning">Only formulators edit recipes.</Notice>;
  if (recipe.isPending) return <Loading />;
  if (recipe.isError) return <ErrorState error={recipe.error} retry={() => recipe.refetch()} />;
  return (
    <>
      <PageHeader title={`Edit ${recipe.data.code}`} subtitle="Saving computes the derived parameters again and keeps the change in the audit trail." />
      <RecipeForm
        initial={recipeAsInput(recipe.data)}
        submitLabel="Save changes"
        onSubmit={async (input) => {
          const saved = await save.mutateAsync({ id: recipe.data.id, input });
          navigate(`/recipes/${saved.code}`);
        }}
        renderPreview={preview}
      />
    </>
  );
}
