import { ROLES, type Role } from './roles';

/**
 * What each role may do, written once. Server routes declare one capability each
 * (server/http/route.ts refuses everyone else); the client hides what a role lacks.
 */
export const CAPABILITIES = {
  /** Read everything the team recorded: programmes, library, recipes, bench log, shortlists. */
  'data.read': ROLES,
  /** Create and change programmes. */
  'programmes.write': ['admin', 'manager'],
  /** Edit the material library. */
  'materials.write': ['admin', 'manager', 'formulator'],
  /** Create, edit and archive recipes. */
  'recipes.write': ['admin', 'formulator'],
  /** Record bench outcomes, import CSV batches, attach files. */
  'observations.write': ['admin', 'scientist'],
  /** Assemble, edit and submit shortlists. */
  'shortlists.write': ['admin', 'formulator'],
  /** Approve or return a submitted shortlist. */
  'shortlists.decide': ['admin', 'manager'],
  /** Fit a calibration to the bench (anyone who works with the data may try one). */
  'calibrations.fit': ['admin', 'manager', 'formulator', 'scientist'],
  /** Accept a calibration for a programme, changing its predictions. */
  'calibrations.accept': ['admin', 'manager'],
  /** Run the planner and store its plans. */
  'plans.write': ['admin', 'formulator'],
  /** Users, roles, invitations, audit trail, outbox. */
  'team.manage': ['admin'],
} as const satisfies Record<string, readonly Role[]>;

export type Capability = keyof typeof CAPABILITIES;

export function can(role: Role | undefined | null, capability: Capability): boolean {
  if (!role) return false;
  return (CAPABILITIES[capability] as readonly Role[]).includes(role);
}

export function rolesWith(capability: Capability): readonly Role[] {
  return CAPABILITIES[capability];
}
