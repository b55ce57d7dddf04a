import { describe, expect, it } from 'vitest';
import { middleSizeRatio } from './middle-size-ratio';

// Gelwright's own rule (see the doc comment): the map is drawn at a size ratio a recipe has.
describe('middleSizeRatio', () => {
  it('takes the middle ratio, the upper middle for an even count, so it is always one of the inputs', () => {
    expect(middleSizeRatio([0.3, 0.1, 0.2])).toBe(0.2);
    expect(middleSizeRatio([0.2, 0.05, 0.1, 0.3])).toBe(0.2);
    const ratios = [0.011, 0.07, 0.031, 0.052];
    expect(ratios).toContain(middleSizeRatio(ratios));
  });

  it('ignores ratios that are not positive and answers null when none is left', () => {
    expect(middleSizeRatio([0, -1, 0.4])).toBe(0.4);
    expect(middleSizeRatio([])).toBeNull();
    expect(middleSizeRatio([0])).toBeNull();
  });
});
