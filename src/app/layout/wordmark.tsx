/** Gelwright's mark: four particles held by bonds, and the name. */
export function Wordmark({ large = false }: { large?: boolean }) {
  const size = large ? 36 : 26;
  return (
    <span className="inline-flex items-center gap-2.5">
      <svg width={size} height={size} viewBox="0 0 32 32" aria-hidden>
        <rect width="32" height="32" rx="7" fill="#2c6e7f" />
        <path d="M11 12 19 11 21 19 12 21z" fill="none" stroke="#f6f5f1" strokeWidth="1.6" />
        <g fill="#f6f5f1">
          <circle cx="11" cy="12" r="4" />
          <circle cx="19" cy="11" r="3" />
          <circle cx="21" cy="19" r="4" />
          <circle cx="12" cy="21" r="3" />
        </g>
      </svg>
      <span className={`${large ? 'text-2xl' : 'text-lg'} font-semibold tracking-tight text-ink`}>Gelwright</span>
    </span>
  );
}
