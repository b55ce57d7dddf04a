import { useParams } from 'react-router-dom';
import { can } from '@shared/permissions';
import { PageHeader } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import { ErrorState, Loading } from '@/components/ui/states';
import { useSession } from '@/features/auth/api/get-session';
import { ProgrammeGate, useProgrammeParam } from '@/features/programmes';
import { useRecipe } from '@/features/recipes';
import { EditRecipeScreen, NewRecipeScreen } from '@/features/recipes/components/recipe-editor-screen';

export function NewRecipeRoute() {
  const { data: user } = useSession();
  const selection = useProgrammeParam();
  if (!can(user?.role, 'recipes.write')) return <Notice tone="warning">Only formulators create recipes.</Notice>;
  return (
    <>
      <PageHeader title="New recipe" subtitle="Compose it from the library; Gelwright predicts where it sits while you type." />
      <ProgrammeGate selection={selection} canCreate={can(user?.role, 'programmes.write')}>
        {(programme) => <NewRecipeScreen programme={programme} />}
      </ProgrammeGate>
    </>
  );
}

export function EditRecipeRoute() {
  const { code = '' } = useParams();
  const { data: user } = useSession();
  const recipe = useRecipe(code.toUpperCase());
  if (!can(user?.role, 'recipes.write')) return <Notice tone="warning">Only formulators edit recipes.</Notice>;
  if (recipe.isPending) return <Loading />;
  if (recipe.isError) return <ErrorState error={recipe.error} retry={() => recipe.refetch()} />;
  return (
    <>
      <PageHeader title={`Edit ${recipe.data.code}`} subtitle="Saving computes the derived parameters again and keeps the change in the audit trail." />
      <EditRecipeScreen recipe={recipe.data} />
    </>
  );
}
