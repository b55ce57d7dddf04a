import { describe, expect, it } from 'vitest';
import { gelModuliFromChecks } from './gel-moduli-from-checks';

describe('gelModuliFromChecks', () => {
  it('keeps only gel checks after mixing with G′ measured (log age needs age > 0)', () => {
    expect(
      gelModuliFromChecks([
        { ageDays: 7, observedState: 'gel', storageModulusPa: 120 },
        { ageDays: 0, observedState: 'gel', storageModulusPa: 80 },
        { ageDays: 14, observedState: 'collapsed', storageModulusPa: 5 },
        { ageDays: 14, observedState: 'gel', storageModulusPa: null },
        { ageDays: 28, observedState: 'fluid', storageModulusPa: 1 },
        { ageDays: 28, observedState: 'gel', storageModulusPa: 150 },
      ]),
    ).toEqual([{ ageDays: 7, storageModulusPa: 120 }, { ageDays: 28, storageModulusPa: 150 }]);
  });
});
