import { defineSlotRecipe } from '@chakra-ui/react';
import { alertAnatomy } from '@chakra-ui/react/anatomy';

/** Alerts speak in our palette: berry for errors, caramel for warnings, pistachio for success. */
export const alertSlotRecipe = defineSlotRecipe({
  slots: alertAnatomy.keys(),
  variants: {
    status: {
      info: { root: { colorPalette: 'brand' } },
      warning: { root: { colorPalette: 'caramel' } },
      success: { root: { colorPalette: 'accent' } },
      error: { root: { colorPalette: 'danger' } },
      neutral: { root: { colorPalette: 'gray' } },
    },
  },
});
