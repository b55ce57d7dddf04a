/** A tiny session-holding HTTP client for the fault runs (plain fetch, cookie kept by hand). */
export class Client {
  private cookie = '';
  constructor(readonly base: string) {}

  async signIn(email: string, password: string) {
    const response = await fetch(`${this.base}/api/session`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email, password }) });
    if (response.status !== 201) throw new Error(`sign-in failed: ${response.status}`);
    this.cookie = (response.headers.get('set-cookie') ?? '').split(';')[0];
    return this;
  }

  async json(method: string, path: string, body?: unknown, headers: Record<string, string> = {}, timeoutMs = 15_000) {
    const started = performance.now();
    try {
      const response = await fetch(`${this.base}${path}`, {
        method,
        headers: { Cookie: this.cookie, ...(body !== undefined ? { 'Content-Type': 'application/json' } : {}), ...headers },
        body: body === undefined ? undefined : JSON.stringify(body),
        signal: AbortSignal.timeout(timeoutMs),
      });
      const text = await response.text();
      return { status: response.status, body: text ? safeJson(text) : null, ms: performance.now() - started, replayed: response.headers.get('idempotent-replayed') === 'true' };
    } catch (error) {
      const name = (error as Error).name;
      return { status: name === 'TimeoutError' ? -1 : 0, body: null, ms: performance.now() - started, replayed: false };
    }
  }

  async upload(path: string, csv: string, headers: Record<string, string> = {}, timeoutMs = 30_000) {
    const form = new FormData();
    form.append('file', new Blob([csv], { type: 'text/csv' }), 'batch.csv');
    const started = performance.now();
    try {
      const response = await fetch(`${this.base}${path}`, { method: 'POST', headers: { Cookie: this.cookie, ...headers }, body: form, signal: AbortSignal.timeout(timeoutMs) });
      const text = await response.text();
      return { status: response.status, body: text ? safeJson(text) : null, ms: performance.now() - started };
    } catch (error) {
      return { status: (error as Error).name === 'TimeoutError' ? -1 : 0, body: null, ms: performance.now() - started };
    }
  }
}

function safeJson(text: string): any {
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
}
