import { Link } from 'react-router-dom';
import type { ShortlistStatus } from '@shared/states';
import { StateBadge } from '@/components/ui/state-badge';
import { EmptyState, ErrorState, Loading } from '@/components/ui/states';
import { Table, Td, Th } from '@/components/ui/table';
import { formatDateTime } from '@/lib/format';
import { useShortlists, type ShortlistSummary } from '../api/get-shortlists';
import { STATUS_LABELS, STATUS_ORDER, StatusBadge } from './shortlist-status';

/** A programme's shortlists: one group per status (what waits for review first), or one status only. */
export function ShortlistList({ programmeId, status }: { programmeId: number; status: ShortlistStatus | null }) {
  const list = useShortlists({ programme: programmeId, status: status ?? undefined });
  if (list.isPending) return <Loading label="Loading shortlists…" />;
  if (list.isError) return <ErrorState error={list.error} retry={() => list.refetch()} />;
  if (list.data.items.length === 0) {
    return (
      <EmptyState title={status ? `No shortlist is ${STATUS_LABELS[status].toLowerCase()}` : 'No shortlist in this programme yet'}>
        A shortlist gathers candidate recipes, with a reason for each, for a manager to approve before mixing.
      </EmptyState>
    );
  }
  const groups = (status ? [status] : STATUS_ORDER).map((s) => ({ status: s, items: list.data.items.filter((i) => i.status === s) })).filter((g) => g.items.length > 0);
  return (
    <div className="flex flex-col gap-6">
      {groups.map((group) => (
        <section key={group.status} aria-labelledby={`group-${group.status}`} className="flex flex-col gap-2">
          <h2 id={`group-${group.status}`} className="text-lg">
            {STATUS_LABELS[group.status]} <span className="text-sm font-normal text-ink-soft">({group.items.length})</span>
          </h2>
          <ShortlistTable items={group.items} caption={`Shortlists: ${STATUS_LABELS[group.status]}`} />
        </section>
      ))}
    </div>
  );
}

function ShortlistTable({ items, caption }: { items: ShortlistSummary[]; caption: string }) {
  return (
    <Table caption={caption}>
      <thead>
        <tr>
          <Th>Title</Th>
          <Th>Status</Th>
          <Th>Target</Th>
          <Th className="text-right">Recipes</Th>
          <Th>Author</Th>
          <Th>Reviewer</Th>
          <Th>Last change</Th>
        </tr>
      </thead>
      <tbody>
        {items.map((s) => (
          <tr key={s.id}>
            <Td>
              <Link to={`/shortlists/${s.id}`} className="font-medium">
                {s.title}
              </Link>
              {s.purpose && <p className="max-w-md truncate text-xs text-ink-soft">{s.purpose}</p>}
            </Td>
            <Td>
              <StatusBadge status={s.status} />
            </Td>
            <Td>
              <StateBadge state={s.targetState} />
            </Td>
            <Td className="text-right tabular-nums">{s.itemCount}</Td>
            <Td>{s.author?.name ?? '—'}</Td>
            <Td>{s.reviewer?.name ?? '—'}</Td>
            <Td className="whitespace-nowrap text-ink-soft">{formatDateTime(s.updatedAt)}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
