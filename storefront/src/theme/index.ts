import { createSystem, defaultBaseConfig, defineConfig } from '@chakra-ui/react';
// Chakra's theme, from the modules it is made of rather than its index: the index gathers every
// token into one object, so importing anything from it ships all ten of Chakra's default colour
// palettes (measured: 3.8 KiB gzip of startup JavaScript, and about 400 more CSS variables built
// at startup and sent in the build-time HTML). Nappe paints with its own palettes (shared/brand).
// `@chakra-ui/react/theme/…` is resolved to those modules by vite.config.ts and tsconfig.json.
import { breakpoints } from '@chakra-ui/react/theme/breakpoints';
import { globalCss as chakraGlobalCss } from '@chakra-ui/react/theme/global-css';
import { layerStyles } from '@chakra-ui/react/theme/layer-styles';
import { buttonRecipe as chakraButton } from '@chakra-ui/react/theme/recipes/button';
import { containerRecipe } from '@chakra-ui/react/theme/recipes/container';
import { headingRecipe as chakraHeading } from '@chakra-ui/react/theme/recipes/heading';
import { iconRecipe } from '@chakra-ui/react/theme/recipes/icon';
import { linkRecipe } from '@chakra-ui/react/theme/recipes/link';
import { skipNavLinkRecipe } from '@chakra-ui/react/theme/recipes/skip-nav-link';
import { spinnerRecipe } from '@chakra-ui/react/theme/recipes/spinner';
import { semanticRadii } from '@chakra-ui/react/theme/semantic-tokens/radii';
import { semanticShadows } from '@chakra-ui/react/theme/semantic-tokens/shadows';
import { textStyles } from '@chakra-ui/react/theme/text-styles';
import { animations } from '@chakra-ui/react/theme/tokens/animations';
import { aspectRatios } from '@chakra-ui/react/theme/tokens/aspect-ratios';
import { blurs } from '@chakra-ui/react/theme/tokens/blurs';
import { borders } from '@chakra-ui/react/theme/tokens/borders';
import { cursor } from '@chakra-ui/react/theme/tokens/cursor';
import { durations } from '@chakra-ui/react/theme/tokens/durations';
import { easings } from '@chakra-ui/react/theme/tokens/easings';
import { fontSizes } from '@chakra-ui/react/theme/tokens/font-sizes';
import { fontWeights } from '@chakra-ui/react/theme/tokens/font-weights';
import { fonts } from '@chakra-ui/react/theme/tokens/fonts';
import { keyframes } from '@chakra-ui/react/theme/tokens/keyframes';
import { letterSpacings } from '@chakra-ui/react/theme/tokens/letter-spacing';
import { lineHeights } from '@chakra-ui/react/theme/tokens/line-heights';
import { radii } from '@chakra-ui/react/theme/tokens/radius';
import { sizes } from '@chakra-ui/react/theme/tokens/sizes';
import { spacing } from '@chakra-ui/react/theme/tokens/spacing';
import { zIndices } from '@chakra-ui/react/theme/tokens/z-indices';
import { semanticTokens, tokens } from '@nappe/shared/brand';
import '@fontsource/inter/400.css';
import '@fontsource/inter/500.css';
import '@fontsource/inter/600.css';
import '@fontsource/playfair-display/400.css';
import '@fontsource/playfair-display/700.css';
import './fallback-fonts.css';
import { buttonRecipe } from './recipes/button';
import { headingRecipe } from './recipes/heading';

/**
 * Chakra's base (utilities, conditions) and tokens, and the recipes of what every page shows
 * before its screen has loaded: the header, the footer, the loading and the error page. The
 * screens' recipes (cards, alerts, forms, dialogs, tables…) arrive with the screens' code
 * (`screen-recipes.ts`, loaded by every route's `lazy`), so they are not startup JavaScript.
 * A component whose recipe is in neither renders unstyled: add its recipe where it belongs.
 * Chakra's animation styles (`animationStyle`, used by its select and popover recipes) are left
 * out: no recipe or screen here uses them.
 */
const chakraSlice = defineConfig({
  preflight: true,
  cssVarsPrefix: 'chakra',
  cssVarsRoot: ':where(html, .chakra-theme)',
  globalCss: chakraGlobalCss,
  theme: {
    breakpoints,
    keyframes,
    tokens: {
      aspectRatios,
      animations,
      blurs,
      borders,
      // Chakra's own colour tokens that its recipes name outside a palette; the palettes are ours.
      colors: {
        transparent: { value: 'transparent' },
        current: { value: 'currentColor' },
        black: { value: '#09090B' },
        white: { value: '#FFFFFF' },
      },
      durations,
      easings,
      fonts,
      fontSizes,
      fontWeights,
      letterSpacings,
      lineHeights,
      radii,
      spacing,
      sizes,
      zIndex: zIndices,
      cursor,
    },
    semanticTokens: { shadows: semanticShadows, radii: semanticRadii },
    textStyles,
    layerStyles,
    recipes: {
      button: chakraButton,
      container: containerRecipe,
      heading: chakraHeading,
      icon: iconRecipe,
      link: linkRecipe,
      skipNavLink: skipNavLinkRecipe,
      spinner: spinnerRecipe,
    },
    slotRecipes: {},
  },
});

/**
 * The brand's font stacks (shared/brand) with each shipped font's metric-matched stand-in right
 * after it (fallback-fonts.css), used until the shipped font has loaded. index.test.ts checks
 * that these are the brand's stacks plus the stand-ins.
 */
export const FONTS = {
  heading: {
    value: "'Playfair Display', 'Playfair Display Fallback', Georgia, 'Times New Roman', serif",
  },
  body: {
    value: "Inter, 'Inter Fallback', system-ui, -apple-system, 'Segoe UI', Roboto, sans-serif",
  },
};

const nappe = defineConfig({
  globalCss: {
    html: {
      colorPalette: 'brand',
      scrollBehavior: 'smooth',
      _motionReduce: { scrollBehavior: 'auto' },
    },
    body: { bg: 'bg', color: 'fg', fontFamily: 'body', minHeight: '100dvh' },
  },
  theme: {
    tokens: { ...tokens, fonts: FONTS },
    semanticTokens,
    recipes: { button: buttonRecipe, heading: headingRecipe },
  },
});

export const system = createSystem(defaultBaseConfig, chakraSlice, nappe);
