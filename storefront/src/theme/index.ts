import { createSystem, defaultBaseConfig, defineConfig } from '@chakra-ui/react';
import { semanticTokens, tokens } from '@nappe/shared/brand';
import {
  alertSlotRecipe as chakraAlert,
  animationStyles,
  breakpoints,
  buttonRecipe as chakraButton,
  cardSlotRecipe,
  checkboxSlotRecipe,
  containerRecipe,
  cssVarsPrefix,
  cssVarsRoot,
  dialogSlotRecipe,
  emptyStateSlotRecipe,
  fieldSlotRecipe,
  globalCss as chakraGlobalCss,
  headingRecipe as chakraHeading,
  iconRecipe,
  inputAddonRecipe,
  inputRecipe as chakraInput,
  keyframes,
  layerStyles,
  linkRecipe,
  listSlotRecipe,
  nativeSelectSlotRecipe as chakraNativeSelect,
  radioCardSlotRecipe,
  semanticTokens as chakraSemanticTokens,
  separatorRecipe,
  skeletonRecipe,
  skipNavLinkRecipe,
  spinnerRecipe,
  tableSlotRecipe,
  tabsSlotRecipe,
  textareaRecipe as chakraTextarea,
  textStyles,
  timelineSlotRecipe,
  tokens as chakraTokens,
} from '@chakra-ui/react/theme';
import '@fontsource/inter/400.css';
import '@fontsource/inter/500.css';
import '@fontsource/inter/600.css';
import '@fontsource/playfair-display/400.css';
import '@fontsource/playfair-display/700.css';
import { alertSlotRecipe } from './recipes/alert';
import { buttonRecipe } from './recipes/button';
import { headingRecipe } from './recipes/heading';
import { inputRecipe } from './recipes/input';
import { nativeSelectSlotRecipe } from './recipes/native-select';
import { textareaRecipe } from './recipes/textarea';

/**
 * Chakra's base (utilities, conditions) plus only the recipes these screens use: the full
 * default theme carries ~80 component recipes and would put ~30 kB gzip on the first load.
 * A component whose recipe is missing renders unstyled, so add its recipe here when you use it.
 *
 * Why not hand the booking screens' recipes to their components (the `recipe` prop) from the
 * lazy chunks instead? Measured: every recipe is reachable from the entry through Chakra's theme
 * barrel, so the bundler then keeps the whole default theme in the first-load chunks (+15 KiB
 * gzip). Registered here, the booking screens' nine recipes cost about 3 KiB gzip.
 */
const chakraSlice = defineConfig({
  preflight: true,
  cssVarsPrefix,
  cssVarsRoot,
  globalCss: chakraGlobalCss,
  theme: {
    breakpoints,
    keyframes,
    tokens: chakraTokens,
    semanticTokens: chakraSemanticTokens,
    textStyles,
    layerStyles,
    animationStyles,
    recipes: {
      button: chakraButton,
      container: containerRecipe,
      heading: chakraHeading,
      icon: iconRecipe,
      input: chakraInput,
      inputAddon: inputAddonRecipe,
      link: linkRecipe,
      separator: separatorRecipe,
      skeleton: skeletonRecipe,
      skipNavLink: skipNavLinkRecipe,
      spinner: spinnerRecipe,
      textarea: chakraTextarea,
    },
    slotRecipes: {
      alert: chakraAlert,
      card: cardSlotRecipe,
      checkbox: checkboxSlotRecipe,
      dialog: dialogSlotRecipe,
      emptyState: emptyStateSlotRecipe,
      field: fieldSlotRecipe,
      list: listSlotRecipe,
      nativeSelect: chakraNativeSelect,
      radioCard: radioCardSlotRecipe,
      table: tableSlotRecipe,
      tabs: tabsSlotRecipe,
      timeline: timelineSlotRecipe,
    },
  },
});

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
    tokens,
    semanticTokens,
    recipes: {
      button: buttonRecipe,
      heading: headingRecipe,
      input: inputRecipe,
      textarea: textareaRecipe,
    },
    slotRecipes: { alert: alertSlotRecipe, nativeSelect: nativeSelectSlotRecipe },
  },
});

export const system = createSystem(defaultBaseConfig, chakraSlice, nappe);
