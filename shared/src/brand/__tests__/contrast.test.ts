import { describe, expect, it } from 'vitest';
import { semanticColors } from '../semantic-tokens.js';
import { palette, type PaletteName } from '../tokens.js';

/** Relative luminance, WCAG 2.2 "Definitions: relative luminance" (sRGB, 0.04045 threshold). */
function luminance(hex: string): number {
  const channels = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
  const [r, g, b] = channels.map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
}

/** Contrast ratio, WCAG 2.2 "Definitions: contrast ratio": (L1 + 0.05) / (L2 + 0.05). */
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi! + 0.05) / (lo! + 0.05);
}

type TokenNode = { value: string } | { [key: string]: TokenNode };

/** "fg.muted" → the hex it resolves to through our semantic tokens and palette. */
function resolve(token: string): string {
  let node: TokenNode | undefined = semanticColors as unknown as TokenNode;
  for (const part of token.split('.')) {
    node = (node as Record<string, TokenNode>)[part];
    if (!node) throw new Error(`No semantic colour ${token}`);
  }
  if (!('value' in node)) node = (node as Record<string, TokenNode>).DEFAULT;
  const match = /^\{colors\.(\w+)\.(\d+)\}$/.exec((node as { value: string }).value);
  if (!match) throw new Error(`${token} is not a palette reference`);
  const scale = palette[match[1] as PaletteName] as Record<string, string>;
  return scale[match[2]!]!;
}

describe('WCAG formulas', () => {
  it('match published reference values', () => {
    // WCAG 2.2: black on white is the maximum, 21:1.
    expect(contrast('#000000', '#FFFFFF')).toBeCloseTo(21, 5);
    // #767676 on white is 4.54:1, the lightest grey that passes AA (from memory, WebAIM's checker).
    expect(contrast('#767676', '#FFFFFF')).toBeCloseTo(4.54, 2);
  });

  it('the design card anchors are where the palette says', () => {
    expect(palette.ink[900]).toBe('#2B1E2F');
    expect(palette.cream[100]).toBe('#FBF6EE');
    expect(palette.pistachio[500]).toBe('#8FA36B');
    expect(palette.caramel[500]).toBe('#C2813A');
    expect(palette.berry[600]).toBe('#A3324A');
  });
});

describe('our colour pairs meet WCAG 2.2 AA', () => {
  // SC 1.4.3: body text needs 4.5:1.
  const text: [fg: string, bg: string][] = [
    ['fg', 'bg'],
    ['fg', 'bg.subtle'],
    ['fg', 'bg.muted'],
    ['fg', 'bg.emphasized'],
    ['fg.muted', 'bg'],
    ['fg.muted', 'bg.muted'],
    ['fg.muted', 'bg.panel'],
    ['fg.subtle', 'bg'],
    ['fg.error', 'bg'],
    ['fg.error', 'bg.panel'],
    ['fg.warning', 'bg'],
    ['fg.success', 'bg'],
    ['fg.inverted', 'bg.inverted'],
    ['caramel.fg', 'bg'],
    ['accent.fg', 'bg'],
    ['brand.fg', 'bg'],
    ['fg', 'accent.subtle'],
    ['brand.contrast', 'brand.solid'],
    ['accent.contrast', 'accent.solid'],
    ['caramel.contrast', 'caramel.solid'],
    ['danger.contrast', 'danger.solid'],
    ['gray.contrast', 'gray.solid'],
    // Alerts (subtle variant): the palette's fg on its subtle background.
    ['danger.fg', 'danger.subtle'],
    ['caramel.fg', 'caramel.subtle'],
    ['accent.fg', 'accent.subtle'],
    ['brand.fg', 'brand.subtle'],
  ];
  it.each(text)('%s on %s ≥ 4.5:1', (fg, bg) => {
    expect(contrast(resolve(fg), resolve(bg))).toBeGreaterThanOrEqual(4.5);
  });

  // SC 1.4.11: focus indicators and form-control outlines need 3:1 against what is next to them.
  const nonText: [fg: string, bg: string][] = [
    ['brand.focusRing', 'bg'],
    ['accent.focusRing', 'bg'],
    ['gray.focusRing', 'bg'],
    ['danger.focusRing', 'bg'],
    ['border.emphasized', 'bg.subtle'],
    ['border.emphasized', 'bg'],
    ['border.error', 'bg.subtle'],
  ];
  it.each(nonText)('%s on %s ≥ 3:1', (fg, bg) => {
    expect(contrast(resolve(fg), resolve(bg))).toBeGreaterThanOrEqual(3);
  });

  it('says plainly that raw pistachio and caramel are not for text on the paper', () => {
    // Both anchors fall under 4.5:1 on cream, which is why text uses their darker steps.
    expect(contrast(palette.pistachio[500], palette.cream[100])).toBeLessThan(4.5);
    expect(contrast(palette.caramel[500], palette.cream[100])).toBeLessThan(4.5);
  });
});
