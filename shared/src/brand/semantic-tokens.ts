import type { PaletteName, Step } from './tokens.js';

const ref = (name: PaletteName, step: Step) => ({ value: `{colors.${name}.${step}}` });

/** Tokens every palette needs so that `colorPalette="…"` works on Chakra's components. */
function colorPalette(
  name: PaletteName,
  p: {
    solid: Step;
    contrast: { name: PaletteName; step: Step };
    fg: Step;
    muted: Step;
    subtle: Step;
    emphasized: Step;
    focusRing: Step;
    border: Step;
  },
) {
  return {
    solid: ref(name, p.solid),
    contrast: ref(p.contrast.name, p.contrast.step),
    fg: ref(name, p.fg),
    muted: ref(name, p.muted),
    subtle: ref(name, p.subtle),
    emphasized: ref(name, p.emphasized),
    focusRing: ref(name, p.focusRing),
    border: ref(name, p.border),
  };
}

/**
 * Light scheme only for now: the cream paper is part of the look. Pairs used for text are
 * checked for WCAG 2.2 AA contrast in `contrast.test.ts`.
 */
export const semanticColors = {
  bg: {
    DEFAULT: ref('cream', 100),
    subtle: ref('cream', 50),
    muted: ref('cream', 200),
    emphasized: ref('cream', 300),
    panel: ref('cream', 50),
    inverted: ref('ink', 900),
    error: ref('berry', 50),
    warning: ref('caramel', 50),
    success: ref('pistachio', 50),
    info: ref('ink', 50),
  },
  fg: {
    DEFAULT: ref('ink', 900),
    muted: ref('ink', 600),
    subtle: ref('gray', 600),
    inverted: ref('cream', 100),
    error: ref('berry', 600),
    warning: ref('caramel', 800),
    success: ref('pistachio', 800),
    info: ref('ink', 700),
  },
  border: {
    DEFAULT: ref('cream', 300),
    muted: ref('cream', 200),
    subtle: ref('cream', 200),
    /** Form-control outlines: at least 3:1 on the paper (WCAG 2.2 SC 1.4.11). */
    emphasized: ref('gray', 500),
    inverted: ref('ink', 800),
    error: ref('berry', 600),
    warning: ref('caramel', 600),
    success: ref('pistachio', 700),
    info: ref('ink', 500),
  },
  /** Aubergine ink: the default palette (buttons, links, focus). */
  brand: colorPalette('ink', {
    solid: 900,
    contrast: { name: 'cream', step: 100 },
    fg: 800,
    muted: 100,
    subtle: 50,
    emphasized: 200,
    focusRing: 700,
    border: 300,
  }),
  /** Pistachio: calls to action and good news. */
  accent: {
    DEFAULT: ref('pistachio', 500),
    ...colorPalette('pistachio', {
      solid: 500,
      contrast: { name: 'ink', step: 900 },
      fg: 800,
      muted: 200,
      subtle: 100,
      emphasized: 300,
      focusRing: 700,
      border: 600,
    }),
  },
  /** Caramel: highlights and warnings. */
  caramel: colorPalette('caramel', {
    solid: 500,
    contrast: { name: 'ink', step: 900 },
    fg: 800,
    muted: 200,
    subtle: 100,
    emphasized: 300,
    focusRing: 700,
    border: 400,
  }),
  /** Berry: alerts and errors only. */
  danger: {
    DEFAULT: ref('berry', 600),
    ...colorPalette('berry', {
      solid: 600,
      contrast: { name: 'cream', step: 50 },
      fg: 700,
      muted: 100,
      subtle: 50,
      emphasized: 200,
      focusRing: 600,
      border: 400,
    }),
  },
  /** Chakra's neutral palette, made warm; its focus ring darkened to 3:1 on the paper. */
  gray: colorPalette('gray', {
    solid: 900,
    contrast: { name: 'cream', step: 50 },
    fg: 800,
    muted: 200,
    subtle: 100,
    emphasized: 300,
    focusRing: 700,
    border: 200,
  }),
} as const;

export const semanticTokens = {
  colors: semanticColors,
  shadows: {
    card: { value: '0 1px 2px rgba(43, 30, 47, 0.06), 0 8px 24px rgba(43, 30, 47, 0.06)' },
  },
};
