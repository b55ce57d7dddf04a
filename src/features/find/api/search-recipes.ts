import { useQuery } from '@tanstack/react-query';
import { recipesQueryOptions } from '@/features/recipes';

/** Recipes of every programme whose code, name or notes contain the text (nothing is asked for no text). */
export const useRecipeSearch = (q: string) => useQuery({ ...recipesQueryOptions({ q, pageSize: 25, sort: 'code' }), enabled: q.trim().length > 0 });
