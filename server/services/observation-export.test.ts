import { describe, expect, it } from 'vitest';
import { EXPORTS_AT_ONCE, exportQueue, withExportSlot } from './observation-export';

describe('withExportSlot', () => {
  it(`lets ${EXPORTS_AT_ONCE} exports stream at once across all users and queues the rest in order`, async () => {
    const started: number[] = [];
    const releases: Array<() => void> = [];
    const jobs = Array.from({ length: EXPORTS_AT_ONCE + 2 }, (_, i) =>
      withExportSlot(async () => {
        started.push(i);
        await new Promise<void>((release) => releases.push(release));
        return i;
      }),
    );
    await new Promise((tick) => setImmediate(tick));
    expect(started).toEqual(Array.from({ length: EXPORTS_AT_ONCE }, (_, i) => i));
    expect(exportQueue()).toEqual({ running: EXPORTS_AT_ONCE, waiting: 2 });
    releases[0]();
    await new Promise((tick) => setImmediate(tick));
    expect(started).toEqual([...Array.from({ length: EXPORTS_AT_ONCE }, (_, i) => i), EXPORTS_AT_ONCE]);
    for (let i = 1; i < EXPORTS_AT_ONCE + 2; i++) {
      await new Promise((tick) => setImmediate(tick));
      releases[i]?.();
    }
    await new Promise((tick) => setImmediate(tick));
    releases.forEach((release) => release());
    expect(await Promise.all(jobs)).toEqual(Array.from({ length: EXPORTS_AT_ONCE + 2 }, (_, i) => i));
    expect(exportQueue()).toEqual({ running: 0, waiting: 0 });
  });
});
