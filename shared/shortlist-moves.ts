import { can } from './permissions';
import type { Role } from './roles';
import { SHORTLIST_TRANSITIONS, type ShortlistStatus } from './states';

export interface AllowedMoves {
  edit: boolean;
  submit: boolean;
  approve: boolean;
  return: boolean;
  reopen: boolean;
  archive: boolean;
}

/**
 * A shortlist's content, sending it on, reopening and archiving belong to its author or an
 * administrator (the server's check in server/services/shortlists.ts and the client's controls).
 */
export function isAuthorOrAdmin(user: { id: number; role: Role }, authorId: number | null): boolean {
  return authorId === user.id || user.role === 'admin';
}

/**
 * Which controls a person sees on a shortlist, by the rules the server applies
 * (server/services/shortlists.ts): the moves of SHORTLIST_TRANSITIONS; content and sending on
 * belong to the author or an administrator (isAuthorOrAdmin); deciding to `shortlists.decide`,
 * but never approving or returning one's own (no self-review); an approved shortlist is frozen. The server refuses anything
 * else anyway.
 */
export function allowedMoves(user: { id: number; role: Role }, shortlist: { status: ShortlistStatus; author: { id: number } | null }): AllowedMoves {
  const isAuthor = shortlist.author?.id === user.id;
  const owns = can(user.role, 'shortlists.write') && isAuthorOrAdmin(user, shortlist.author?.id ?? null);
  const decides = can(user.role, 'shortlists.decide');
  const next = SHORTLIST_TRANSITIONS[shortlist.status];
  return {
    edit: owns && shortlist.status === 'draft',
    submit: owns && next.includes('submitted'),
    approve: decides && !isAuthor && next.includes('approved'),
    return: decides && !isAuthor && next.includes('returned'),
    reopen: owns && next.includes('draft'),
    archive: owns && shortlist.status !== 'approved',
  };
}

export const anyMove = (moves: AllowedMoves) => Object.values(moves).some(Boolean);
