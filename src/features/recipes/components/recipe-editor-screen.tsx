import { useNavigate } from 'react-router-dom';
import type { RecipeInput } from '@shared/schemas/recipes';
import type { ProgrammeView } from '@shared/views/programme';
import type { RecipeView } from '@shared/views/recipe';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/states';
import { SafetyNote } from '@/features/cautions';
import { useLiveMaterials } from '@/features/library';
import { RecipeMiniMap } from '@/features/map';
import { useSaveRecipe } from '../api/save-recipe';
import { recipeAsInput } from '../hooks/use-recipe-map';
import { LiveDerivation } from './live-derivation';
import { RecipeForm } from './recipe-form';

/** The live prediction beside the form, with the safety note. */
function preview(values: RecipeInput) {
  return (
    <>
      <LiveDerivation values={values} renderMap={(map, derived) => <RecipeMiniMap map={map} derived={derived} code="this recipe" height={260} />} />
      <SafetyNote compact />
    </>
  );
}

/** A new recipe in the programme, starting from the library's first particle system and solvent. */
export function NewRecipeScreen({ programme }: { programme: ProgrammeView }) {
  const save = useSaveRecipe();
  const navigate = useNavigate();
  const particles = useLiveMaterials('particles');
  const solvents = useLiveMaterials('solvents');
  if (particles.isPending || solvents.isPending) return <Loading label="Loading the library…" />;
  if (!particles.data?.length || !solvents.data?.length) return <Notice tone="warning">Add at least one particle system and one solvent to the library first.</Notice>;
  return (
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
  );
}

/** A stored recipe in the form; saving derives it again. */
export function EditRecipeScreen({ recipe }: { recipe: RecipeView }) {
  const save = useSaveRecipe();
  const navigate = useNavigate();
  return (
    <RecipeForm
      initial={recipeAsInput(recipe)}
      submitLabel="Save changes"
      onSubmit={async (input) => {
        const saved = await save.mutateAsync({ id: recipe.id, input });
        navigate(`/recipes/${saved.code}`);
      }}
      renderPreview={preview}
    />
  );
}
