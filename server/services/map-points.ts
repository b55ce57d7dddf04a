import { gzipSync } from 'node:zlib';
import { createHash } from 'node:crypto';
import { QueryTypes, type Sequelize } from 'sequelize';
import { inverseStickinessFromReducedB2 } from '../../shared/physics/attraction/inverse-stickiness-from-reduced-b2';
import type { ObservedState, PredictedState } from '../../shared/states';
import { MAP_OBSERVATION_COLUMNS, MAP_RECIPE_COLUMNS } from '../../shared/views/map-points';
import type { MapPoints } from '../../shared/views/map-points';
import type { RecipeDerived } from '../../shared/views/recipe';
import { onProgrammeWritten } from '../models/write-events';

const inverseTauFromB2 = (b2: number | null) => (b2 === null || b2 >= 1 ? null : inverseStickinessFromReducedB2(b2));
/** Six significant digits: far finer than any map can show, and a third of the bytes. */
const short = (v: number | null | undefined) => (v === null || v === undefined || !Number.isFinite(v) ? null : Number(v.toPrecision(6)));

/** Everything the map overlays for a programme, read with two plain queries (no model objects). */
export async function buildMapPoints(sequelize: Sequelize, programmeId: number): Promise<MapPoints> {
  const recipes = await sequelize.query<{ id: number; code: string; name: string; derived: string | RecipeDerived }>(
    'SELECT id, code, name, derived FROM recipes WHERE programme_id = ? AND archived_at IS NULL ORDER BY id',
    { replacements: [programmeId], type: QueryTypes.SELECT },
  );
  const recipeRows = recipes.map((r) => {
    const d = (typeof r.derived === 'string' ? JSON.parse(r.derived) : r.derived) as RecipeDerived;
    return [r.id, r.code, r.name, short(d.phi), short(d.reducedB2), short(d.stickiness ? 1 / d.stickiness : inverseTauFromB2(d.reducedB2)), short(d.contactEnergyKT), short(d.polymerReservoir), short(d.sizeRatio), d.predictedState, short(d.margin)];
  });
  const observations = await sequelize.query<{
    id: number; recipe_id: number | null; adhoc_phi: number | null; adhoc_reduced_b2: number | null; adhoc_predicted_state: PredictedState | null;
    observed_state: ObservedState; age_days: number;
  }>(
    `SELECT o.id, o.recipe_id, o.adhoc_phi, o.adhoc_reduced_b2, o.adhoc_predicted_state, o.observed_state, o.age_days
       FROM observations o LEFT JOIN recipes r ON r.id = o.recipe_id
      WHERE o.programme_id = ? AND o.archived_at IS NULL AND (r.id IS NULL OR r.archived_at IS NULL)
      ORDER BY o.id`,
    { replacements: [programmeId], type: QueryTypes.SELECT },
  );
  // An observation of a recipe sits where its recipe sits and shares its prediction: it is sent
  // as its first four columns, and the client fills in the rest from the recipe's row. Only
  // ad-hoc samples carry their own coordinates and prediction.
  const observationRows = observations.map((o) =>
    o.recipe_id !== null
      ? [o.id, o.recipe_id, o.observed_state, o.age_days]
      : [o.id, null, o.observed_state, o.age_days, short(o.adhoc_phi), short(o.adhoc_reduced_b2), short(inverseTauFromB2(o.adhoc_reduced_b2)), null, null, o.adhoc_predicted_state],
  );
  return {
    programmeId,
    recipes: { columns: MAP_RECIPE_COLUMNS, rows: recipeRows },
    observations: { columns: MAP_OBSERVATION_COLUMNS, rows: observationRows },
  };
}

/**
 * What changed last in a programme: the newest id and update time of its recipes and
 * observations, and the last change of its calibrations (accepting or withdrawing one
 * re-predicts the recipes without touching their update time). Rows are never deleted, so any
 * insert or update moves it.
 * Null when the programme does not exist.
 */
