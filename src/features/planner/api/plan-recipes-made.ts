import type { QueryClient } from '@tanstack/react-query';
import { mapPointKeys } from '@/features/map';
import { recipeKeys } from '@/features/recipes';
import { shelfLifeKeys } from '@/features/shelf-life';
import { shortlistKeys } from '@/features/shortlists';
import { planKeys } from './plan-keys';

/** What recipes made from a plan change, asked again: the plan (candidates marked made), recipe lists, shortlists, the map overlay, shelf life. */
export const planRecipesMade = (queryClient: QueryClient, planId: number) =>
  Promise.all(
    [planKeys.detail(planId), planKeys.lists(), recipeKeys.lists(), shortlistKeys.all, mapPointKeys.all, shelfLifeKeys.all].map((queryKey) => queryClient.invalidateQueries({ queryKey })),
  );
