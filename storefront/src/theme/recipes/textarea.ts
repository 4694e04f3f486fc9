import { defineRecipe } from '@chakra-ui/react';

/** Textareas outlined like our inputs: 3:1 against the paper (WCAG 2.2 SC 1.4.11). */
export const textareaRecipe = defineRecipe({
  base: { bg: 'bg.subtle' },
  variants: {
    variant: {
      outline: { borderColor: 'border.emphasized' },
    },
  },
});
