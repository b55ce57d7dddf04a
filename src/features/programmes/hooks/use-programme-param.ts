import { useCallback } from 'react';
import type { ProgrammeView } from '@shared/views/programme';
import { useProgrammes } from '../api/get-programmes';
import { useUrlParams } from '@/lib/use-url-params';

/** The search parameter that carries the chosen programme, so a copied link opens the same one. */
export const PROGRAMME_PARAM = 'programme';

/** A path with the programme in its query string, for links between screens. */
export function withProgramme(path: string, programmeId: number | null): string {
  if (programmeId === null) return path;
  return `${path}${path.includes('?') ? '&' : '?'}${PROGRAMME_PARAM}=${programmeId}`;
}

export interface ProgrammeSelection {
  /** The programme in use: the one in the URL, else the first live programme by name; null while none is known. */
  programmeId: number | null;
  programme: ProgrammeView | null;
  /** Live programmes, sorted by name. */
  programmes: ProgrammeView[];
  /** Writes the choice to the URL (other parameters stay; `page` is dropped, it belonged to the old list). */
  setProgrammeId: (id: number) => void;
  isPending: boolean;
  error: unknown;
  refetch: () => void;
}

/**
 * Keeps the chosen programme in the URL search parameter `programme`.
 * While the list loads, a programme named in the URL is used at once, so the screen's own
 * queries need not wait; once loaded, an unknown or archived id falls back to the first live one.
 * The fallback is not written back to the URL: the address stays what the person typed or followed.
 */
export function useProgrammeParam(): ProgrammeSelection {
  const [params, setParams] = useUrlParams();
  const programmes = useProgrammes();
  const raw = Number(params.get(PROGRAMME_PARAM));
  const requested = Number.isInteger(raw) && raw > 0 ? raw : null;
  const list = programmes.data?.items ?? [];
  const chosen = programmes.data ? (list.find((p) => p.id === requested) ?? list[0] ?? null) : null;
  const programmeId = programmes.data ? (chosen?.id ?? null) : requested;

  const setProgrammeId = useCallback(
    (id: number) =>
      setParams((previous) => {
        const next = new URLSearchParams(previous);
        next.set(PROGRAMME_PARAM, String(id));
        next.delete('page');
        return next;
      }),
    [setParams],
  );

  return { programmeId, programme: chosen, programmes: list, setProgrammeId, isPending: programmes.isPending, error: programmes.error, refetch: () => void programmes.refetch() };
}
