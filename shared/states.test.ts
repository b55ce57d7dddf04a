import { describe, expect, it } from 'vitest';
import { gelSideOutcome } from './calibration/gel-side-outcome';
import { OBSERVED_STATES, observationAgrees, PREDICTED_STATES } from './states';

// Gelwright's own definition (no outside source): one rule for every screen, export, filter
// and fit; a collapsed sample agrees with a predicted gel (see COLLAPSED_AGREES_WITH_GEL).

describe('observationAgrees', () => {
  it('agrees on the same state, and for a collapsed sample of a predicted gel', () => {
    for (const state of PREDICTED_STATES) expect(observationAgrees(state, state)).toBe(true);
    expect(observationAgrees('collapsed', 'gel')).toBe(true);
  });

  it('disagrees otherwise, and says nothing for unclear samples or no prediction', () => {
    for (const predicted of PREDICTED_STATES) {
      for (const observed of OBSERVED_STATES) {
        const expected = observed === 'unclear' ? null : observed === predicted || (observed === 'collapsed' && predicted === 'gel');
        expect(observationAgrees(observed, predicted), `${observed} vs ${predicted}`).toBe(expected);
      }
    }
    expect(observationAgrees('gel', null)).toBeNull();
  });

  it('matches the calibration\'s gel side for a predicted gel (one meaning of agreement)', () => {
    for (const observed of OBSERVED_STATES) {
      if (observed === 'unclear') continue;
      expect(observationAgrees(observed, 'gel')).toBe(gelSideOutcome(observed) === 1);
    }
  });
});
