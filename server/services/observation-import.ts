import { randomUUID } from 'node:crypto';
import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import { IMPORT_COLUMNS, IMPORT_MAX_ROWS, REQUIRED_IMPORT_COLUMNS, observationFields } from '../../shared/schemas/observations';
import type { ImportReport, ImportRowProblem } from '../../shared/views/observation';
import type { HandlerContext } from '../http/route';
import { ImportBatch, Observation, Programme, Recipe } from '../models';
import { runInWorker } from './heavy-jobs';
import type { ImportCsv } from './import-csv-records';
import { idempotencyKeyOf, keyReused, sha256 } from './idempotency';

type Ctx = HandlerContext<unknown, unknown, unknown>;

interface ParsedRow {
  recipeId: number;
  programmeId: number;
  mixedAt: Date;
  ageDays: number;
  observedState: Observation['observedState'];
  method: Observation['method'];
  storageModulusPa: number | null;
  yieldStressPa: number | null;
  settledHeightPct: number | null;
  sampleHeightMm: number | null;
  notes: string | null;
}

const NUMERIC = { age_days: 'ageDays', storage_modulus_pa: 'storageModulusPa', yield_stress_pa: 'yieldStressPa', settled_height_pct: 'settledHeightPct', sample_height_mm: 'sampleHeightMm' } as const;

/**
 * Validates every row before anything is written: the header, each cell, and that each
 * recipe code names a live recipe. Row numbers count the header as row 1, like a spreadsheet.
 */
export async function validateImport(text: string, transaction: Transaction | null, timeoutMs: number): Promise<{ report: ImportReport; rows: ParsedRow[] }> {
  // Parsed in a worker thread: a file near the upload cap is about a second of CPU.
  const read = await runInWorker<ImportCsv>('importCsv', text, timeoutMs);
  if ('row' in read) return { report: { ok: false, rows: 0, imported: 0, problems: [read] }, rows: [] };
  const problems: ImportRowProblem[] = [];
  const missing = REQUIRED_IMPORT_COLUMNS.filter((c) => !read.header.includes(c));
  for (const column of missing) problems.push({ row: 1, column, message: `The header lacks the column ${column}` });
  const unknown = read.header.filter((h) => !(IMPORT_COLUMNS as readonly string[]).includes(h));
  for (const column of unknown) problems.push({ row: 1, column, message: `Unknown column ${column}; expected ${IMPORT_COLUMNS.join(', ')}` });
  if (read.recordCount === 0) problems.push({ row: 1, column: '', message: 'The file has a header but no rows' });
  if (read.recordCount > IMPORT_MAX_ROWS) problems.push({ row: IMPORT_MAX_ROWS + 2, column: '', message: `At most ${IMPORT_MAX_ROWS} rows per import` });
  if (problems.length) return { report: { ok: false, rows: read.recordCount, imported: 0, problems }, rows: [] };

  const codes = [...new Set(read.records.map((r) => r.recipe_code).filter(Boolean))];
  const recipes = (await Recipe.findAll({
    where: { code: { [Op.in]: codes } },
    attributes: ['id', 'code', 'programmeId', 'archivedAt'],
    include: [{ model: Programme, as: 'programme', attributes: ['id', 'name', 'archivedAt'] }],
    transaction,
  })) as (Recipe & { programme?: Programme })[];
  const byCode = new Map(recipes.map((r) => [r.code, r]));
  const rows: ParsedRow[] = [];
  read.records.forEach((record, index) => {
    const row = index + 2;
    const before = problems.length;
    const fail = (column: string, message: string) => problems.push({ row, column, message });
    const recipe = byCode.get(record.recipe_code);
    if (!record.recipe_code) fail('recipe_code', 'Give the recipe code');
    else if (!recipe) fail('recipe_code', `No recipe has the code ${record.recipe_code}`);
    else if (recipe.archivedAt) fail('recipe_code', `Recipe ${record.recipe_code} is archived`);
    else if (recipe.programme?.archivedAt) fail('recipe_code', `Programme ${recipe.programme.name} of recipe ${record.recipe_code} is archived`);
    const values: Record<string, unknown> = {};
    const check = (column: string, key: keyof typeof observationFields, raw: unknown) => {
      const result = observationFields[key].safeParse(raw);
      if (result.success) values[key] = result.data;
      else fail(column, result.error.issues[0].message);
    };
    check('mixed_on', 'mixedAt', record.mixed_on);
    check('observed_state', 'observedState', record.observed_state?.toLowerCase());
    check('method', 'method', record.method?.toLowerCase());
    for (const [column, key] of Object.entries(NUMERIC)) {
      const cell = record[column] ?? '';
      if (cell === '' && column !== 'age_days') {
        values[key] = null;
        continue;
      }
      const number = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(cell) ? Number(cell) : NaN;
      if (Number.isNaN(number)) fail(column, `${column} must be a number, got "${cell.slice(0, 40)}"`);
      else check(column, key, number);
    }
    check('notes', 'notes', record.notes ?? '');
    if (problems.length === before && recipe) {
      rows.push({
        recipeId: recipe.id,
        programmeId: recipe.programmeId,
        mixedAt: new Date(values.mixedAt as string),
        ageDays: values.ageDays as number,
        observedState: values.observedState as ParsedRow['observedState'],
        method: values.method as ParsedRow['method'],
        storageModulusPa: (values.storageModulusPa as number | null) ?? null,
        yieldStressPa: (values.yieldStressPa as number | null) ?? null,
        settledHeightPct: (values.settledHeightPct as number | null) ?? null,
        sampleHeightMm: (values.sampleHeightMm as number | null) ?? null,
        notes: (values.notes as string | undefined) ?? null,
      });
    }
  });
  const ok = problems.length === 0;
  return { report: { ok, rows: read.records.length, imported: 0, problems }, rows: ok ? rows : [] };
}

