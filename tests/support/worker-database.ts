// Each vitest worker has its own database (created and migrated by scripts/test.ts), so
// test files in different workers never see each other's rows. Files in one worker run
// one after another and build their own data with unique names (tests/support/builders.ts).
const poolId = Number(process.env.VITEST_POOL_ID ?? '1');
const workers = Number(process.env.TEST_WORKERS ?? '1');
if (!process.env.TEST_DB_PREFIX) {
  throw new Error('API and browser tests need the database that `npm test` starts; run them with npm test');
}
if (!(poolId >= 1 && poolId <= workers)) {
  throw new Error(`vitest worker ${poolId} has no database (only ${workers} were made); keep --maxWorkers=${workers}`);
}
process.env.DB_NAME = `${process.env.TEST_DB_PREFIX}_${poolId}`;
