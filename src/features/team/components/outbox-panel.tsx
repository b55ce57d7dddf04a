import { useState } from 'react';
import { EmptyState, ErrorState, Loading } from '@/components/ui/states';
import { formatDateTime } from '@/lib/format';
import { useOutbox, useOutboxMessage } from '../api/get-outbox';
import { Pager } from './audit-trail';

/** The outbox: every e-mail sent, and the one selected shown in full, links clickable. */
export function OutboxPanel() {
  const [page, setPage] = useState(1);
  const [selected, setSelected] = useState<number | null>(null);
  const list = useOutbox({ page });
  const message = useOutboxMessage(selected);
  if (list.isPending) return <Loading label="Loading the outbox…" />;
  if (list.isError) return <ErrorState error={list.error} retry={() => list.refetch()} />;
  if (list.data.items.length === 0) return <EmptyState title="No e-mail sent yet">Invitations, password resets and shortlist decisions appear here.</EmptyState>;
  const pages = Math.max(1, Math.ceil(list.data.total / list.data.pageSize));
  return (
    <div className="grid gap-4 lg:grid-cols-[minmax(18rem,26rem)_1fr]">
      <div className="flex flex-col gap-3">
        <ul className="divide-y divide-line overflow-hidden rounded-card border border-line bg-panel" aria-label="Messages">
          {list.data.items.map((item) => (
            <li key={item.id}>
              <button
                type="button"
                onClick={() => setSelected(item.id)}
                aria-current={selected === item.id || undefined}
                className="w-full px-4 py-3 text-left hover:bg-fjord-50 aria-[current=true]:bg-fjord-50"
              >
                <span className="block text-sm font-medium">{item.subject}</span>
                <span className="block text-xs text-ink-soft">
                  to {item.recipients} · {formatDateTime(item.createdAt)}
                </span>
              </button>
            </li>
          ))}
        </ul>
        <Pager page={page} pages={pages} onPage={setPage} />
      </div>
      <article className="min-h-48 rounded-card border border-line bg-panel p-5" aria-label="Selected message">
        {selected === null && <p className="text-sm text-ink-soft">Choose a message to read it.</p>}
        {selected !== null && message.isPending && <Loading />}
        {message.isError && <ErrorState error={message.error} />}
        {message.data && (
          <>
            <h3>{message.data.message.subject}</h3>
            <p className="mb-4 text-xs text-ink-soft">
              From {message.data.message.sender} to {message.data.message.recipients} · {formatDateTime(message.data.message.createdAt)} · via {message.data.message.transport}
            </p>
            <MessageText text={message.data.message.text ?? ''} />
          </>
        )}
      </article>
    </div>
  );
}

/** Plain text with its links made clickable (no HTML from the message is ever rendered). */
function MessageText({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s]+)/g);
  return (
    <pre className="whitespace-pre-wrap font-sans text-sm leading-6" data-testid="outbox-message-text">
      {parts.map((part, index) =>
        /^https?:\/\//.test(part) ? (
          <a key={index} href={part}>
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </pre>
  );
}
