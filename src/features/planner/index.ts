/** The Planner: from a target state to ranked compositions, and the next experiments. */
export { PlannerScreen } from './components/planner-screen';
export { planKeys } from './api/plan-keys';
export { planQueryOptions, usePlan } from './api/get-plan';
