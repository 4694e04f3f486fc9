import { defineSlotRecipe } from '@chakra-ui/react';
import { nativeSelectAnatomy } from '@chakra-ui/react/anatomy';

/** Selects outlined like our inputs: 3:1 against the paper (WCAG 2.2 SC 1.4.11). */
export const nativeSelectSlotRecipe = defineSlotRecipe({
  slots: nativeSelectAnatomy.keys(),
  variants: {
    variant: {
      outline: { field: { bg: 'bg.subtle', borderColor: 'border.emphasized' } },
    },
  },
});
