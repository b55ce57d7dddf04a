import { expect } from 'vitest';
import type request from 'supertest';
import type { Programme } from '../../server/models';
import { seededRandom } from '../../shared/seeded-random';
import type { RecipeView } from '../../shared/views/recipe';
import { recipeInput, type Library } from './team-builders';

type Agent = ReturnType<typeof request.agent>;

/**
 * An invented ageing bench for shelf-life tests: eight recipes of rising polymer dose and φ, four
 * samples each (a gel check at day 2, then collapsed at the drawn day or still a gel at the last
 * check), the collapse hazard falling with the dose. Seed 1414 gives enough collapses (≥ 10) for a
 * proportional-hazards fit without separation. Returns the recipes and each recipe's records.
 */
export async function recordAgedBench(formulator: Agent, scientist: Agent, programme: Programme, lib: Library, seed = 1414) {
  const random = seededRandom(seed);
  const recipes: RecipeView[] = [];
  const records = new Map<number, { timeDays: number; collapsed: boolean }[]>();
  for (let i = 0; i < 8; i++) {
    const created = await formulator.post('/api/recipes').send(recipeInput(programme, lib, { fraction: { kind: 'volume', value: 0.12 + 0.01 * i }, attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL: 6 + 1.5 * i } }));
    expect(created.status).toBe(201);
    const recipe = created.body.recipe as RecipeView;
    recipes.push(recipe);
    const list: { timeDays: number; collapsed: boolean }[] = [];
    for (let s = 0; s < 4; s++) {
      const collapseDay = 3 + Math.ceil(-Math.log(1 - random()) * 8 * (1 + i / 2));
      const lastCheck = 20 + Math.floor(random() * 40);
      const collapsed = collapseDay <= lastCheck;
      const end = Math.min(collapseDay, lastCheck);
      for (const [ageDays, observedState] of [[2, 'gel'], [end, collapsed ? 'collapsed' : 'gel']] as const) {
        const check = await scientist.post('/api/observations').send({ recipeId: recipe.id, mixedAt: `2026-0${1 + s}-1${i}`, ageDays, observedState, method: 'visual' });
        expect(check.status).toBe(201);
      }
      list.push({ timeDays: end, collapsed });
    }
    records.set(recipe.id, list);
  }
  return { recipes, records };
}
