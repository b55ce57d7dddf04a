import { Fragment } from 'react';

export interface SymbolPart {
  text: string;
  /** 'sub' after "_", 'sup' after "^"; a part runs to the next "_", "^", space or bracket. */
  shift: 'base' | 'sub' | 'sup';
}

/**
 * Splits a plain-text symbol written as in the physics module ("φ_p^R", "Pe_g") into base,
 * subscript and superscript runs, so the screens can typeset it. Text without "_" or "^" is one
 * base run.
 */
export function symbolParts(text: string): SymbolPart[] {
  const parts: SymbolPart[] = [];
  let shift: SymbolPart['shift'] = 'base';
  let run = '';
  const flush = () => {
    if (run) parts.push({ text: run, shift });
    run = '';
  };
  for (const char of text) {
    if (char === '_' || char === '^') {
      flush();
      shift = char === '_' ? 'sub' : 'sup';
    } else if (shift !== 'base' && /[\s()[\],;:—–-]/.test(char)) {
      flush();
      shift = 'base';
      run = char;
    } else {
      run += char;
    }
  }
  flush();
  return parts;
}

/** A symbol such as "φ_p^R" in HTML, with <sub> and <sup>. */
export function SymbolText({ text }: { text: string }) {
  return (
    <>
      {symbolParts(text).map((part, i) =>
        part.shift === 'sub' ? <sub key={i}>{part.text}</sub> : part.shift === 'sup' ? <sup key={i}>{part.text}</sup> : <Fragment key={i}>{part.text}</Fragment>,
      )}
    </>
  );
}

/** How far sub- and superscripts sit from the baseline, in ems of the surrounding text, and their size. */
const SHIFT_EM = { base: 0, sub: 0.3, sup: -0.45 };
const SHIFTED_SIZE = 0.75;

/**
 * The same inside an SVG <text>: each run a tspan moved to its baseline with dy (honoured
 * wherever an SVG is opened, unlike baseline-shift). dy is in the tspan's own ems, so a smaller
 * run's move is scaled up to land where the surrounding text's ems say.
 */
export function SvgSymbolText({ text }: { text: string }) {
  let offset = 0;
  return (
    <>
      {symbolParts(text).map((part, i) => {
        const size = part.shift === 'base' ? 1 : SHIFTED_SIZE;
        const dy = (SHIFT_EM[part.shift] - offset) / size;
        offset = SHIFT_EM[part.shift];
        return (
          <tspan key={i} dy={dy === 0 ? undefined : `${Number(dy.toFixed(3))}em`} fontSize={size === 1 ? undefined : `${size * 100}%`}>
            {part.text}
          </tspan>
        );
      })}
    </>
  );
}
