// Entry of a heavy-job worker thread. Plain JavaScript so that it starts the same under tsx,
// vitest or any loader: it registers tsx for this thread, then loads the TypeScript job runner.
import { register } from 'tsx/esm/api';

register();
await import('./heavy-job-runner.ts');
