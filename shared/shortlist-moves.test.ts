import { describe, expect, it } from 'vitest';
import { allowedMoves } from './shortlist-moves';

const author = { id: 1, role: 'formulator' as const };
const otherFormulator = { id: 2, role: 'formulator' as const };
const manager = { id: 3, role: 'manager' as const };
const admin = { id: 4, role: 'admin' as const };
const viewer = { id: 5, role: 'viewer' as const };
const scientist = { id: 6, role: 'scientist' as const };
const shortlist = (status: 'draft' | 'submitted' | 'approved' | 'returned', authorId = author.id) => ({ status, author: { id: authorId } });
const shown = (moves: ReturnType<typeof allowedMoves>) => Object.entries(moves).filter(([, yes]) => yes).map(([move]) => move).sort();

describe('allowedMoves: the shortlist controls each person sees', () => {
  it('a draft: its author may edit, submit and archive it; nobody decides it yet', () => {
    expect(shown(allowedMoves(author, shortlist('draft')))).toEqual(['archive', 'edit', 'submit']);
    expect(shown(allowedMoves(otherFormulator, shortlist('draft')))).toEqual([]);
    expect(shown(allowedMoves(manager, shortlist('draft')))).toEqual([]);
  });

  it('submitted: a manager approves or returns; the author only archives', () => {
    expect(shown(allowedMoves(manager, shortlist('submitted')))).toEqual(['approve', 'return']);
    expect(shown(allowedMoves(author, shortlist('submitted')))).toEqual(['archive']);
  });

  it('an administrator who wrote the shortlist may neither approve nor return it (no self-review, as the server refuses)', () => {
    expect(shown(allowedMoves(admin, shortlist('submitted', admin.id)))).toEqual(['archive']);
    expect(shown(allowedMoves(admin, shortlist('submitted')))).toEqual(['approve', 'archive', 'return']);
  });

  it('returned: the author reopens it as a draft; approved: frozen for everyone', () => {
    expect(shown(allowedMoves(author, shortlist('returned')))).toEqual(['archive', 'reopen']);
    for (const who of [author, manager, admin]) expect(shown(allowedMoves(who, shortlist('approved')))).toEqual([]);
  });

  it('viewers and bench scientists see no controls in any status', () => {
    for (const status of ['draft', 'submitted', 'approved', 'returned'] as const) {
      expect(shown(allowedMoves(viewer, shortlist(status)))).toEqual([]);
      expect(shown(allowedMoves(scientist, shortlist(status, scientist.id)))).toEqual([]);
    }
  });
});
