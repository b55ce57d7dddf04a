import { describe, expect, it } from 'vitest';
import { fittingLabel } from './axis-label';

const label = 'B2* — reduced second virial coefficient (stickier upward)';

describe('fittingLabel', () => {
  it('keeps the whole label where it fits', () => {
    expect(fittingLabel(label, 600)).toBe(label);
  });

  it('drops the closing parenthesis, then everything but the symbol, as room shrinks', () => {
    expect(fittingLabel(label, 300)).toBe('B2* — reduced second virial coefficient');
    expect(fittingLabel(label, 120)).toBe('B2*');
    expect(fittingLabel(label, 5)).toBe('B2*');
  });
});
