import { Worker } from 'node:worker_threads';
import { HttpError, tooManyRequests } from '../errors';
import type { HeavyJobName } from '../workers/heavy-job-runner';

const ENTRY = new URL('../workers/heavy-job-entry.mjs', import.meta.url);

/** Heavy jobs (fits, plans, exports) running per user in this process. */
const running = new Map<number, number>();

/**
 * Holds one of the user's heavy-job slots while `work` runs: at most `limit` at once per user,
 * so one person cannot tie up the server's threads and database connections (429 beyond it).
 */
export async function withHeavyJobSlot<T>(userId: number, limit: number, work: () => Promise<T>): Promise<T> {
  const now = running.get(userId) ?? 0;
  if (now >= limit) throw tooManyRequests(`You have ${now} heavy ${now === 1 ? 'job' : 'jobs'} (fits, plans, exports) running; wait for one to finish`);
  running.set(userId, now + 1);
  try {
    return await work();
  } finally {
    const left = (running.get(userId) ?? 1) - 1;
    if (left <= 0) running.delete(userId);
    else running.set(userId, left);
  }
}

export class HeavyJobFailed extends Error {
  constructor(message: string, readonly refused: { reason: string; counts: unknown } | null) {
    super(message);
  }
}

/**
 * Runs a pure computation in a worker thread (the request thread stays free for everyone
 * else) and stops it after `timeoutMs` with a 503 that says so.
 */
export function runInWorker<T>(job: HeavyJobName, input: unknown, timeoutMs: number): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const worker = new Worker(ENTRY, { workerData: { job, input } });
    let settled = false;
    const settle = (fn: () => void) => {
      if (settled) return;
      settled = true;
      clearTimeout(timer);
      fn();
      void worker.terminate();
    };
    const timer = setTimeout(
      () => settle(() => reject(new HttpError(503, 'job_timed_out', `The computation took longer than ${Math.round(timeoutMs / 1000)} s and was stopped; try fewer observations or a narrower request`))),
      timeoutMs,
    );
    worker.once('message', (message: { ok: true; value: T } | { ok: false; error: { name: string; message: string; refused: { reason: string; counts: unknown } | null } }) =>
      settle(() => (message.ok ? resolve(message.value) : reject(new HeavyJobFailed(message.error.message, message.error.refused)))),
    );
    worker.once('error', (error) => settle(() => reject(error)));
    worker.once('exit', (code) => settle(() => reject(new Error(`heavy-job worker stopped with code ${code}`))));
  });
}
