import { Button } from '@/components/ui/button';

export function LogPager({ page, pages, total, onPage }: { page: number; pages: number; total: number; onPage: (page: number) => void }) {
  const count = `${total} ${total === 1 ? 'observation' : 'observations'}`;
  if (pages <= 1) return <p className="text-sm text-ink-soft">{count}</p>;
  return (
    <nav className="flex items-center gap-2 text-sm" aria-label="Bench log pages">
      <Button variant="secondary" size="sm" disabled={page <= 1} onClick={() => onPage(page - 1)}>
        Newer
      </Button>
      <span className="text-ink-soft">
        Page {page} of {pages} · {count}
      </span>
      <Button variant="secondary" size="sm" disabled={page >= pages} onClick={() => onPage(page + 1)}>
        Older
      </Button>
    </nav>
  );
}
