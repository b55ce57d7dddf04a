import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MaterialKind } from '@shared/schemas/materials';
import type { MaterialViews } from '@shared/views/materials';
import { api } from '@/lib/api-client';

/** The live library entries a plan can use, with their prices (read-only here). */
export const planMaterialsQueryOptions = <K extends MaterialKind>(kind: K) =>
  queryOptions({
    // Under the library's own key prefix, so an edit in the library refreshes the planner too.
    queryKey: ['materials', kind, 'for-plans'] as const,
    queryFn: async () => (await api.get<{ items: MaterialViews[K][] }>(`/api/materials/${kind}`)).items,
    staleTime: 60_000,
  });

export const usePlanMaterials = <K extends MaterialKind>(kind: K) => useQuery(planMaterialsQueryOptions(kind));
