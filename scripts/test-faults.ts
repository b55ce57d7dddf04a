import { randomBytes } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Op, QueryTypes } from 'sequelize';
import { loadConfig } from '../server/config';
import { createSequelize } from '../server/db';
import { migrateUp } from '../server/migrator';
import { AuditEvent, Depletant, ImportBatch, Observation, ParticleSystem, Programme, Solvent, User } from '../server/models';
import { hashPassword } from '../server/services/passwords';
import { AppProcess } from './faults/app-process';
import { Client } from './faults/http-client';
import { dropDatabases, ensureDatabase, mariaInstance, startMaria, stopMaria } from './lib/mariadb';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const PORT = 4195;
const DB_PORT = 3394;
const instance = mariaInstance(root, 'mariadb-faults', DB_PORT);
const env: Record<string, string> = {
  NODE_ENV: 'test',
  HOST: '127.0.0.1',
  PORT: String(PORT),
  PUBLIC_URL: `http://127.0.0.1:${PORT}`,
  DB_HOST: '127.0.0.1',
  DB_PORT: String(DB_PORT),
  DB_NAME: 'gelwright_faults',
  DB_USER: 'gelwright_faults',
  DB_PASSWORD: randomBytes(18).toString('base64url'),
  DB_POOL_MAX: '30',
  SESSION_SECRET: randomBytes(32).toString('base64url'),
  BCRYPT_COST: '10',
  SIGNIN_LIMIT_PER_ADDRESS: '10000',
  SIGNIN_LIMIT_PER_ACCOUNT: '10000',
  MAIL_CATCHER: 'true',
  SMTP_PORT: '2595',
  DATA_DIR: '.data/faults-files',
};

interface Finding {
  scenario: string;
  tried: string;
  outcome: string;
  held: boolean;
}
const findings: Finding[] = [];
const record = (scenario: string, tried: string, outcome: string, held: boolean) => {
  findings.push({ scenario, tried, outcome, held });
  console.log(`${held ? 'held  ' : 'FAILED'} ${scenario}: ${tried} → ${outcome}`);
};
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
const PASSWORD = 'fault-run-password';

async function prepare() {
  await startMaria(instance);
  dropDatabases(instance, [env.DB_NAME]);
  ensureDatabase(instance, { databases: [env.DB_NAME], user: env.DB_USER, password: env.DB_PASSWORD });
  const sequelize = createSequelize(loadConfig({ ...process.env, ...env }));
  await migrateUp(sequelize);
  const hash = await hashPassword(PASSWORD, 10);
  const make = (role: User['role'], email: string) => User.create({ email, name: email.split('@')[0], role, passwordHash: hash, active: true, lastSignInAt: null, invitedBy: null });
  await make('formulator', 'form@faults.example');
  await make('scientist', 'sci@faults.example');
  for (let i = 1; i <= 3; i++) await make('manager', `manager${i}@faults.example`);
  const programme = await Programme.create({ name: 'Fault run', goalState: 'gel', attractionSource: 'depletion', codePrefix: 'FLT', notes: null, createdBy: null });
  const particle = await ParticleSystem.create({ name: 'Spheres 100 nm', coreMaterial: 'silica', radiusNm: 100, polydispersityPct: 5, densityGcm3: 2, stabilisation: 'steric', surfacePotentialMv: null, hamakerZj: null, pricePerKg: null, notes: null, createdBy: null });
  const polymer = await Depletant.create({ name: 'PEG 20k', molarMassKgMol: 20, rgNm: null, rgPrefactorNm: 0.0215, rgExponent: 0.583, pricePerKg: null, notes: null, createdBy: null });
  const water = await Solvent.create({ name: 'Water', viscosityMPas: 0.89, densityGcm3: 0.997, temperatureC: 25, relativePermittivity: 78.4, pricePerKg: null, notes: null, createdBy: null });
  await sequelize.close();
  return { programmeId: programme.id, particleId: particle.id, depletantId: polymer.id, solventId: water.id };
}

function csvFor(codes: string[], rows: number, tag: string) {
  const lines = ['recipe_code,mixed_on,age_days,observed_state,method,storage_modulus_pa,yield_stress_pa,settled_height_pct,notes'];
  for (let i = 0; i < rows; i++) lines.push(`${codes[i % codes.length]},2026-11-0${1 + (i % 9)},${i % 60},gel,visual,,,,${tag} row ${i}`);
  return lines.join('\n') + '\n';
}

