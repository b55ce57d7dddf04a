import type { Recipe, Shortlist, ShortlistEvent, ShortlistItem, User } from '../models';
import type { ShortlistView } from '../../shared/views/team-data';

type Loaded = Shortlist & {
  items?: (ShortlistItem & { recipe?: Recipe })[];
  events?: (ShortlistEvent & { actor?: User | null })[];
  author?: User | null;
  reviewer?: User | null;
};

const person = (u: User | null | undefined) => (u ? { id: u.id, name: u.name } : null);

export function presentShortlist(s: Loaded): ShortlistView {
  return {
    id: s.id,
    programmeId: s.programmeId,
    title: s.title,
    purpose: s.purpose,
    targetState: s.targetState,
    status: s.status,
    archived: s.archivedAt != null,
    author: person(s.author),
    reviewer: person(s.reviewer),
    decisionComment: s.decisionComment,
    submittedAt: s.submittedAt?.toISOString() ?? null,
    decidedAt: s.decidedAt?.toISOString() ?? null,
    items: (s.items ?? [])
      .slice()
      .sort((a, b) => a.position - b.position)
      .map((item) => ({
        recipeId: item.recipeId,
        position: item.position,
        reason: item.reason,
        recipe: {
          id: item.recipe!.id,
          code: item.recipe!.code,
          name: item.recipe!.name,
          derived: item.recipe!.derived,
          archived: item.recipe!.archivedAt != null,
        },
      })),
    history: (s.events ?? [])
      .slice()
      .sort((a, b) => a.id - b.id)
      .map((e) => ({ from: e.fromStatus, to: e.toStatus, actor: person(e.actor), comment: e.comment, at: e.createdAt.toISOString() })),
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
  };
}
