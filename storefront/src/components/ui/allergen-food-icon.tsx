import { ALLERGENIC_FOODS, euGroupOf, usAllergenOf, type AllergenicFood } from '@nappe/shared';
import { AllergenIcon, type AllergenIconProps } from './allergen-icons';

const FOODS = new Set<string>(ALLERGENIC_FOODS);

/** The group whose drawing stands for `allergen`: itself, or a specific food's group. */
function groupOf(allergen: string): string {
  if (!FOODS.has(allergen)) return allergen;
  const food = allergen as AllergenicFood;
  return euGroupOf(food) ?? (usAllergenOf(food) === 'tree_nuts' ? 'nuts' : 'other');
}

export interface FoodAllergenIconProps extends AllergenIconProps {
  /** An EU group ("milk"), a specific food ("pine_nut") or "tree_nuts". */
  allergen: string;
}

/** Decorative, like AllergenIcon; a specific food is drawn as its group. */
export function FoodAllergenIcon({ allergen, ...props }: FoodAllergenIconProps) {
  return <AllergenIcon allergen={groupOf(allergen)} {...props} />;
}
