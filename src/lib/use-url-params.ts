import { useCallback, useRef } from 'react';
import { useSearchParams, type NavigateOptions } from 'react-router-dom';

type Update = URLSearchParams | ((latest: URLSearchParams) => URLSearchParams);

/**
 * The newest query string, which every screen shares (there is one address bar): what was last
 * written, even before the router has rendered it, and what the router shows once it has.
 */
const latest = { seen: '', value: new URLSearchParams(), pending: [] as string[] };

/** Brings `latest` up to the router's parameters, keeping writes the router has not shown yet. */
function sync(params: URLSearchParams) {
  const shown = params.toString();
  if (shown === latest.seen) return;
  latest.seen = shown;
  const landed = latest.pending.indexOf(shown);
  // One of ours arrived: later writes of ours are still on their way. Anything else (back,
  // forward, a link) replaces whatever was pending.
  latest.pending = landed >= 0 ? latest.pending.slice(landed + 1) : [];
  if (latest.pending.length === 0) latest.value = new URLSearchParams(params);
}

/**
 * useSearchParams whose setter always starts from the newest parameters. React Router hands a
 * functional update the parameters of the render that made the setter, so two updates before
 * the next render (an axis, then a theory), or one from a timer, would each undo the other.
 */
export function useUrlParams(): [URLSearchParams, (update: Update, options?: NavigateOptions) => void] {
  const [params, setParams] = useSearchParams();
  sync(params);
  const setter = useRef(setParams);
  setter.current = setParams;
  const update = useCallback((change: Update, options?: NavigateOptions) => {
    const next = typeof change === 'function' ? change(new URLSearchParams(latest.value)) : new URLSearchParams(change);
    latest.value = next;
    latest.pending.push(next.toString());
    setter.current(next, options);
  }, []);
  return [params, update];
}
