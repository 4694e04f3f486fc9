import { defineRecipe } from '@chakra-ui/react';

/** Playfair Display is shipped at 400 and 700 only: keep headings on those weights. */
export const headingRecipe = defineRecipe({
  base: {
    fontFamily: 'heading',
    fontWeight: 'bold',
    letterSpacing: '-0.01em',
    color: 'fg',
  },
});