/** 20 clients write while the database is killed with SIGKILL and restarted. */
async function databaseCrash(app: AppProcess, codes: string[], recipeIds: number[]) {
  const scenario = 'database kill -9 under load';
  const ackedObservations = new Set<number>();
  const ackedBatches = new Map<string, number>();
  // Writes whose client saw an error (5xx, dropped connection, timeout) on some attempt: the note or
  // key names each, so the database can say afterwards which of them had committed all the same.
  const erroredObservationNotes = new Set<string>();
  const erroredBatchKeys = new Set<string>();
  let replayedAfterError = 0;
  const acknowledgedWrites = new Set<string>();
  const pendingKeys = new Set<string>();
  const statuses = { before: new Map<number, number>(), down: new Map<number, number>(), after: new Map<number, number>() };
  let phase: keyof typeof statuses = 'before';
  let stop = false;
  const count = (status: number) => statuses[phase].set(status, (statuses[phase].get(status) ?? 0) + 1);
  const clients = await Promise.all(Array.from({ length: 20 }, () => new Client(app.url).signIn('sci@faults.example', PASSWORD)));
  const workers = clients.map(async (client, index) => {
    let n = 0;
    while (!stop) {
      n++;
      if (index % 2 === 0) {
        // Retried with its Idempotency-Key until acknowledged: a write that committed while its
        // client saw an error comes back as a replay, never as a second observation.
        const notes = `client ${index} write ${n}`;
        const key = `single-${index}-${n}-${randomBytes(4).toString('hex')}`;
        let errored = false;
        for (let attempt = 0; attempt < 60 && !stop; attempt++) {
          const response = await client.json('POST', '/api/observations', { recipeId: recipeIds[n % recipeIds.length], mixedAt: '2026-11-05', ageDays: n % 30, observedState: 'gel', method: 'visual', notes }, { 'Idempotency-Key': key });
          count(response.status);
          if (response.status === 201) {
            ackedObservations.add(response.body.observation.id);
            acknowledgedWrites.add(notes);
            if (errored && response.replayed) replayedAfterError++;
            break;
          }
          if (response.status >= 500 || response.status <= 0) {
            errored = true;
            erroredObservationNotes.add(notes);
          }
          await sleep(200);
        }
      } else {
        // A batch is retried with its key until it is acknowledged, as a careful client would.
        const key = `crash-${index}-${n}-${randomBytes(4).toString('hex')}`;
        pendingKeys.add(key);
        const csv = csvFor(codes, 10, key);
        for (let attempt = 0; attempt < 60 && !stop; attempt++) {
          const response = await client.upload('/api/observations/import', csv, { 'Idempotency-Key': key });
          count(response.status);
          if (response.status === 201 || response.status === 200) {
            ackedBatches.set(response.body.report.batchId, response.body.report.imported);
            pendingKeys.delete(key);
            acknowledgedWrites.add(key);
            if (erroredBatchKeys.has(key) && response.body.report.replayed) replayedAfterError++;
            break;
          }
          if (response.status >= 500 || response.status <= 0) erroredBatchKeys.add(key);
          await sleep(200);
        }
      }
    }
  });
  await sleep(2500);
  const pid = Number(readFileSync(instance.pidFile, 'utf8').trim());
  process.kill(pid, 'SIGKILL');
  phase = 'down';
  const downAt = Date.now();
  await sleep(4000);
  await startMaria(instance);
  const upAt = Date.now();
  let recoveredAt = 0;
  while (Date.now() - upAt < 15_000) {
    const health = await fetch(`${app.url}/api/health`, { signal: AbortSignal.timeout(2000) }).catch(() => null);
    if (health?.status === 200) {
      recoveredAt = Date.now();
      break;
    }
    await sleep(100);
  }
  phase = 'after';
  await sleep(3000);
  stop = true;
  await Promise.all(workers);

  const down = statuses.down;
  const fivehundreds = [...down.entries()].filter(([s]) => s >= 500 && s !== 503).reduce((a, [, n]) => a + n, 0);
  const hangs = (down.get(-1) ?? 0) + (statuses.after.get(-1) ?? 0);
  record(scenario, `${[...down.values()].reduce((a, b) => a + b, 0)} requests while the database was down (${Math.round((upAt - downAt) / 1000)} s)`, `503: ${down.get(503) ?? 0}, other 5xx: ${fivehundreds}, timeouts: ${hangs}`, fivehundreds === 0 && hangs === 0 && (down.get(503) ?? 0) > 0);
  record(scenario, 'recovery without restarting the app', recoveredAt ? `healthy ${((recoveredAt - upAt) / 1000).toFixed(1)} s after the database returned` : 'not healthy within 15 s', recoveredAt > 0 && recoveredAt - upAt < 5000);
  record(scenario, 'writes after recovery', `${statuses.after.get(201) ?? 0} acknowledged`, (statuses.after.get(201) ?? 0) > 0);

  const sequelize = createSequelize(loadConfig({ ...process.env, ...env }));
  const present = await Observation.count({ where: { id: { [Op.in]: [...ackedObservations] } } });
  record(scenario, `${ackedObservations.size} acknowledged single observations`, `${present} present after restart`, present === ackedObservations.size);
  const batchRows = await sequelize.query<{ id: string; n: number }>('SELECT b.id, b.row_count AS expected, COUNT(o.id) AS n FROM import_batches b LEFT JOIN observations o ON o.import_batch_id = b.id GROUP BY b.id, b.row_count', { type: QueryTypes.SELECT });
  const half = (batchRows as unknown as { id: string; expected: number; n: number }[]).filter((b) => Number(b.n) !== Number(b.expected));
  const ackedPresent = [...ackedBatches.entries()].filter(([id, rows]) => (batchRows as unknown as { id: string; n: number }[]).some((b) => b.id === id && Number(b.n) === rows)).length;
  record(scenario, `${ackedBatches.size} acknowledged CSV batches (${batchRows.length} stored)`, `${ackedPresent} complete, ${half.length} half-imported`, ackedPresent === ackedBatches.size && half.length === 0);
  const duplicates = await sequelize.query<{ k: string; n: number }>("SELECT idempotency_key AS k, COUNT(*) AS n FROM import_batches WHERE idempotency_key LIKE 'crash-%' GROUP BY idempotency_key HAVING COUNT(*) > 1", { type: QueryTypes.SELECT });
  record(scenario, 'retried batches (same Idempotency-Key)', `${duplicates.length} keys imported twice`, duplicates.length === 0);

  // Writes that committed although their client saw an error: a retry answered as a replay
  // (the first attempt had committed), or a write the client gave up on that is in the database.
  const notes = [...erroredObservationNotes].filter((n) => !acknowledgedWrites.has(n));
  const abandonedSingles = notes.length
    ? (await sequelize.query<{ notes: string }>('SELECT DISTINCT notes FROM observations WHERE notes IN (:notes)', { replacements: { notes }, type: QueryTypes.SELECT })).length
    : 0;
  const keys = [...erroredBatchKeys].filter((k) => !acknowledgedWrites.has(k));
  const abandonedBatches = keys.length ? await ImportBatch.count({ where: { idempotencyKey: { [Op.in]: keys } } }) : 0;
  const committedDespiteError = replayedAfterError + abandonedSingles + abandonedBatches;
  record(
    scenario,
    `writes whose client saw an error (${erroredObservationNotes.size} single observations, ${erroredBatchKeys.size} batches)`,
    `${committedDespiteError} had committed all the same: ${replayedAfterError} came back as a replay on retry, ${abandonedSingles + abandonedBatches} given up by the client but stored`,
    true,
  );
  const singleDuplicates = await sequelize.query<{ notes: string }>("SELECT notes FROM observations WHERE notes LIKE 'client % write %' GROUP BY notes HAVING COUNT(*) > 1", { type: QueryTypes.SELECT });
  record(scenario, 'retried single observations (same Idempotency-Key)', `${singleDuplicates.length} written twice`, singleDuplicates.length === 0);
  await sequelize.close();
}

