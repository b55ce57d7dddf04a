import { toQuery } from '@/lib/api-client';
import type { ObservationFilters } from './observation-keys';

/** GET /api/observations/export with the bench log's current filters; the browser downloads the CSV. */
export const observationExportUrl = (filters: ObservationFilters) => `/api/observations/export${toQuery({ ...filters })}`;
