import { foodRule, type AllergenicFood } from '@nappe/shared';
import type { IngredientResponse } from '../api/types';

const FORM_WORDS: Record<string, string> = {
  glucose_syrup: 'glucose syrup',
  dextrose: 'dextrose',
  maltodextrin: 'maltodextrin',
  fully_refined_oil: 'fully refined oil',
  tocopherols: 'tocopherols',
  phytosterols: 'phytosterols',
  plant_stanol_ester: 'plant stanol ester',
  distillate: 'distillate',
  lactitol: 'lactitol',
  vitamin_carrier: 'vitamin carrier',
  fining_agent: 'fining agent',
};

export function formWord(form: string): string {
  return FORM_WORDS[form] ?? form.replace(/_/g, ' ');
}

export function foodLabel(food: AllergenicFood): string {
  return foodRule(food).label;
}

/** "Contains milk, soya · may contain almonds" — an ingredient's allergens as one line of text. */
export function ingredientAllergenText(ingredient: IngredientResponse): string {
  const contains = ingredient.allergens.contains.map(
    (s) => `${foodLabel(s.food)}${s.form ? ` (as ${formWord(s.form)})` : ''}`,
  );
  const traces = ingredient.allergens.mayContain.map(foodLabel);
  const parts: string[] = [];
  if (contains.length > 0) parts.push(`Contains ${contains.join(', ')}`);
  if (traces.length > 0)
    parts.push(`${parts.length > 0 ? 'may' : 'May'} contain ${traces.join(', ')}`);
  return parts.length > 0 ? parts.join(' · ') : 'None declared';
}
