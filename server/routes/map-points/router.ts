import { QueryTypes } from 'sequelize';
import { z } from 'zod';
import { observationAgrees, type ObservedState, type PredictedState } from '../../../shared/states';
import type { MapPoints, RecipeDerived } from '../../../shared/views/team-data';
import { route } from '../../http/route';
import { requireProgramme } from '../../services/lookups';

const inverseTauFromB2 = (b2: number | null) => (b2 === null || b2 >= 1 ? null : 4 * (1 - b2));

/**
 * Everything the map overlays for a programme in one call, read with two plain queries
 * (no model objects) and sent as columns + rows so that 10,000 points stay small.
 */
export const mapPointRoutes = [
  route({
    method: 'get',
    path: '/api/map-points',
    access: 'data.read',
    summary: "A programme's recipes and observations in every map coordinate",
    query: z.object({ programme: z.coerce.number({ error: 'programme must be a programme id' }).int().positive() }),
    async handler({ query, deps, res }) {
      await requireProgramme(query.programme, null, 'field');
      const recipes = await deps.sequelize.query<{ id: number; code: string; name: string; derived: string | RecipeDerived }>(
        'SELECT id, code, name, derived FROM recipes WHERE programme_id = ? AND archived_at IS NULL ORDER BY id',
        { replacements: [query.programme], type: QueryTypes.SELECT },
      );
      const byId = new Map<number, RecipeDerived>();
      const recipeRows = recipes.map((r) => {
        const d = (typeof r.derived === 'string' ? JSON.parse(r.derived) : r.derived) as RecipeDerived;
        byId.set(r.id, d);
        return [r.id, r.code, r.name, d.phi, d.reducedB2, d.stickiness ? 1 / d.stickiness : inverseTauFromB2(d.reducedB2), d.contactEnergyKT, d.polymerReservoir, d.sizeRatio, d.predictedState, d.margin];
      });
      const observations = await deps.sequelize.query<{
        id: number; recipe_id: number | null; code: string | null; adhoc_phi: number | null; adhoc_reduced_b2: number | null; adhoc_predicted_state: PredictedState | null;
        observed_state: ObservedState; predicted_state: PredictedState | null; age_days: number;
      }>(
        `SELECT o.id, o.recipe_id, r.code, o.adhoc_phi, o.adhoc_reduced_b2, o.adhoc_predicted_state, o.observed_state, r.predicted_state, o.age_days
           FROM observations o LEFT JOIN recipes r ON r.id = o.recipe_id
          WHERE o.programme_id = ? AND o.archived_at IS NULL AND (r.id IS NULL OR r.archived_at IS NULL)
          ORDER BY o.id`,
        { replacements: [query.programme], type: QueryTypes.SELECT },
      );
      const observationRows = observations.map((o) => {
        const d = o.recipe_id !== null ? byId.get(o.recipe_id) : undefined;
        const predicted = o.recipe_id !== null ? o.predicted_state : o.adhoc_predicted_state;
        const phi = d ? d.phi : o.adhoc_phi;
        const b2 = d ? d.reducedB2 : o.adhoc_reduced_b2;
        const inverseTau = d?.stickiness ? 1 / d.stickiness : inverseTauFromB2(b2);
        return [o.id, o.recipe_id, phi, b2, inverseTau, d?.contactEnergyKT ?? null, d?.polymerReservoir ?? null, o.observed_state, predicted, observationAgrees(o.observed_state, predicted), o.age_days, o.code];
      });
      const body: MapPoints = {
        programmeId: query.programme,
        recipes: { columns: ['id', 'code', 'name', 'phi', 'reducedB2', 'inverseTau', 'contactEnergyKT', 'polymerReservoir', 'sizeRatio', 'predictedState', 'margin'], rows: recipeRows },
        observations: { columns: ['id', 'recipeId', 'phi', 'reducedB2', 'inverseTau', 'contactEnergyKT', 'polymerReservoir', 'observedState', 'predictedState', 'agrees', 'ageDays', 'recipeCode'], rows: observationRows },
      };
      res.setHeader('Cache-Control', 'private, no-cache');
      return { body };
    },
  }),
];
