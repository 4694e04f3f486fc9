import { defineRecipe } from '@chakra-ui/react';

/** Our buttons: rounded pills with a firmer weight; everything else stays Chakra's. */
export const buttonRecipe = defineRecipe({
  base: {
    borderRadius: 'full',
    fontWeight: 'semibold',
    letterSpacing: '0.01em',
  },
});
