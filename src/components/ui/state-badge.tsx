import { symbol, symbolCircle, symbolCross, symbolDiamond, symbolSquare, symbolStar, symbolTriangle, symbolWye } from 'd3-shape';
import { STATE_LABELS, type ObservedState } from '@shared/states';
import { STATE_STYLE } from '@/lib/state-style';

const SYMBOLS = { circle: symbolCircle, square: symbolSquare, triangle: symbolTriangle, star: symbolStar, wye: symbolWye, diamond: symbolDiamond, cross: symbolCross };

/** The state's shape in its colour, as a small inline SVG. */
export function StateGlyph({ state, size = 12 }: { state: ObservedState; size?: number }) {
  const style = STATE_STYLE[state];
  const path = symbol(SYMBOLS[style.shape], (size * size) / 2.2)() ?? '';
  return (
    <svg width={size} height={size} viewBox={`${-size / 2} ${-size / 2} ${size} ${size}`} aria-hidden className="shrink-0">
      <path d={path} fill={style.colour} stroke="#ffffff" strokeWidth={0.6} />
    </svg>
  );
}

/** A state as words with its glyph: never colour alone. */
export function StateBadge({ state, prefix }: { state: ObservedState | null; prefix?: string }) {
  if (!state) return <span className="text-ink-faint">—</span>;
  return (
    <span className="inline-flex items-center gap-1.5 rounded-full border px-2 py-0.5 text-xs font-medium" style={{ borderColor: STATE_STYLE[state].tint, background: STATE_STYLE[state].tint, color: '#1c2630' }}>
      <StateGlyph state={state} size={10} />
      {prefix ? `${prefix} ` : ''}
      {STATE_LABELS[state]}
    </span>
  );
}

/** A state's glyph and name inline in a sentence. */
export function StateName({ state }: { state: ObservedState }) {
  return (
    <span className="inline-flex items-center gap-1 align-middle text-ink">
      <StateGlyph state={state} size={9} />
      {STATE_LABELS[state]}
    </span>
  );
}

/** ✓, ✕ or – before a bench outcome; hidden from screen readers, as the words beside it say the same. */
export function AgreementTick({ agrees }: { agrees: boolean | null }) {
  return (
    <span aria-hidden className={agrees === false ? 'font-semibold text-brick-700' : agrees ? 'text-leaf-700' : ''}>
      {agrees === true ? '✓' : agrees === false ? '✕' : '–'}
    </span>
  );
}
