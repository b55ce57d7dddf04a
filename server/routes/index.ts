import type { RouteSpec } from '../http/route';
import { auditRoutes } from './audit-events/router';
import { healthRoutes } from './health/router';
import { invitationRoutes } from './invitations/router';
import { outboxRoutes } from './outbox/router';
import { passwordResetRoutes } from './password-resets/router';
import { sessionRoutes } from './session/router';
import { userRoutes } from './users/router';
import { programmeRoutes } from './programmes/router';
import { materialRouteList } from './materials/router';
import { recipeRoutes } from './recipes/router';
import { observationRoutes } from './observations/router';
import { attachmentRoutes } from './attachments/router';
import { shortlistRoutes } from './shortlists/router';
import { mapPointRoutes } from './map-points/router';
import { calibrationRoutes } from './calibrations/router';
import { planRoutes } from './plans/router';
import { shelfLifeRoutes } from './shelf-life/router';
import { checkScheduleRoutes } from './check-schedules/router';

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
  ...programmeRoutes,
  ...materialRouteList,
  ...recipeRoutes,
  ...observationRoutes,
  ...attachmentRoutes,
  ...shortlistRoutes,
  ...mapPointRoutes,
  ...calibrationRoutes,
  ...planRoutes,
  ...checkScheduleRoutes,
  ...shelfLifeRoutes,
];
