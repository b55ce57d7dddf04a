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

/** A job's own refusal, carried back from the worker: a calibration refused, or a request field the physics cannot use. */
export class HeavyJobFailed extends Error {
  constructor(message: string, readonly refused: { reason: string; counts: unknown } | null, readonly field: string | null) {
    super(message);
  }
}

/** Idle warm workers (starting one costs ~0.5 s of loading); more than this are ended when done. */
const IDLE_WORKERS = 2;
const idle: Worker[] = [];

function takeWorker(): Worker {
  const warm = idle.pop();
  if (warm) {
    warm.ref();
    return warm;
  }
  return new Worker(ENTRY);
}

const dropWhenExited = new WeakMap<Worker, () => void>();

function giveBack(worker: Worker) {
  if (idle.length >= IDLE_WORKERS) return void worker.terminate();
  // An idle worker must not keep the process alive, and one that dies while idle is dropped.
  worker.unref();
  if (!dropWhenExited.has(worker)) {
    const drop = () => {
      const at = idle.indexOf(worker);
      if (at >= 0) idle.splice(at, 1);
    };
    dropWhenExited.set(worker, drop);
    worker.on('exit', drop);
  }
  idle.push(worker);
}

/** Starts a worker ahead of the first heavy job (the server does this at start-up). */
export function warmHeavyJobWorker() {
  if (idle.length === 0) giveBack(new Worker(ENTRY));
}

type WorkerAnswer<T> = { ok: true; value: T } | { ok: false; error: { name: string; message: string; refused: { reason: string; counts: unknown } | null; field: string | null } };

/**
 * Runs a pure computation in a worker thread (the request thread stays free for everyone
 * else) and stops it after `timeoutMs` with a 503 that says so; the worker is then ended, not
 * reused.
 */
export function runInWorker<T>(job: HeavyJobName, input: unknown, timeoutMs: number): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const worker = takeWorker();
    let settled = false;
    const settle = (fn: () => void, reusable: boolean) => {
      if (settled) return;
      settled = true;
      clearTimeout(timer);
      worker.off('message', onMessage);
      worker.off('error', onError);
      worker.off('exit', onExit);
      fn();
      if (reusable) giveBack(worker);
      else void worker.terminate();
    };
    const timer = setTimeout(
      () => settle(() => reject(new HttpError(503, 'job_timed_out', `The computation took longer than ${Math.round(timeoutMs / 1000)} s and was stopped; try fewer observations or a narrower request`)), false),
      timeoutMs,
    );
    const onMessage = (message: WorkerAnswer<T>) =>
      settle(() => (message.ok ? resolve(message.value) : reject(new HeavyJobFailed(message.error.message, message.error.refused, message.error.field))), true);
    const onError = (error: Error) => settle(() => reject(error), false);
    const onExit = (code: number) => settle(() => reject(new Error(`heavy-job worker stopped with code ${code}`)), false);
    worker.on('message', onMessage);
    worker.on('error', onError);
    worker.on('exit', onExit);
    worker.postMessage({ job, input });
  });
}
