import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MaterialKind } from '@shared/schemas/materials';
import { getMaterials } from './get-materials';
import { materialKeys, type MaterialFilters } from './material-keys';

const LIVE: MaterialFilters = { archived: 'false' };

/**
 * The live entries of one kind, as the forms that pick a material read them (recipes, plans).
 * The same cache entry as the library screen's live list, so an edit there refreshes every form.
 */
export const liveMaterialsQueryOptions = <K extends MaterialKind>(kind: K) =>
  queryOptions({ queryKey: materialKeys.list(kind, LIVE), queryFn: () => getMaterials(kind, LIVE), select: (answer) => answer.items, staleTime: 60_000 });

export const useLiveMaterials = <K extends MaterialKind>(kind: K) => useQuery(liveMaterialsQueryOptions(kind));
