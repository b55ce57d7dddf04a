import type { ShortlistEventView } from '@shared/views/shortlist';
import { formatDateTime } from '@/lib/format';
import { STATUS_LABELS } from './shortlist-status';

/** Every status change, oldest first, with who made it and what they wrote. */
export function StatusHistory({ history }: { history: ShortlistEventView[] }) {
  return (
    <ol className="flex flex-col gap-2 border-l-2 border-line pl-4" aria-label="Status history">
      {history.map((event, index) => (
        <li key={index} className="text-sm">
          <p>
            <span className="font-medium">{event.from === null ? 'Created as a draft' : `${STATUS_LABELS[event.from]} → ${STATUS_LABELS[event.to]}`}</span>
            <span className="text-ink-soft">
              {' '}
              by {event.actor?.name ?? 'someone no longer listed'}, {formatDateTime(event.at)}
            </span>
          </p>
          {event.comment && <blockquote className="mt-0.5 whitespace-pre-line border-l-2 border-fjord-300 pl-2 text-ink-soft">{event.comment}</blockquote>}
        </li>
      ))}
    </ol>
  );
}
