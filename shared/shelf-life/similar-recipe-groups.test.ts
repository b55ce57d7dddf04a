import { describe, expect, it } from 'vitest';
import { seededRandom } from '../seeded-random';
import { similarRecipeGroups, SIMILAR_RECIPE_DISTANCE, type RecipeOnMap } from './similar-recipe-groups';

function recipe(id: number, x: number, u: number, materials: Partial<RecipeOnMap> = {}): RecipeOnMap {
  return { id, particleId: 7, depletantId: 3, solventId: 1, x, u, ...materials };
}

describe('similarRecipeGroups', () => {
  it('joins recipes of the same materials within 0.05 on the map and keeps other materials apart (rule, by hand)', () => {
    const groups = similarRecipeGroups([
      recipe(1, 0.2, 0.5),
      recipe(2, 0.23, 0.53), // distance 0.0424 from 1
      recipe(3, 0.2, 0.5, { depletantId: null }),
      recipe(4, 0.2, 0.5, { solventId: 2 }),
      recipe(5, 0.2, 0.5, { particleId: 8 }),
      recipe(6, 0.3, 0.5), // 0.07 from 2
    ]);
    expect(SIMILAR_RECIPE_DISTANCE).toBe(0.05);
    expect(groups).toEqual([[1, 2], [3], [4], [5], [6]]);
  });

  it('chains neighbours (single linkage) and honours the distance given', () => {
    const chain = [recipe(1, 0.1, 0.1), recipe(2, 0.14, 0.1), recipe(3, 0.18, 0.1), recipe(4, 0.22, 0.1)];
    expect(similarRecipeGroups(chain)).toEqual([[1, 2, 3, 4]]);
    expect(similarRecipeGroups(chain, { distance: 0.03 })).toEqual([[1], [2], [3], [4]]);
    expect(similarRecipeGroups(chain, { distance: 0 })).toEqual([[1], [2], [3], [4]]);
    expect(similarRecipeGroups([recipe(1, 0.5, 0.5), recipe(2, 0.5, 0.5)], { distance: 0 })).toEqual([[1, 2]]);
    expect(similarRecipeGroups([])).toEqual([]);
  });

  it('keeps material ids of different types apart (7 and "7", null and "null")', () => {
    expect(similarRecipeGroups([recipe(1, 0.2, 0.5), recipe(2, 0.2, 0.5, { particleId: '7' })])).toEqual([[1], [2]]);
    expect(similarRecipeGroups([recipe(1, 0.2, 0.5, { depletantId: null }), recipe(2, 0.2, 0.5, { depletantId: 'null' })])).toEqual([[1], [2]]);
  });

  it('refuses a bad distance, a non-finite position and a repeated id', () => {
    expect(() => similarRecipeGroups([recipe(1, 0, 0)], { distance: -1 })).toThrow(/distance must be finite and ≥ 0/);
    expect(() => similarRecipeGroups([recipe(1, Number.NaN, 0)])).toThrow(/recipe 1 has a non-finite map position/);
    expect(() => similarRecipeGroups([recipe(1, 0, 0), recipe(1, 0.5, 0)])).toThrow(/recipe 1 appears twice/);
  });

  it('agrees with a brute-force all-pairs connected-components search on random recipes (derived: independent implementation)', () => {
    const random = seededRandom(99);
    for (let trial = 0; trial < 10; trial++) {
      const recipes = Array.from({ length: 150 }, (_, i) => recipe(i, random(), random() * 1.2 - 0.1, { particleId: Math.floor(random() * 2), depletantId: random() < 0.3 ? null : 1 }));
      const distance = 0.02 + random() * 0.1;
      // Reference: flood fill over all pairs.
      const label = new Array(recipes.length).fill(-1);
      for (let start = 0; start < recipes.length; start++) {
        if (label[start] >= 0) continue;
        label[start] = start;
        const stack = [start];
        while (stack.length) {
          const a = recipes[stack.pop()!];
          recipes.forEach((b, j) => {
            const same = a.particleId === b.particleId && a.depletantId === b.depletantId && a.solventId === b.solventId;
            if (label[j] < 0 && same && Math.hypot(a.x - b.x, a.u - b.u) <= distance) {
              label[j] = start;
              stack.push(j);
            }
          });
        }
      }
      const expected = new Map<number, number[]>();
      recipes.forEach((r, i) => expected.set(label[i], [...(expected.get(label[i]) ?? []), r.id]));
      expect(similarRecipeGroups(recipes, { distance })).toEqual([...expected.values()]);
    }
  });
});
