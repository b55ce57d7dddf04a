import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MaterialKind } from '@shared/schemas/materials';
import type { MaterialViews } from '@shared/views/materials';
import { api, toQuery } from '@/lib/api-client';
import { materialKeys, type MaterialFilters } from './material-keys';

export const getMaterials = <K extends MaterialKind>(kind: K, filters: MaterialFilters) =>
  api.get<{ items: MaterialViews[K][] }>(`/api/materials/${kind}${toQuery(filters)}`);

export const materialsQueryOptions = <K extends MaterialKind>(kind: K, filters: MaterialFilters) =>
  queryOptions({ queryKey: materialKeys.list(kind, filters), queryFn: () => getMaterials(kind, filters) });

export const useMaterials = <K extends MaterialKind>(kind: K, filters: MaterialFilters) => useQuery(materialsQueryOptions(kind, filters));
