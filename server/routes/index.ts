import type { RouteSpec } from '../http/route';
import { auditRoutes } from './audit-events/router';
import { healthRoutes } from './health/router';
import { invitationRoutes } from './invitations/router';
import { outboxRoutes } from './outbox/router';
import { passwordResetRoutes } from './password-resets/router';
import { sessionRoutes } from './session/router';
import { userRoutes } from './users/router';

/**
 * Every API route of the installation. The role-matrix test walks this list, so a route
 * that is not here does not exist. Literal paths come before parameterised twins.
 */
export const ALL_ROUTES: RouteSpec[] = [
  ...healthRoutes,
  ...sessionRoutes,
  ...invitationRoutes.filter((r) => !r.path.includes(':')),
  ...invitationRoutes.filter((r) => r.path.includes(':')),
  ...passwordResetRoutes,
  ...userRoutes,
  ...auditRoutes,
  ...outboxRoutes,
];
