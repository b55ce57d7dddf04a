import autocannon from 'autocannon';

export interface LoadFigure {
  name: string;
  requestsPerSecond: number;
  p50: number;
  p99: number;
  errors: number;
  non2xx: number;
  /** CPU the app process spent per answered request, in ms (null when it could not be read). */
  appCpuMsPerRequest: number | null;
}

/** One autocannon run on loopback: `connections` clients for `seconds`, as fast as the server answers. */
export async function load(
  name: string,
  options: { url: string; method?: 'GET' | 'POST'; body?: string; cookie: string; connections?: number; seconds?: number; appCpuSeconds?: () => number | null },
): Promise<LoadFigure> {
  const cpuBefore = options.appCpuSeconds?.() ?? null;
  const result = await autocannon({
    url: options.url,
    method: options.method ?? 'GET',
    body: options.body,
    // Sent as a browser would: the client asks for gzip, so the server may answer compressed.
    headers: { cookie: options.cookie, 'accept-encoding': 'gzip', ...(options.body ? { 'content-type': 'application/json' } : {}) },
    connections: options.connections ?? 20,
    duration: options.seconds ?? 8,
  });
  const cpuAfter = options.appCpuSeconds?.() ?? null;
  const answered = result.requests.total;
  const appCpuMsPerRequest = cpuBefore !== null && cpuAfter !== null && answered > 0 ? ((cpuAfter - cpuBefore) * 1000) / answered : null;
  return { name, requestsPerSecond: result.requests.average, p50: result.latency.p50, p99: result.latency.p99, errors: result.errors, non2xx: result.non2xx, appCpuMsPerRequest };
}
