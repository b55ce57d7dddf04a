import { parentPort, workerData } from 'node:worker_threads';
import { CalibrationRefused, fitCalibration, type CalibrationObservation, type CalibrationOptions } from '../../shared/calibration';

/**
 * The jobs a worker thread can run: pure computations on data the request thread has read,
 * so a long fit never blocks other requests. Each answers { ok, value } or { ok: false, error }.
 */
const JOBS = {
  calibrationFit: (input: { observations: CalibrationObservation[]; options: CalibrationOptions }) => fitCalibration(input.observations, input.options),
};
export type HeavyJobName = keyof typeof JOBS;

const { job, input } = workerData as { job: HeavyJobName; input: never };
try {
  parentPort!.postMessage({ ok: true, value: JOBS[job](input) });
} catch (error) {
  const refused = error instanceof CalibrationRefused ? { reason: error.reason, counts: error.counts } : null;
  parentPort!.postMessage({ ok: false, error: { name: (error as Error).name, message: (error as Error).message, refused } });
}
