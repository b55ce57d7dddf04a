import { describe, expect, it } from 'vitest';
import { latestSampleHeightMm } from './latest-sample-height';

// The rule is ours (docs/shelf-life.md: a sample's height is the latest recorded among its checks);
// inputs are test data.

describe('latestSampleHeightMm', () => {
  it('takes the height of the oldest-age check that recorded one, whatever the order of the list', () => {
    expect(latestSampleHeightMm([{ ageDays: 14, sampleHeightMm: 42 }, { ageDays: 1, sampleHeightMm: 40 }, { ageDays: 28, sampleHeightMm: null }, { ageDays: 56 }])).toBe(42);
  });

  it('at equal ages takes the later record: the greater observationId, else the later in the list', () => {
    expect(latestSampleHeightMm([{ ageDays: 7, sampleHeightMm: 50, observationId: 9 }, { ageDays: 7, sampleHeightMm: 48, observationId: 4 }])).toBe(50);
    expect(latestSampleHeightMm([{ ageDays: 7, sampleHeightMm: 50 }, { ageDays: 7, sampleHeightMm: 48 }])).toBe(48);
  });

  it('is null when no check recorded a usable height', () => {
    expect(latestSampleHeightMm([])).toBeNull();
    expect(latestSampleHeightMm([{ ageDays: 3, sampleHeightMm: null }, { ageDays: 5, sampleHeightMm: Number.NaN }])).toBeNull();
  });
});
