import { describe, expect, it } from 'vitest';
import type { MapPoints } from '@shared/views/map-points';
import type { RecipeDerived } from '@shared/views/recipe';
import { MAP_OBSERVATION_COLUMNS, MAP_RECIPE_COLUMNS, decodeMapObservations, decodeMapRecipes } from '@shared/views/map-points';
import { nearbyEvidence } from './nearby-evidence';

/** The overlay as the map query hands it over, decoded. */
function decoded(data: MapPoints) {
  const recipes = decodeMapRecipes(data);
  return { recipes, observations: decodeMapObservations(data, recipes) };
}


function points(): MapPoints {
  return {
    programmeId: 1,
    recipes: {
      columns: MAP_RECIPE_COLUMNS,
      rows: [
        [1, 'A-0001', 'self', 0.1, -5, null, null, null, null, 'gel', 0.1],
        [2, 'A-0002', 'near', 0.13, -5.8, null, null, null, null, 'gel', 0.1],
        [3, 'A-0003', 'far in phi', 0.3, -5, null, null, null, null, 'gel', 0.1],
        [4, 'A-0004', 'far in B2', 0.1, -12, null, null, null, null, 'gel', 0.1],
      ],
    },
    observations: {
      columns: MAP_OBSERVATION_COLUMNS,
      rows: [
        [10, 2, 'gel', 7],
        [11, 2, 'collapsed', 45],
        [12, 2, 'gel', 30],
        [13, 3, 'collapsed', 20],
        [14, 1, 'collapsed', 10],
      ],
    },
  };
}

describe('nearbyEvidence', () => {
  it('counts only other recipes within the φ and B2* window, with their collapses and long-lived gels', () => {
    const derived = { phi: 0.1, reducedB2: -5 } as RecipeDerived;
    const evidence = nearbyEvidence(1, derived, decoded(points()));
    // Window: Δφ ≤ 0.06 and ΔB2* ≤ max(1.5, 20 % of 5) = 1.5: only recipe 2 (Δφ 0.03, ΔB2* 0.8).
    expect(evidence).toEqual({ recipes: 1, collapsed: [{ code: 'A-0002', ageDays: 45 }], heldGels: 1 });
  });

  it('widens the B2* window for strongly attractive recipes (20 % of B2*)', () => {
    const derived = { phi: 0.1, reducedB2: -10 } as RecipeDerived;
    // ΔB2* window 2.0: recipe 4 (B2* −12) is now near, recipe 2 (−5.8) is not.
    expect(nearbyEvidence(1, derived, decoded(points())).recipes).toBe(1);
  });
});
