import { Icon, type IconProps } from '@chakra-ui/react';
import type { EuAllergenGroup } from '@nappe/shared';
import { iconStroke as s } from '@nappe/web-kit';
import type { ReactNode } from 'react';

/*
 * Small line drawings of our own for the 14 allergen groups of Regulation (EU) 1169/2011
 * Annex II, on the same 24-unit grid and 1.75 stroke as icons.tsx. They always sit beside the
 * allergen's name: an icon is a reading aid, never the only way an allergen is shown.
 * Kept apart from icons.tsx so that only the screens that show allergens load them.
 */

const seed = 'M0-3.6c1.7 1.7 1.9 4.5 0 7.2-1.9-2.7-1.7-5.5 0-7.2Z';

const DRAWINGS: Record<EuAllergenGroup | 'other', ReactNode> = {
  // An ear of wheat: grains paired along the stem.
  gluten: (
    <>
      <path {...s} d="M12 21V7.5" />
      <path {...s} d="M12 7c-.9-1.1-.9-2.8 0-4 .9 1.2.9 2.9 0 4Z" />
      <path {...s} d="M12 10.5c-2.3-.2-3.6-1.7-3.8-3.8 2.2.1 3.6 1.6 3.8 3.8Z" />
      <path {...s} d="M12 10.5c2.3-.2 3.6-1.7 3.8-3.8-2.2.1-3.6 1.6-3.8 3.8Z" />
      <path {...s} d="M12 14.5c-2.3-.2-3.6-1.7-3.8-3.8 2.2.1 3.6 1.6 3.8 3.8Z" />
      <path {...s} d="M12 14.5c2.3-.2 3.6-1.7 3.8-3.8-2.2.1-3.6 1.6-3.8 3.8Z" />
    </>
  ),
  // A curled prawn with its tail fan and feelers.
  crustaceans: (
    <>
      <path {...s} d="M17.5 8A6.6 6.6 0 1 0 13.6 19" />
      <path {...s} d="M13.6 19l-2.4 2.2M13.6 19l1.2 2.5" />
      <path {...s} d="M7.6 9.6l2.2 1.4M7 13.2h2.6M8 16.6l2-1.5" />
      <path {...s} d="M17.5 8c1-1.9 2.5-3 4-3.3M17.5 8c.3-2 .1-3.7-.8-5.2" />
      <circle cx="15.6" cy="9.4" r=".9" fill="currentColor" />
    </>
  ),
  // An egg.
  eggs: <path {...s} d="M12 3c3.6 0 6.3 5.2 6.3 10.2a6.3 6.3 0 0 1-12.6 0C5.7 8.2 8.4 3 12 3Z" />,
  // A fish seen from the side.
  fish: (
    <>
      <path {...s} d="M2.8 12c3-4.4 8.6-5.4 13.2-2.4L20.5 6v12L16 14.4c-4.6 3-10.2 2-13.2-2.4Z" />
      <circle cx="7.6" cy="11.2" r=".9" fill="currentColor" />
    </>
  ),
  // A peanut in its waisted shell.
  peanuts: (
    <>
      <path
        {...s}
        d="M8.8 3.5a4.6 4.6 0 0 1 4.4 5.9c-.3 1 .1 1.7 1.1 2.1a4.6 4.6 0 1 1-5.8 5.6c-.3-1-1-1.4-2-1.6A4.6 4.6 0 0 1 8.8 3.5Z"
      />
      <path {...s} d="M7.5 8.2h.01M10 7h.01M14.4 15.6h.01M16.6 14.4h.01" />
    </>
  ),
  // A soya pod with three beans.
  soybeans: (
    <>
      <path {...s} d="M4 20c0-8 6.4-14.6 16-16-.9 9.4-7.4 15.7-16 16Z" />
      <circle {...s} cx="8.6" cy="15.4" r="1.5" />
      <circle {...s} cx="12" cy="12" r="1.5" />
      <circle {...s} cx="15.4" cy="8.6" r="1.5" />
    </>
  ),
  // A milk bottle, filled to the shoulder.
  milk: (
    <>
      <path {...s} d="M9.5 3h5v3l2 3v10.5a1.5 1.5 0 0 1-1.5 1.5H9a1.5 1.5 0 0 1-1.5-1.5V9l2-3Z" />
      <path {...s} d="M7.5 12.5h9" />
    </>
  ),
  // A hazelnut in its cap.
  nuts: (
    <>
      <path {...s} d="M4.8 10.2c0-3.2 3.2-5.6 7.2-5.6s7.2 2.4 7.2 5.6Z" />
      <path {...s} d="M12 4.6V2.6" />
      <path {...s} d="M6.4 10.2c0 5.3 2.5 10.3 5.6 10.3s5.6-5 5.6-10.3" />
    </>
  ),
  // Three celery stalks with leaves.
  celery: (
    <>
      <path {...s} d="M8.2 21c-.5-4.6-.3-9.2 1-13.4M12 21V7.5M15.8 21c.5-4.6.3-9.2-1-13.4" />
      <path {...s} d="M9.2 7.6C7.4 6.7 6.5 4.8 7 3.2c1.6.6 2.5 2.3 2.2 4.4Z" />
      <path {...s} d="M12 7.5c-1-1.7-1-3.5 0-5 1 1.5 1 3.3 0 5Z" />
      <path {...s} d="M14.8 7.6c1.8-.9 2.7-2.8 2.2-4.4-1.6.6-2.5 2.3-2.2 4.4Z" />
    </>
  ),
  // A mustard pot with its spoon and seeds.
  mustard: (
    <>
      <path {...s} d="M6.2 9.5h11.6l-1.1 10a1.7 1.7 0 0 1-1.7 1.5H9a1.7 1.7 0 0 1-1.7-1.5Z" />
      <path {...s} d="M7.4 9.5V7.6h9.2v1.9M14.2 7.6l2.6-4.8" />
      <circle cx="10.2" cy="14.2" r="1" fill="currentColor" />
      <circle cx="13.8" cy="13.4" r="1" fill="currentColor" />
      <circle cx="12" cy="17" r="1" fill="currentColor" />
    </>
  ),
  // Three sesame seeds.
  sesame: (
    <>
      <path {...s} d={seed} transform="translate(12 6.5)" />
      <path {...s} d={seed} transform="translate(7.5 15) rotate(-40)" />
      <path {...s} d={seed} transform="translate(16.5 15) rotate(40)" />
    </>
  ),
  // A glass of wine, where sulphites are most often met.
  sulphites: (
    <>
      <path {...s} d="M7 3h10c0 5.2-2.1 8.6-5 8.6S7 8.2 7 3Z" />
      <path {...s} d="M7.5 6.2h9M12 11.6V20M8.6 20.5h6.8" />
    </>
  ),
  // A lupin flower spike.
  lupin: (
    <>
      <path {...s} d="M12 21.5V15" />
      <circle {...s} cx="12" cy="3.8" r="1.2" />
      <circle {...s} cx="10.3" cy="7" r="1.3" />
      <circle {...s} cx="13.7" cy="7" r="1.3" />
      <circle {...s} cx="10" cy="10.6" r="1.4" />
      <circle {...s} cx="14" cy="10.6" r="1.4" />
      <path {...s} d="M12 18.5c-2.4-.4-4.3-1.9-4.8-4.3 2.5.2 4.2 1.7 4.8 4.3Z" />
      <path {...s} d="M12 18.5c2.4-.4 4.3-1.9 4.8-4.3-2.5.2-4.2 1.7-4.8 4.3Z" />
    </>
  ),
  // A scallop shell.
  molluscs: (
    <>
      <path {...s} d="M12 20 4.2 10a8.3 8.3 0 0 1 15.6 0Z" />
      <path {...s} d="M12 20 8.2 5.2M12 20V3.8M12 20l3.8-14.8" />
      <path {...s} d="M9.6 21h4.8" />
    </>
  ),
  // Any other food: a ring with a dot.
  other: (
    <>
      <circle {...s} cx="12" cy="12" r="8" />
      <circle cx="12" cy="12" r="2" fill="currentColor" />
    </>
  ),
};

/**
 * The drawing for an EU group or "tree_nuts" (the US name of the group); anything else gets the
 * neutral mark. A specific food ("pine_nut") is drawn as its group by allergen-food-icon.tsx,
 * which needs the shared allergen rules: kept apart so that the menus screens load no rules.
 */
function drawingFor(allergen: string): ReactNode {
  if (allergen === 'tree_nuts') return DRAWINGS.nuts;
  return Object.hasOwn(DRAWINGS, allergen)
    ? DRAWINGS[allergen as EuAllergenGroup | 'other']
    : DRAWINGS.other;
}

export interface AllergenIconProps extends Omit<IconProps, 'children'> {
  /** An EU group ("milk") or "tree_nuts". */
  allergen: string;
}

/** Decorative: the allergen's name is always written beside it. */
export function AllergenIcon({ allergen, ...props }: AllergenIconProps) {
  return (
    <Icon asChild={false} viewBox="0 0 24 24" boxSize="4" flexShrink="0" {...props}>
      {drawingFor(allergen)}
    </Icon>
  );
}
