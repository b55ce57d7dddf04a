import { asakuraOosawaReducedB2, type StateMap } from '../physics';

/** Longest B2* table a screening map carries (each extra level costs one Asakura–Oosawa quadrature, ~70 µs). */
export const SCREENING_MAX_LEVELS = 4000;

/** Contact attraction (kT) beyond which B2* is not represented (as in the recipe derivation). */
const MAX_CONTACT_KT = 600;

const extended = new WeakMap<StateMap, Map<number, StateMap>>();

/**
 * The map a plan screens thousands of compositions on: the programme's own map, with — for a
 * depletion map — its table of B2* against the polymer axis continued above the drawn top up to
 * `yTop`, at the same level spacing and from the same Asakura–Oosawa quadrature the map builder
 * uses (buildStateMap). Axis, boundaries and parameters are untouched, so states and margins come
 * out in the same units as on the original map; what changes is speed: above the top of its table
 * the classifier integrates B2* afresh for every point (and, with an attraction shift, solves for
 * it by root finding), which would cost milliseconds per candidate instead of microseconds.
 * Generic maps are returned as they are (their axis conversions are closed-form).
 *
 * The table stops at SCREENING_MAX_LEVELS levels, or where the contact attraction φ_p^R(1 + 3/(2q))
 * passes 600 kT; `reach` says up to which y the extension goes
 * (points above it are still classified exactly, only slowly). Copies are cached per map object.
 *
 * @param map a StateMap (from cachedStateMap or recipeStateMap).
 * @param yTop the highest map y the plan will place a composition at.
 * @example screeningMap(depletionMap, 0.9).map.tables.reducedB2.u.length // > 200 when 0.9 is above the top
 */
export function screeningMap(map: StateMap, yTop: number): { map: StateMap; reach: number } {
  const table = map.tables.reducedB2;
  if (map.model.kind !== 'depletion' || !table) return { map, reach: Infinity };
  const q = map.model.q;
  const count = table.u.length;
  const step = table.u[count - 1] / (count - 1);
  const span = map.y.strongest - map.y.weakest;
  const yOf = (u: number) => map.y.weakest + u * span;
  const wanted = Number.isFinite(yTop) ? Math.ceil(((yTop - map.y.weakest) / span) / step) + 1 : count;
  if (wanted <= count) return { map, reach: yOf(table.u[count - 1]) };
  // Round up to whole hundreds of levels, so plans over similar ranges share one copy.
  const levels = Math.min(SCREENING_MAX_LEVELS, Math.ceil(wanted / 100) * 100);
  if (levels <= count) return { map, reach: yOf(table.u[count - 1]) };
  let copies = extended.get(map);
  if (!copies) extended.set(map, (copies = new Map()));
  let copy = copies.get(levels);
  if (!copy) {
    const u = table.u.slice();
    const b2 = table.b2.slice();
    for (let i = count; i < levels; i++) {
      // Beyond 600 kT at contact the recipe derivation reports no B2* (shared/physics recipe-attraction).
      if (yOf(i * step) * (1 + 3 / (2 * q)) > MAX_CONTACT_KT) break;
      u.push(i * step);
      b2.push(asakuraOosawaReducedB2(q, yOf(i * step)));
    }
    copy = { ...map, tables: { ...map.tables, reducedB2: { u, b2 } } };
    copies.set(levels, copy);
  }
  const reducedB2 = copy.tables.reducedB2!;
  return { map: copy, reach: yOf(reducedB2.u[reducedB2.u.length - 1]) };
}
