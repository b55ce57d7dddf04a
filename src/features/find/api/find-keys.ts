/** Keys under the recipes and observations families, so changes made on other screens refresh what Find shows. */
export const findKeys = {
  search: (q: string) => ['recipes', 'list', { q, pageSize: 25, sort: 'code' }] as const,
  byCode: (code: string) => ['recipes', 'detail', 'code', code] as const,
  observations: (recipe: number) => ['observations', 'list', { recipe, page: 1, pageSize: 50 }] as const,
};
