import type { ReactNode } from 'react';
import { ApiError } from '@/lib/api-client';
import { Notice } from './notice';
import { Button } from './button';

export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <div className="flex items-center gap-2 py-8 text-sm text-ink-soft" role="status" aria-live="polite">
      <span className="h-4 w-4 animate-spin rounded-full border-2 border-fjord-500 border-t-transparent" aria-hidden />
      {label}
    </div>
  );
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-card border border-dashed border-line-strong bg-panel px-6 py-10 text-center">
      <p className="font-medium text-ink">{title}</p>
      {children && <div className="mt-1 text-sm text-ink-soft">{children}</div>}
    </div>
  );
}

export function ErrorState({ error, retry }: { error: unknown; retry?: () => void }) {
  const message = error instanceof ApiError ? error.message : 'Something went wrong while loading this page.';
  return (
    <Notice tone="error" title="Could not load">
      <p>{message}</p>
      {retry && (
        <Button variant="secondary" size="sm" className="mt-2" onClick={retry}>
          Try again
        </Button>
      )}
    </Notice>
  );
}
