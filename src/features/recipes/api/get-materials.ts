import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MaterialKind } from '@shared/schemas/materials';
import type { MaterialViews } from '@shared/views/materials';
import { api } from '@/lib/api-client';

/** The live library entries a recipe can use (read-only here; the library screen edits them). */
export const recipeMaterialsQueryOptions = <K extends MaterialKind>(kind: K) =>
  queryOptions({
    // Under the library's own key prefix, so an edit in the library refreshes the recipe form too.
    queryKey: ['materials', kind, 'for-recipes'] as const,
    queryFn: async () => (await api.get<{ items: MaterialViews[K][] }>(`/api/materials/${kind}`)).items,
    staleTime: 60_000,
  });

export const useRecipeMaterials = <K extends MaterialKind>(kind: K) => useQuery(recipeMaterialsQueryOptions(kind));
