import { useCallback } from 'react';
import { OBSERVATION_METHODS, OBSERVED_STATES, type ObservationMethod, type ObservedState } from '@shared/states';
import type { ObservationFilters } from '../api/observation-keys';
import { useUrlParams } from '@/lib/use-url-params';

/** What the filter controls show; kept in the URL so a copied link opens the same slice of the log. */
export interface BenchFilterValues {
  state: ObservedState | '';
  method: ObservationMethod | '';
  disagreeing: boolean;
  minAge: string;
  maxAge: string;
}

const ageOrUndefined = (text: string) => (text.trim() === '' || !Number.isFinite(Number(text)) || Number(text) < 0 ? undefined : Number(text));

export function useBenchFilters(programmeId: number) {
  const [params, setParams] = useUrlParams();
  const state = params.get('state');
  const method = params.get('method');
  const values: BenchFilterValues = {
    state: OBSERVED_STATES.includes(state as ObservedState) ? (state as ObservedState) : '',
    method: OBSERVATION_METHODS.includes(method as ObservationMethod) ? (method as ObservationMethod) : '',
    disagreeing: params.get('disagreeing') === 'true',
    minAge: params.get('minAge') ?? '',
    maxAge: params.get('maxAge') ?? '',
  };
  const page = Math.max(1, Math.floor(Number(params.get('page')) || 1));
  const filters: ObservationFilters = {
    programme: programmeId,
    state: values.state || undefined,
    method: values.method || undefined,
    disagreeing: values.disagreeing ? 'true' : undefined,
    minAgeDays: ageOrUndefined(values.minAge),
    maxAgeDays: ageOrUndefined(values.maxAge),
  };

  /** Changing a filter goes back to the first page; the programme and other parameters stay. */
  const change = useCallback(
    (patch: Partial<BenchFilterValues>) =>
      setParams(
        (previous) => {
          const next = new URLSearchParams(previous);
          const keys: Record<keyof BenchFilterValues, string> = { state: 'state', method: 'method', disagreeing: 'disagreeing', minAge: 'minAge', maxAge: 'maxAge' };
          for (const [key, value] of Object.entries(patch) as [keyof BenchFilterValues, string | boolean][]) {
            if (value === '' || value === false) next.delete(keys[key]);
            else next.set(keys[key], value === true ? 'true' : String(value));
          }
          next.delete('page');
          return next;
        },
        { replace: true },
      ),
    [setParams],
  );
  const setPage = useCallback(
    (nextPage: number) =>
      setParams((previous) => {
        const next = new URLSearchParams(previous);
        if (nextPage <= 1) next.delete('page');
        else next.set('page', String(nextPage));
        return next;
      }),
    [setParams],
  );
  const clear = useCallback(() => change({ state: '', method: '', disagreeing: false, minAge: '', maxAge: '' }), [change]);
  return { values, filters, page, change, setPage, clear };
}
