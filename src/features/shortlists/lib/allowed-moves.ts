import { can } from '@shared/permissions';
import type { Role } from '@shared/roles';
import { SHORTLIST_TRANSITIONS, type ShortlistStatus } from '@shared/states';

export interface AllowedMoves {
  edit: boolean;
  submit: boolean;
  approve: boolean;
  return: boolean;
  reopen: boolean;
  archive: boolean;
}

/**
 * Which controls a person sees on a shortlist, mirroring the server's rules
 * (server/services/shortlists.ts): content and sending on belong to the author or an
 * administrator; deciding to `shortlists.decide`, but never approving one's own;
 * an approved shortlist is frozen. The server refuses anything else anyway.
 */
export function allowedMoves(user: { id: number; role: Role }, shortlist: { status: ShortlistStatus; author: { id: number } | null }): AllowedMoves {
  const isAuthor = shortlist.author?.id === user.id;
  const owns = can(user.role, 'shortlists.write') && (isAuthor || user.role === 'admin');
  const decides = can(user.role, 'shortlists.decide');
  const next = SHORTLIST_TRANSITIONS[shortlist.status];
  return {
    edit: owns && shortlist.status === 'draft',
    submit: owns && next.includes('submitted'),
    approve: decides && !isAuthor && next.includes('approved'),
    return: decides && next.includes('returned'),
    reopen: owns && next.includes('draft'),
    archive: owns && shortlist.status !== 'approved',
  };
}

export const anyMove = (moves: AllowedMoves) => Object.values(moves).some(Boolean);
