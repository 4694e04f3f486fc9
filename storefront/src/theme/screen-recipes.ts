// The recipes of the screens' own components, added to the system when the first screen's code
// loads (every route's `lazy` waits for this module too: see `withScreenRecipes` in the router).
import { alertSlotRecipe as chakraAlert } from '@chakra-ui/react/theme/recipes/alert';
import { cardSlotRecipe } from '@chakra-ui/react/theme/recipes/card';
import { checkboxSlotRecipe } from '@chakra-ui/react/theme/recipes/checkbox';
import { dialogSlotRecipe } from '@chakra-ui/react/theme/recipes/dialog';
import { emptyStateSlotRecipe } from '@chakra-ui/react/theme/recipes/empty-state';
import { fieldSlotRecipe } from '@chakra-ui/react/theme/recipes/field';
import { inputRecipe as chakraInput } from '@chakra-ui/react/theme/recipes/input';
import { inputAddonRecipe } from '@chakra-ui/react/theme/recipes/input-addon';
import { listSlotRecipe } from '@chakra-ui/react/theme/recipes/list';
import { nativeSelectSlotRecipe as chakraNativeSelect } from '@chakra-ui/react/theme/recipes/native-select';
import { radioCardSlotRecipe } from '@chakra-ui/react/theme/recipes/radio-card';
import { separatorRecipe } from '@chakra-ui/react/theme/recipes/separator';
import { skeletonRecipe } from '@chakra-ui/react/theme/recipes/skeleton';
import { tableSlotRecipe } from '@chakra-ui/react/theme/recipes/table';
import { tabsSlotRecipe } from '@chakra-ui/react/theme/recipes/tabs';
import { textareaRecipe as chakraTextarea } from '@chakra-ui/react/theme/recipes/textarea';
import { timelineSlotRecipe } from '@chakra-ui/react/theme/recipes/timeline';
import { mergeConfigs, type SystemConfig } from '@chakra-ui/react';
import { system } from './index';
import { alertSlotRecipe } from './recipes/alert';
import { inputRecipe } from './recipes/input';
import { nativeSelectSlotRecipe } from './recipes/native-select';
import { textareaRecipe } from './recipes/textarea';

/**
 * Adds recipes to the running system, each merged from the configs given (Chakra's, then ours),
 * as `createSystem` would have merged them. Chakra reads a recipe from the system's theme when a
 * component first renders with it, so recipes added before their screens render behave exactly
 * as if they had been there from the start. A recipe already present is left as it is.
 */
export function addRecipes(...configs: SystemConfig[]): void {
  const added = mergeConfigs(...configs).theme ?? {};
  const theme = (system._config.theme ??= {});
  const recipes = (theme.recipes ??= {});
  const slotRecipes = (theme.slotRecipes ??= {});
  for (const [key, recipe] of Object.entries(added.recipes ?? {})) recipes[key] ??= recipe;
  for (const [key, recipe] of Object.entries(added.slotRecipes ?? {})) slotRecipes[key] ??= recipe;
}

addRecipes(
  {
    theme: {
      recipes: {
        input: chakraInput,
        inputAddon: inputAddonRecipe,
        separator: separatorRecipe,
        skeleton: skeletonRecipe,
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
  },
  {
    theme: {
      recipes: { input: inputRecipe, textarea: textareaRecipe },
      slotRecipes: { alert: alertSlotRecipe, nativeSelect: nativeSelectSlotRecipe },
    },
  },
);