/** The app is killed with SIGKILL while a large import runs; the client retries with the same key. */
async function appCrash(app: AppProcess, codes: string[]) {
  const scenario = 'app kill -9 during an import';
  let unanswered = 0;
  let committedUnanswered = 0;
  for (const delay of [20, 150, 600, 2500]) {
    const key = `appkill-${delay}-${randomBytes(4).toString('hex')}`;
    const csv = csvFor(codes, 3000, key);
    const client = await new Client(app.url).signIn('sci@faults.example', PASSWORD);
    const first = client.upload('/api/observations/import', csv, { 'Idempotency-Key': key });
    await sleep(delay);
    await app.kill9();
    const firstAnswer = await first;
    await app.start();
    const retryClient = await new Client(app.url).signIn('sci@faults.example', PASSWORD);
    const retry = await retryClient.upload('/api/observations/import', csv, { 'Idempotency-Key': key });
    const sequelize = createSequelize(loadConfig({ ...process.env, ...env }));
    const batches = await ImportBatch.findAll({ where: { idempotencyKey: key } });
    const rows = batches.length ? await Observation.count({ where: { importBatchId: { [Op.in]: batches.map((b) => b.id) } } }) : 0;
    await sequelize.close();
    const held = batches.length === 1 && rows === 3000 && (retry.status === 200 || retry.status === 201);
    if (firstAnswer.status <= 0 || firstAnswer.status >= 500) {
      unanswered++;
      if (retry.body?.report?.replayed) committedUnanswered++;
    }
    record(scenario, `kill after ${delay} ms (first answer ${firstAnswer.status || 'none'}), retry`, `retry ${retry.status}${retry.body?.report?.replayed ? ' (replayed)' : ''}; ${batches.length} batch, ${rows} rows`, held);
  }
  record(scenario, `imports whose client got no answer or an error (${unanswered})`, `${committedUnanswered} had committed all the same and came back as a replay, without a second batch`, true);
}

