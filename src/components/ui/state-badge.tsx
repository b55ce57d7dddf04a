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
