import type { ReactNode } from 'react';
import { Wordmark } from './wordmark';

/** The frame of the pages seen before signing in. */
export function PublicShell({ title, intro, children }: { title: string; intro?: ReactNode; children: ReactNode }) {
  return (
    <div className="flex min-h-screen items-start justify-center px-4 pt-[12vh]">
      <main className="w-full max-w-md">
        <div className="mb-8">
          <Wordmark large />
        </div>
        <div className="rounded-card border border-line bg-panel p-7 shadow-card">
          <h1 className="mb-1 text-xl">{title}</h1>
          {intro && <div className="mb-5 text-sm text-ink-soft">{intro}</div>}
          {children}
        </div>
        <p className="mt-6 text-xs text-ink-faint">
          State maps and bench records for teams that formulate with attractive colloids.
        </p>
      </main>
    </div>
  );
}