async function programmeVersion(sequelize: Sequelize, programmeId: number): Promise<string | null> {
  const [row] = await sequelize.query<Record<string, unknown>>(
    `SELECT (SELECT COUNT(*) FROM programmes WHERE id = :p) AS pe,
            (SELECT MAX(id) FROM recipes WHERE programme_id = :p) AS ri, (SELECT MAX(updated_at) FROM recipes WHERE programme_id = :p) AS ru,
            (SELECT MAX(id) FROM observations WHERE programme_id = :p) AS oi, (SELECT MAX(updated_at) FROM observations WHERE programme_id = :p) AS ou,
            (SELECT MAX(updated_at) FROM calibrations WHERE programme_id = :p) AS cu`,
    { replacements: { p: programmeId }, type: QueryTypes.SELECT },
  );
  return Number(row.pe) === 0 ? null : JSON.stringify(row);
}

export interface CachedMapPoints {
  etag: string;
  json: Buffer;
  gzip: Buffer;
}

/**
 * Answers kept at most this long even when nothing seems to have changed: only an update by
 * another process to an older row within the same millisecond as the latest change escapes the
 * version check. Rebuilding costs the event loop some 150 ms for a large programme, so it is rare.
 */
const MAX_AGE_MS = 10 * 60_000;
/**
 * For this long an answer is served without asking the database whether the programme
 * changed: any write committed through this process drops the cache at once, so only writes
 * through other processes can be this late to show.
 */
const TRUST_MS = 250;
const cache = new Map<number, CachedMapPoints & { version: string; at: number; checkedAt: number }>();
/** Per programme, moves on with every committed write to it, so a build that started before the write is not kept. */
const generations = new Map<number, number>();
onProgrammeWritten((programmeId) => {
  generations.set(programmeId, (generations.get(programmeId) ?? 0) + 1);
  cache.delete(programmeId);
  inFlight.delete(programmeId);
});

/** Work in flight per programme, so that twenty requests arriving together check and build once. */
const inFlight = new Map<number, Promise<CachedMapPoints | null>>();

/**
 * The overlay of a programme, built once per change and kept in memory as JSON and gzip, so the
 * map of a large programme costs a version check rather than 10,000 rows of work per request.
 * Requests that arrive while a check or a build is running wait for it instead of starting their own.
 */
export function cachedMapPoints(sequelize: Sequelize, programmeId: number): Promise<CachedMapPoints | null> {
  const recent = cache.get(programmeId);
  if (recent && Date.now() - recent.checkedAt < TRUST_MS) return Promise.resolve(recent);
  const running = inFlight.get(programmeId);
  if (running) return running;
  const work: Promise<CachedMapPoints | null> = checkOrBuild(sequelize, programmeId).finally(() => {
    if (inFlight.get(programmeId) === work) inFlight.delete(programmeId);
  });
  inFlight.set(programmeId, work);
  return work;
}

async function checkOrBuild(sequelize: Sequelize, programmeId: number): Promise<CachedMapPoints | null> {
  const generation = generations.get(programmeId) ?? 0;
  const version = await programmeVersion(sequelize, programmeId);
  if (version === null) return null;
  const hit = cache.get(programmeId);
  if (hit && hit.version === version && Date.now() - hit.at < MAX_AGE_MS) {
    hit.checkedAt = Date.now();
    return hit;
  }
  const json = Buffer.from(JSON.stringify(await buildMapPoints(sequelize, programmeId)));
  const entry = { version, at: Date.now(), checkedAt: Date.now(), json, gzip: gzipSync(json, { level: 6 }), etag: `"${createHash('sha1').update(json).digest('base64url')}"` };
  // A write committed while this was being read may not be in it: answer with it, keep it not.
  if (generation === (generations.get(programmeId) ?? 0)) {
    cache.set(programmeId, entry);
    if (cache.size > 100) cache.delete(cache.keys().next().value!);
  }
  return entry;
}
