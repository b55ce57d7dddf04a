import type { ReactNode } from 'react';

type Tone = 'info' | 'success' | 'warning' | 'error';

const TONES: Record<Tone, string> = {
  info: 'border-fjord-300 bg-fjord-50 text-fjord-700',
  success: 'border-leaf-500/40 bg-leaf-50 text-leaf-700',
  warning: 'border-amber-500/50 bg-amber-50 text-amber-700',
  error: 'border-brick-500/50 bg-brick-50 text-brick-700',
};

/** A message box. Errors and warnings are announced to screen readers. */
export function Notice({ tone = 'info', title, children, className = '' }: { tone?: Tone; title?: ReactNode; children?: ReactNode; className?: string }) {
  return (
    <div role={tone === 'error' || tone === 'warning' ? 'alert' : 'status'} className={`rounded-md border px-3 py-2 text-sm ${TONES[tone]} ${className}`}>
      {title && <p className="font-semibold">{title}</p>}
      {children && <div className={title ? 'mt-0.5' : ''}>{children}</div>}
    </div>
  );
}
