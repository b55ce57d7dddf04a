import { describe, expect, it } from 'vitest';
import { symbolParts } from './symbol-text';

describe('symbolParts', () => {
  it('splits a reservoir polymer fraction into base, subscript and superscript', () => {
    expect(symbolParts('φ_p^R')).toEqual([
      { text: 'φ', shift: 'base' },
      { text: 'p', shift: 'sub' },
      { text: 'R', shift: 'sup' },
    ]);
  });

  it('ends a subscript at a space and keeps the rest of a label as it is', () => {
    expect(symbolParts('Pe_g at 20 °C')).toEqual([
      { text: 'Pe', shift: 'base' },
      { text: 'g', shift: 'sub' },
      { text: ' at 20 °C', shift: 'base' },
    ]);
    expect(symbolParts('B2*')).toEqual([{ text: 'B2*', shift: 'base' }]);
  });
});