/**
 * Imports a whole CSV in the route's transaction, or nothing. With an Idempotency-Key the
 * batch row (which claims the key under a unique index) is written first: a retry, or a
 * concurrent twin, finds it and gets the first answer back instead of a second import.
 */
export async function importObservations(ctx: Ctx, input: { text: string; fileName: string | null; idempotencyKey: string | null; dryRun: boolean }): Promise<{ status: number; report: ImportReport }> {
  const transaction = ctx.transaction;
  const userId = ctx.user!.id;
  const idempotencyKey = idempotencyKeyOf(input.idempotencyKey ?? undefined);
  const contentSha256 = sha256(input.text);
  // The same key with another file is a mistake to report, not a replay of the first import.
  const replay = (batch: ImportBatch) => {
    if (batch.contentSha256 !== null && batch.contentSha256 !== contentSha256) throw keyReused('file');
    return { status: 200, report: { ...batch.report, replayed: true } };
  };
  if (idempotencyKey && !input.dryRun) {
    const earlier = await ImportBatch.findOne({ where: { userId, idempotencyKey }, transaction });
    if (earlier) return replay(earlier);
  }
  const { report, rows } = await validateImport(input.text, transaction, ctx.deps.config.HEAVY_JOB_SECONDS * 1000);
  if (!report.ok) return { status: 422, report };
  if (input.dryRun) return { status: 200, report: { ...report, imported: 0 } };

  const batchId = randomUUID();
  const done: ImportReport = { ...report, imported: rows.length, batchId };
  try {
    await ImportBatch.create(
      { id: batchId, idempotencyKey, userId, fileName: input.fileName, rowCount: rows.length, report: done, contentSha256 },
      { transaction },
    );
  } catch (error) {
    if (error instanceof UniqueConstraintError && idempotencyKey) {
      // A locking read sees the twin's committed row, which this transaction's snapshot does not.
      const twin = await ImportBatch.findOne({ where: { userId, idempotencyKey }, transaction, lock: transaction?.LOCK.SHARE });
      if (twin) return replay(twin);
    }
    throw error;
  }
  for (let start = 0; start < rows.length; start += 500) {
    await Observation.bulkCreate(
      rows.slice(start, start + 500).map((r) => ({
        ...r,
        adhocPhi: null,
        adhocReducedB2: null,
        adhocDescription: null,
        adhocPredictedState: null,
        observerId: userId,
        importBatchId: batchId,
      })),
      { transaction },
    );
  }
  await ctx.audit({ action: 'observation.imported', entityType: 'import_batch', entityId: batchId, details: { rows: rows.length, file: input.fileName } });
  return { status: 201, report: done };
}
