import type { PageQuery } from '../../shared/schemas/common';
import type { Page } from '../../shared/views/page';

/** One page of a list as the API answers it: the presented items, the total, and which page. */
export function presentPage<T>(query: PageQuery, items: T[], total: number): Page<T> {
  return { items, total, page: query.page, pageSize: query.pageSize };
}
