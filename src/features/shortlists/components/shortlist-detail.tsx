import { useState, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { Role } from '@shared/roles';
import { STATE_LABELS } from '@shared/states';
import type { ShortlistView } from '@shared/views/shortlist';
import { Card } from '@/components/ui/page';
import { ErrorState, Loading } from '@/components/ui/states';
import { formatDateTime } from '@/lib/format';
import { useShortlist } from '../api/get-shortlist';
import { allowedMoves, anyMove } from '@shared/shortlist-moves';
import { ShortlistForm } from './shortlist-form';
import { ShortlistItems } from './shortlist-items';
import { ShortlistMoves } from './shortlist-moves';
import { StatusBadge } from './shortlist-status';
import { StatusHistory } from './status-history';

/** The map of the shortlist's recipes is mounted by the route (the map feature is not imported here). */
export type MapSlot = ReactNode | ((shortlist: ShortlistView) => ReactNode);

/**
 * One shortlist: its recipes with reasons and bench evidence, the status history, and the
 * controls this person may use. `mapSlot` (from the route) is drawn above the recipes.
 */
export function ShortlistDetail({
  id,
  user,
  mapSlot,
  listHref,
  onArchived,
}: {
  id: number;
  user: { id: number; role: Role };
  mapSlot?: MapSlot;
  listHref: (programmeId: number) => string;
  onArchived: (shortlist: ShortlistView) => void;
}) {
  const query = useShortlist(id);
  const [editing, setEditing] = useState(false);
  if (query.isPending) return <Loading label="Loading the shortlist…" />;
  if (query.isError) return <ErrorState error={query.error} retry={() => query.refetch()} />;
  const shortlist = query.data;
  const moves = allowedMoves(user, shortlist);
  const map = typeof mapSlot === 'function' ? mapSlot(shortlist) : mapSlot;
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-2">
        <Link to={listHref(shortlist.programmeId)} className="text-sm">
          ← All shortlists of the programme
        </Link>
        <div className="flex flex-wrap items-center gap-3">
          <h1>{shortlist.title}</h1>
          <StatusBadge status={shortlist.status} />
        </div>
        <p className="text-sm text-ink-soft">
          Target: <span className="font-medium text-ink">{STATE_LABELS[shortlist.targetState]}</span> · by {shortlist.author?.name ?? 'someone no longer listed'}
          {shortlist.submittedAt && ` · submitted ${formatDateTime(shortlist.submittedAt)}`}
          {shortlist.decidedAt && shortlist.reviewer && ` · ${shortlist.status === 'approved' ? 'approved' : 'decided'} by ${shortlist.reviewer.name}, ${formatDateTime(shortlist.decidedAt)}`}
        </p>
        {shortlist.purpose && <p className="max-w-3xl whitespace-pre-line">{shortlist.purpose}</p>}
        {shortlist.decisionComment && (
          <blockquote className="max-w-3xl whitespace-pre-line border-l-4 border-fjord-300 pl-3 text-sm">
            <span className="font-medium">{shortlist.reviewer?.name ?? 'The reviewer'} wrote:</span> {shortlist.decisionComment}
          </blockquote>
        )}
      </header>

      {anyMove(moves) && !editing && <ShortlistMoves shortlist={shortlist} moves={moves} onEdit={() => setEditing(true)} onArchived={() => onArchived(shortlist)} />}

      {editing && moves.edit && (
        <Card title="Edit the draft">
          <ShortlistForm programmeId={shortlist.programmeId} defaultTargetState={shortlist.targetState} shortlist={shortlist} onSaved={() => setEditing(false)} onCancel={() => setEditing(false)} />
        </Card>
      )}

      {/* Map slot: the route passes the map of these recipes; nothing is drawn without it. */}
      {map && (
        <section aria-label="Map of the shortlisted recipes" data-slot="shortlist-map">
          {map}
        </section>
      )}

      <section aria-labelledby="shortlist-recipes" className="flex flex-col gap-3">
        <h2 id="shortlist-recipes">Recipes and evidence ({shortlist.items.length})</h2>
        <ShortlistItems items={shortlist.items} targetState={shortlist.targetState} status={shortlist.status} />
      </section>

      <section aria-labelledby="shortlist-history" className="flex flex-col gap-3">
        <h2 id="shortlist-history">Status history</h2>
        <StatusHistory history={shortlist.history} />
      </section>
    </div>
  );
}
