import type { QueryClient } from '@tanstack/react-query';
import { mapPointKeys } from '@/features/map';
import { shelfLifeKeys } from '@/features/shelf-life';
import { dueCheckKeys } from './due-check-keys';
import { observationKeys } from './observation-keys';

/**
 * Everything a newly recorded outcome changes, asked again: every observation list (the bench
 * log, each recipe's timeline and newest outcomes), the due checks, and the programme's map
 * overlay and shelf-life analysis (every programme's when one is not named, as for an import).
 */
export function observationsChanged(queryClient: QueryClient, programmeId?: number) {
  return Promise.all(
    [
      observationKeys.lists(),
      dueCheckKeys.all,
      programmeId === undefined ? mapPointKeys.all : mapPointKeys.list(programmeId),
      programmeId === undefined ? shelfLifeKeys.all : shelfLifeKeys.programme(programmeId),
    ].map((queryKey) => queryClient.invalidateQueries({ queryKey })),
  );
}
