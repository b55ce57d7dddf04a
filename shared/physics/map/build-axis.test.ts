import { describe, expect, it } from 'vitest';
import { asakuraOosawaReducedB2 } from '../attraction/asakura-oosawa-reduced-b2';
import { allNumbers } from '../test-support/map-builders';
import { expectArgumentError, expectRelative } from '../test-support/expect-relative';
import { depletionPolymerForB2 } from './build-axis';
import { buildStateMap } from './build-state-map';

describe('depletionPolymerForB2', () => {
  it('inverts the Asakura–Oosawa B2* (a consistency check of the root finder)', () => {
    expectRelative(depletionPolymerForB2(0.5, asakuraOosawaReducedB2(0.5, 1)), 1, 1e-9);
    expectRelative(depletionPolymerForB2(0.05, asakuraOosawaReducedB2(0.05, 0.3)), 0.3, 1e-9);
  });

  it('needs no polymer for B2* at or above the hard-sphere value 1 (depletion only attracts)', () => {
    expect(depletionPolymerForB2(0.5, 1)).toBe(0);
    expect(depletionPolymerForB2(0.5, 5)).toBe(0);
  });

  it('names b2, not the size ratio, when the target lies beyond a 600 kT contact attraction', () => {
    expectArgumentError(() => depletionPolymerForB2(0.5, -1e300), 'b2');
  });
});

describe('buildStateMap with large negative attraction shifts on a depletion map', () => {
  it('builds for every allowed shift down to −20', () => {
    for (const attractionShift of [-20, -15, -12]) {
      for (const q of [0.05, 0.5]) {
        const map = buildStateMap({ kind: 'depletion', q }, { parameters: { attractionShift } });
        expect(allNumbers(map).every(Number.isFinite)).toBe(true);
      }
    }
  });
});
