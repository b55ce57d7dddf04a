import { useParams } from 'react-router-dom';
import { can } from '@shared/permissions';
import { useSession } from '@/features/auth/api/get-session';
import { RecipeScreen } from '@/features/recipes/components/recipe-screen';

export function RecipeDetailRoute() {
  const { code = '' } = useParams();
  const { data: user } = useSession();
  return <RecipeScreen code={code} canWrite={can(user?.role, 'recipes.write')} canSchedule={can(user?.role, 'observations.write')} />;
}
