/**
 * Whether the bench agreed with the prediction, as a word and a mark, so it reads without
 * colour: a tick for agreement, a cross for disagreement, a dash where nothing was compared.
 */
export function AgreementMark({ agrees }: { agrees: boolean | null }) {
  if (agrees === true)
    return (
      <span className="inline-flex items-center gap-1.5 whitespace-nowrap text-leaf-700">
        <span aria-hidden className="inline-flex h-4 w-4 items-center justify-center rounded-full border border-leaf-500 text-[0.65rem] leading-none">✓</span>
        Agrees
      </span>
    );
  if (agrees === false)
    return (
      <span className="inline-flex items-center gap-1.5 whitespace-nowrap font-semibold text-brick-700">
        <span aria-hidden className="inline-flex h-4 w-4 items-center justify-center rounded-sm bg-brick-500 text-[0.65rem] leading-none text-white">✕</span>
        Disagrees
      </span>
    );
  return (
    <span className="inline-flex items-center gap-1.5 whitespace-nowrap text-ink-soft">
      <span aria-hidden className="inline-flex h-4 w-4 items-center justify-center text-[0.75rem] leading-none">–</span>
      Not compared
    </span>
  );
}
