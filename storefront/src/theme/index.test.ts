import { tokens } from '@nappe/shared/brand';
import { describe, expect, it } from 'vitest';
import { FONTS } from './index';

describe('font stacks', () => {
  it('are the brand’s, with each shipped font’s stand-in right after it', () => {
    // CSS Fonts 4, font-family: the first available family in the list draws a character; the
    // stand-in must come right after the shipped font and before the brand's own fallbacks.
    expect(FONTS.heading.value.replace(", 'Playfair Display Fallback'", '')).toBe(
      tokens.fonts.heading.value,
    );
    expect(FONTS.heading.value).toMatch(/^'Playfair Display', 'Playfair Display Fallback',/);
    expect(FONTS.body.value.replace(", 'Inter Fallback'", '')).toBe(tokens.fonts.body.value);
    expect(FONTS.body.value).toMatch(/^Inter, 'Inter Fallback',/);
  });
});
