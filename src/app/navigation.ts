import type { Capability } from '@shared/permissions';

export interface NavItem {
  to: string;
  label: string;
  /** Who sees the item: the capability a role needs (the server checks it again). */
  capability: Capability;
  description: string;
}

/** The screens that exist, in the order the rail shows them. */
export const NAV_ITEMS: NavItem[] = [
  { to: '/', label: 'Overview', capability: 'data.read', description: 'What Gelwright does for you' },
  { to: '/map', label: 'State map', capability: 'data.read', description: 'Recipes and bench outcomes on the computed state diagram' },
  { to: '/recipes', label: 'Recipes', capability: 'data.read', description: 'Compositions with their predicted state and margin' },
  { to: '/bench', label: 'Bench log', capability: 'data.read', description: 'Observed outcomes beside their predictions; record, import and export' },
  { to: '/plan', label: 'Planner', capability: 'data.read', description: 'From a target state to ranked compositions, and the next experiments to run' },
  { to: '/shortlists', label: 'Shortlists', capability: 'data.read', description: 'Candidate recipes on their way to approval' },
  { to: '/calibrate', label: 'Calibrate', capability: 'data.read', description: 'Fit the gel boundary to the bench and choose what the programme predicts with' },
  { to: '/library', label: 'Library', capability: 'data.read', description: 'Particles, depletants, solvents and salts' },
  { to: '/find', label: 'Find', capability: 'data.read', description: 'Look up a recipe and read where it sits' },
  { to: '/team', label: 'Team', capability: 'team.manage', description: 'People, roles, invitations, audit trail, outbox' },
];
