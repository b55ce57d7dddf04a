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

/** Kept here for the client's imports; the type lives in ./page. */
export type { Page } from './page';
