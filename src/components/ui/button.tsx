import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'quiet' | 'danger';

const VARIANTS: Record<Variant, string> = {
  primary: 'bg-fjord-500 text-white hover:bg-fjord-600 disabled:bg-fjord-300',
  secondary: 'bg-panel text-ink border border-line-strong hover:bg-fjord-50 disabled:text-ink-faint',
  quiet: 'bg-transparent text-fjord-600 hover:bg-fjord-50 disabled:text-ink-faint',
  danger: 'bg-brick-500 text-white hover:bg-brick-700 disabled:opacity-60',
};

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  busy?: boolean;
  size?: 'sm' | 'md';
}

export function Button({ variant = 'primary', busy = false, size = 'md', className = '', children, disabled, type = 'button', ...rest }: ButtonProps) {
  const sizing = size === 'sm' ? 'px-2.5 py-1 text-sm' : 'px-4 py-2 text-sm';
  return (
    <button
      type={type}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      className={`inline-flex items-center justify-center gap-2 rounded-md font-medium transition-colors disabled:cursor-not-allowed ${sizing} ${VARIANTS[variant]} ${className}`}
      {...rest}
    >
      {busy && <span className="h-3 w-3 animate-spin rounded-full border-2 border-current border-t-transparent" aria-hidden />}
      {children}
    </button>
  );
}