/** 50 approvals and returns fired at once at the same submitted shortlists. */
async function concurrentDecisions(app: AppProcess, programmeId: number, recipeIds: number[]) {
  const scenario = 'concurrent approvals and returns';
  const author = await new Client(app.url).signIn('form@faults.example', PASSWORD);
  const ids: number[] = [];
  for (let i = 0; i < 8; i++) {
    const created = await author.json('POST', '/api/shortlists', { programmeId, title: `Race ${i}`, targetState: 'gel', items: [{ recipeId: recipeIds[i % recipeIds.length], reason: 'race' }] });
    await author.json('POST', `/api/shortlists/${created.body.shortlist.id}/submit`);
    ids.push(created.body.shortlist.id);
  }
  const managers = await Promise.all([1, 2, 3].map((i) => new Client(app.url).signIn(`manager${i}@faults.example`, PASSWORD)));
  const calls = Array.from({ length: 50 }, (_, i) => ({ id: ids[i % ids.length], action: i % 3 === 0 ? 'return' : 'approve', manager: managers[i % 3] }));
  const answers = await Promise.all(calls.map((c) => c.manager.json('POST', `/api/shortlists/${c.id}/${c.action}`, c.action === 'return' ? { comment: 'race' } : {})));
  const committed = answers.filter((a) => a.status === 200).length;
  const conflicts = answers.filter((a) => a.status === 409).length;
  const other = answers.length - committed - conflicts;
  record(scenario, '50 decisions on 8 submitted shortlists at once', `${committed} committed, ${conflicts} answered 409, ${other} other`, other === 0 && committed === ids.length);
  const sequelize = createSequelize(loadConfig({ ...process.env, ...env }));
  const audits = await AuditEvent.count({ where: { entityType: 'shortlist', entityId: { [Op.in]: ids.map(String) }, action: { [Op.in]: ['shortlist.approved', 'shortlist.returned'] } } });
  await sequelize.close();
  record(scenario, 'audit events for the decisions', `${audits} audit events for ${committed} commits`, audits === committed);
}

async function main() {
  console.log('faults: preparing a private MariaDB on port', DB_PORT);
  const ids = await prepare();
  const app = new AppProcess(root, env);
  await app.start();
  let code = 1;
  try {
    const formulator = await new Client(app.url).signIn('form@faults.example', PASSWORD);
    const recipes: { id: number; code: string }[] = [];
    for (const grams of [2, 5, 8, 12]) {
      const created = await formulator.json('POST', '/api/recipes', { programmeId: ids.programmeId, name: `Fault recipe ${grams}`, particleId: ids.particleId, solventId: ids.solventId, fraction: { kind: 'volume', value: 0.2 }, temperatureC: 25, attraction: { source: 'depletion', depletantId: ids.depletantId, concentrationGL: grams } });
      if (created.status !== 201) throw new Error(`could not create a recipe: ${created.status} ${JSON.stringify(created.body)}`);
      recipes.push(created.body.recipe);
    }
    await databaseCrash(app, recipes.map((r) => r.code), recipes.map((r) => r.id));
    await appCrash(app, recipes.map((r) => r.code));
    await concurrentDecisions(app, ids.programmeId, recipes.map((r) => r.id));
    console.log('\n| scenario | what was tried | what happened | held |\n|---|---|---|---|');
    for (const f of findings) console.log(`| ${f.scenario} | ${f.tried} | ${f.outcome} | ${f.held ? 'yes' : '**no**'} |`);
    const failed = findings.filter((f) => !f.held).length;
    console.log(`\n${findings.length - failed} passed, ${failed} failed`);
    code = failed === 0 ? 0 : 1;
  } finally {
    await app.stop();
    await stopMaria(instance);
  }
  process.exit(code);
}

main().catch(async (error) => {
  console.error(`faults: ${error instanceof Error ? error.stack : error}`);
  await stopMaria(instance).catch(() => {});
  console.log('0 passed, 1 failed');
  process.exit(1);
});
