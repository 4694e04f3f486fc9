import { createSystem, defaultBaseConfig, defineConfig } from '@chakra-ui/react';
import { semanticTokens, tokens } from '@nappe/shared/brand';
import {
  alertSlotRecipe as chakraAlert,
  badgeRecipe,
  animationStyles,
  breakpoints,
  buttonRecipe as chakraButton,
  cardSlotRecipe,
  checkboxSlotRecipe,
  comboboxSlotRecipe,
  containerRecipe,
  cssVarsPrefix,
  cssVarsRoot,
  dialogSlotRecipe,
  drawerSlotRecipe,
  emptyStateSlotRecipe,
  fieldSlotRecipe,
  fieldsetSlotRecipe,
  globalCss as chakraGlobalCss,
  headingRecipe as chakraHeading,
  iconRecipe,
  inputAddonRecipe,
  inputRecipe as chakraInput,
  keyframes,
  layerStyles,
  linkRecipe,
  listSlotRecipe,
  nativeSelectSlotRecipe,
  progressSlotRecipe,
  radioGroupSlotRecipe,
  semanticTokens as chakraSemanticTokens,
  separatorRecipe,
  skeletonRecipe,
  skipNavLinkRecipe,
  spinnerRecipe,
  switchSlotRecipe,
  tableSlotRecipe,
  textareaRecipe,
  textStyles,
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

/**
 * Chakra's base (utilities, conditions) plus only the recipes these screens use: the full
 * default theme carries ~80 component recipes and would put ~30 kB gzip on the first load.
 * A component whose recipe is missing renders unstyled, so add its recipe here when you use it.
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
      badge: badgeRecipe,
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
      textarea: textareaRecipe,
    },
    slotRecipes: {
      alert: chakraAlert,
      card: cardSlotRecipe,
      checkbox: checkboxSlotRecipe,
      combobox: comboboxSlotRecipe,
      dialog: dialogSlotRecipe,
      drawer: drawerSlotRecipe,
      emptyState: emptyStateSlotRecipe,
      field: fieldSlotRecipe,
      fieldset: fieldsetSlotRecipe,
      list: listSlotRecipe,
      nativeSelect: nativeSelectSlotRecipe,
      progress: progressSlotRecipe,
      radioGroup: radioGroupSlotRecipe,
      switch: switchSlotRecipe,
      table: tableSlotRecipe,
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
    recipes: { button: buttonRecipe, heading: headingRecipe, input: inputRecipe },
    slotRecipes: { alert: alertSlotRecipe },
  },
});

export const system = createSystem(defaultBaseConfig, chakraSlice, nappe);
