import type { ReactNode, ThHTMLAttributes, TdHTMLAttributes } from 'react';

export function Table({ caption, children }: { caption: string; children: ReactNode }) {
  return (
    <div className="overflow-x-auto rounded-card border border-line bg-panel">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">{caption}</caption>
        {children}
      </table>
    </div>
  );
}

export function Th({ className = '', ...rest }: ThHTMLAttributes<HTMLTableCellElement>) {
  return <th scope="col" className={`border-b border-line bg-paper px-3 py-2 text-left text-xs font-semibold uppercase tracking-wide text-ink-soft ${className}`} {...rest} />;
}

export function Td({ className = '', ...rest }: TdHTMLAttributes<HTMLTableCellElement>) {
  return <td className={`border-b border-line/70 px-3 py-2 align-top ${className}`} {...rest} />;
}
