import type { Role } from '../roles';

/** A user as the API shows them; never carries the password hash. */
export interface UserView {
  id: number;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  invitationPending: boolean;
  lastSignInAt: string | null;
  createdAt: string;
}
