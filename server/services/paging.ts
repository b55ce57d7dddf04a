import type { PageQuery } from '../../shared/schemas/common';

/**
 * The LIMIT and OFFSET of one page of a list (pages count from 1), spread into a
 * `findAndCountAll`: `Model.findAndCountAll({ where, order, ...paged(query) })`.
 */
export function paged(query: PageQuery): { limit: number; offset: number } {
  return { limit: query.pageSize, offset: (query.page - 1) * query.pageSize };
}
