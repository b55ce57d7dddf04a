import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { EmptyState, ErrorState, Loading } from '@/components/ui/states';
import { Table, Td, Th } from '@/components/ui/table';
import { formatDateTime } from '@/lib/format';
import { useAuditEvents } from '../api/get-audit';

export function AuditTrail() {
  const [page, setPage] = useState(1);
  const events = useAuditEvents({ page });
  if (events.isPending) return <Loading label="Loading the audit trail…" />;
  if (events.isError) return <ErrorState error={events.error} retry={() => events.refetch()} />;
  if (events.data.items.length === 0) return <EmptyState title="No events recorded yet" />;
  const pages = Math.max(1, Math.ceil(events.data.total / events.data.pageSize));
  return (
    <div className="flex flex-col gap-3">
      <Table caption="Audit trail, newest first">
        <thead>
          <tr>
            <Th>When</Th>
            <Th>Who</Th>
            <Th>What</Th>
            <Th>Record</Th>
            <Th>From</Th>
          </tr>
        </thead>
        <tbody>
          {events.data.items.map((event) => (
            <tr key={event.id}>
              <Td className="whitespace-nowrap text-ink-soft">{formatDateTime(event.createdAt)}</Td>
              <Td>{event.actor?.name ?? 'system / anonymous'}</Td>
              <Td>
                <code className="text-xs">{event.action}</code>
              </Td>
              <Td className="text-ink-soft">
                {event.entityType}
                {event.entityId ? ` #${event.entityId}` : ''}
              </Td>
              <Td className="text-ink-faint">{event.ip ?? '—'}</Td>
            </tr>
          ))}
        </tbody>
      </Table>
      <Pager page={page} pages={pages} onPage={setPage} />
    </div>
  );
}

export function Pager({ page, pages, onPage }: { page: number; pages: number; onPage: (page: number) => void }) {
  return (
    <nav className="flex items-center gap-2 text-sm" aria-label="Pages">
      <Button variant="secondary" size="sm" disabled={page <= 1} onClick={() => onPage(page - 1)}>
        Newer
      </Button>
      <span className="text-ink-soft">
        Page {page} of {pages}
      </span>
      <Button variant="secondary" size="sm" disabled={page >= pages} onClick={() => onPage(page + 1)}>
        Older
      </Button>
    </nav>
  );
}
