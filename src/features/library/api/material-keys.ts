import type { MaterialKind } from '@shared/schemas/materials';

export type MaterialFilters = { archived: 'false' | 'all' };

/** Query keys for the material library: one family per kind, listed from general to specific. */
export const materialKeys = {
  all: ['materials'] as const,
  kind: (kind: MaterialKind) => [...materialKeys.all, kind] as const,
  lists: (kind: MaterialKind) => [...materialKeys.kind(kind), 'list'] as const,
  list: (kind: MaterialKind, filters: MaterialFilters) => [...materialKeys.lists(kind), filters] as const,
  details: (kind: MaterialKind) => [...materialKeys.kind(kind), 'detail'] as const,
  detail: (kind: MaterialKind, id: number) => [...materialKeys.details(kind), id] as const,
};
