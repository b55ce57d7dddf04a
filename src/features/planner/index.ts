/**
 * The Planner: from a target state to ranked compositions, and the next experiments. In a route
 * component, compose the form, the result parts and the history with the map feature's PlanMap.
 */
export { PlanForm, defaultPlanInput } from './components/plan-form';
export { PlanOverview } from './components/plan-overview';
export { PlanCandidates } from './components/plan-candidates';
export { PlanAdviceNotice } from './components/plan-advice';
export { ExperimentList } from './components/experiment-list';
export { PlanHistory } from './components/plan-history';
export { usePlan } from './api/get-plan';
export { useCreatePlan } from './api/create-plan';
export { doseText } from './lib/plan-words';
