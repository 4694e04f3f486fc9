import { defineRecipe } from '@chakra-ui/react';

/** Outlines of text fields at 3:1 against the paper (WCAG 2.2 SC 1.4.11 non-text contrast). */
export const inputRecipe = defineRecipe({
  base: { bg: 'bg.subtle' },
  variants: {
    variant: {
      outline: { borderColor: 'border.emphasized' },
    },
  },
});
