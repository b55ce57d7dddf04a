import { setPriority } from 'node:os';
import { parentPort } from 'node:worker_threads';
import { CalibrationRefused, fitCalibration, type CalibrationOptions } from '../../shared/calibration';
import { calibrationObservationsOf, type BenchForFit } from '../../shared/calibration/bench-for-fit';
import { programmeShelfLife, type ShelfLifeRecipeInput, type ShelfLifeSampleInput } from '../../shared/shelf-life';
import { readImportCsv } from '../services/import-csv-records';
import { computePlan, PlanInputProblem, type PlanJob } from '../services/plan-compute';

/**
 * The jobs a worker thread can run: pure computations on data the request thread has read,
 * so a long fit never blocks other requests. Each answers { ok, value } or { ok: false, error }.
 */
const JOBS = {
  calibrationFit: (input: { bench: BenchForFit; options: CalibrationOptions }) => fitCalibration(calibrationObservationsOf(input.bench), input.options),
  plan: (input: PlanJob) => computePlan(input),
  importCsv: (text: string) => readImportCsv(text),
  shelfLife: (input: { recipes: ShelfLifeRecipeInput[]; samples: ShelfLifeSampleInput[]; focusRecipeId?: number }) =>
    programmeShelfLife(input.recipes, input.samples, { focusRecipeId: input.focusRecipeId }),
};
export type HeavyJobName = keyof typeof JOBS;

// On Linux a priority set from a thread applies to that thread only: a long fit yields the CPU to
// the request thread (answering everyone else) whenever both want it. Best effort elsewhere.
try {
  setPriority(19);
} catch {
  // not permitted or not supported: the job still runs, at normal priority
}

// One job per message; the thread stays warm for the next (server/services/heavy-jobs.ts pools it).
parentPort!.on('message', ({ job, input }: { job: HeavyJobName; input: never }) => {
  try {
    parentPort!.postMessage({ ok: true, value: JOBS[job](input) });
  } catch (error) {
    const refused = error instanceof CalibrationRefused ? { reason: error.reason, counts: error.counts } : null;
    const field = error instanceof PlanInputProblem ? error.field : null;
    parentPort!.postMessage({ ok: false, error: { name: (error as Error).name, message: (error as Error).message, refused, field } });
  }
});
