import { randomBytes } from 'node:crypto';
import { Observation, Recipe } from '../../server/models';
import { seededRandom } from '../../shared/seeded-random';
import type { Client } from '../faults/http-client';
import { load, type LoadFigure } from './api-load';

export interface HeavyLoadFigure {
  observations: number;
  health: LoadFigure;
  fit: { status: number; seconds: number };
  exports: { status: number; seconds: number; bytes: number }[];
}

/**
 * Grows the benchmark programme to `total` observations (inserted in bulk by this process, not
 * through the app), then measures GET /api/health under load while one calibration fit on the
 * whole programme and five full bench-log exports (each client starting its next as soon as one
 * arrives, until the measurement ends) run against the app. Invented data.
 */
export async function healthUnderHeavyJobs(options: {
  url: string; programmeId: number; total: number; scientist: Client; viewer: Client; cookieOf: (c: Client) => string; appCpuSeconds: () => number | null;
}): Promise<HeavyLoadFigure> {
  const recipes = await Recipe.findAll({ where: { programmeId: options.programmeId }, attributes: ['id', 'predictedState'] });
  const have = await Observation.count({ where: { programmeId: options.programmeId } });
  const random = seededRandom(11);
  const observer = (await Observation.findOne({ where: { programmeId: options.programmeId } }))!.observerId;
  for (let start = have; start < options.total; start += 2000) {
    await Observation.bulkCreate(
      Array.from({ length: Math.min(2000, options.total - start) }, () => {
        const recipe = recipes[Math.floor(random() * recipes.length)];
        const flip = random() < 0.2;
        return {
          programmeId: options.programmeId, recipeId: recipe.id, adhocPhi: null, adhocReducedB2: null, adhocDescription: null, adhocPredictedState: null,
          mixedAt: new Date(Date.UTC(2026, Math.floor(random() * 11), 1 + Math.floor(random() * 27))), ageDays: Math.floor(random() * 120),
          observedState: flip ? (recipe.predictedState === 'gel' ? 'fluid' : 'gel') : recipe.predictedState ?? 'fluid',
          method: 'visual' as const, storageModulusPa: null, yieldStressPa: null, settledHeightPct: null, notes: `heavy ${randomBytes(2).toString('hex')}`, observerId: observer, importBatchId: null,
        };
      }),
    );
  }
  const timed = async <T>(work: () => Promise<T>) => {
    const started = performance.now();
    const value = await work();
    return { value, seconds: (performance.now() - started) / 1000 };
  };
  const fit = timed(() => options.scientist.json('POST', `/api/programmes/${options.programmeId}/calibrations`, { parameters: ['attractionShift'], note: 'benchmark' }, {}, 300_000));
  // Five exports kept running for the whole measurement: each client starts its next full export
  // as soon as the last one has arrived, so the health figure never outlasts them.
  let measuring = true;
  const exportOnce = () =>
    timed(async () => {
      const response = await fetch(`${options.url}/api/observations/export?programme=${options.programmeId}`, { headers: { Cookie: options.cookieOf(options.viewer) }, signal: AbortSignal.timeout(300_000) });
      const bytes = (await response.arrayBuffer()).byteLength;
      return { status: response.status, bytes };
    });
  const exports = Array.from({ length: 5 }, async () => {
    const done: Awaited<ReturnType<typeof exportOnce>>[] = [];
    do done.push(await exportOnce());
    while (measuring);
    return done;
  });
  // Let the jobs get going, then load the health route while they run.
  await new Promise((done) => setTimeout(done, 300));
  const health = await load(`GET /api/health during a fit on ${options.total.toLocaleString('en')} observations and five exports`, {
    url: `${options.url}/api/health`, cookie: options.cookieOf(options.viewer), connections: 5, seconds: 8, appCpuSeconds: options.appCpuSeconds,
  });
  measuring = false;
  const fitDone = await fit;
  const exportsDone = (await Promise.all(exports)).flat();
  return {
    observations: options.total,
    health,
    fit: { status: fitDone.value.status, seconds: fitDone.seconds },
    exports: exportsDone.map((e) => ({ status: e.value.status, bytes: e.value.bytes, seconds: e.seconds })),
  };
}
