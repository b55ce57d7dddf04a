import type { Recipe, Shortlist, ShortlistEvent, ShortlistItem, User } from '../models';
import type { ShortlistItemView, ShortlistView } from '../../shared/views/shortlist';
import { differencesSince } from './recipe-differences';

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
      .map((item) => presentItem(item)),
    history: (s.events ?? [])
      .slice()
      .sort((a, b) => a.id - b.id)
      .map((e) => ({ from: e.fromStatus, to: e.toStatus, actor: person(e.actor), comment: e.comment, at: e.createdAt.toISOString() })),
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
  };
}

/**
 * Once submitted, an item shows the recipe version that was sent for review (its snapshot);
 * when the recipe has been edited or re-predicted since, `changed` lists what differs.
 */
function presentItem(item: ShortlistItem & { recipe?: Recipe }): ShortlistItemView {
  const live = item.recipe!;
  const kept = item.snapshot;
  const differences = kept ? differencesSince(kept, live) : [];
  return {
    recipeId: item.recipeId,
    position: item.position,
    reason: item.reason,
    recipe: kept
      ? { id: live.id, code: kept.code, name: kept.name, derived: kept.derived, archived: live.archivedAt != null, version: kept.version }
      : { id: live.id, code: live.code, name: live.name, derived: live.derived, archived: live.archivedAt != null, version: live.version },
    frozen: kept != null,
    changed: kept && (live.version !== kept.version || differences.length > 0) ? { currentVersion: live.version, differences } : null,
  };
}
