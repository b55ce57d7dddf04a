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
  { to: '/team', label: 'Team', capability: 'team.manage', description: 'People, roles, invitations, audit trail, outbox' },
];
