import type { User } from '../models';
import type { UserView } from '../../shared/views/user';

export type { UserView };


/** What the API shows of a user: never the password hash. */
export function presentUser(user: User): UserView {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    active: user.active,
    invitationPending: user.passwordHash === null,
    lastSignInAt: user.lastSignInAt ? user.lastSignInAt.toISOString() : null,
    createdAt: user.createdAt.toISOString(),
  };
}
