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

/** The same inside an SVG <text>: tspans shifted down or up and set smaller. */
export function SvgSymbolText({ text }: { text: string }) {
  return (
    <>
      {symbolParts(text).map((part, i) => {
        if (part.shift === 'base') return <tspan key={i}>{part.text}</tspan>;
        // baseline-shift is not honoured everywhere an SVG is opened; dy is, and the next run undoes it.
        const dy = part.shift === 'sub' ? '0.3em' : '-0.45em';
        const back = part.shift === 'sub' ? '-0.3em' : '0.45em';
        return (
          <Fragment key={i}>
            <tspan dy={dy} fontSize="75%">{part.text}</tspan>
            <tspan dy={back}>{'\u200b'}</tspan>
          </Fragment>
        );
      })}
    </>
  );
}
