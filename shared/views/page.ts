/** One page of a list the API answers with; `page` counts from 1. */
export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}
