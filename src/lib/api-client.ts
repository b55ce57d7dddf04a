/** An answer from the API that was not a success, with the server's stable error id. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly id: string,
    message: string,
    readonly field?: string,
    readonly issues?: { path: string; message: string }[],
  ) {
    super(message);
  }
}

type Json = Record<string, unknown> | unknown[];

async function request<T>(method: string, path: string, body?: Json | FormData, extraHeaders: Record<string, string> = {}): Promise<T> {
  const isForm = typeof FormData !== 'undefined' && body instanceof FormData;
  let response: Response;
  try {
    response = await fetch(path, {
      method,
      credentials: 'same-origin',
      headers: { ...(body && !isForm ? { 'Content-Type': 'application/json', Accept: 'application/json' } : { Accept: 'application/json' }), ...extraHeaders },
      body: body === undefined ? undefined : isForm ? (body as FormData) : JSON.stringify(body),
    });
  } catch {
    throw new ApiError(0, 'network', 'Gelwright could not reach the server. Check your connection and try again.');
  }
  if (response.status === 204) return undefined as T;
  const type = response.headers.get('content-type') ?? '';
  const payload = type.includes('application/json') ? await response.json().catch(() => null) : null;
  if (!response.ok) {
    const error = payload?.error;
    throw new ApiError(
      response.status,
      error?.id ?? 'http_' + response.status,
      error?.message ?? `The server answered ${response.status}`,
      error?.field,
      error?.issues,
    );
  }
  return payload as T;
}

/** The one way the client talks to the API: JSON over same-origin fetch, session in a cookie. */
export const api = {
  get: <T>(path: string) => request<T>('GET', path),
  /** `headers` for the few routes that read one, such as an Idempotency-Key. */
  post: <T>(path: string, body?: Json | FormData, headers?: Record<string, string>) => request<T>('POST', path, body ?? {}, headers),
  patch: <T>(path: string, body: Json) => request<T>('PATCH', path, body),
  put: <T>(path: string, body: Json) => request<T>('PUT', path, body),
  delete: <T>(path: string) => request<T>('DELETE', path),
};

/** Builds a query string, leaving out empty values. */
export function toQuery(params: Record<string, string | number | boolean | undefined | null>): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value !== undefined && value !== null && value !== '') search.set(key, String(value));
  }
  const text = search.toString();
  return text ? `?${text}` : '';
}
