import type { Dessert, DessertComponent } from '@nappe/shared';
import type { DessertResponse } from '../api/types';
import {
  numberToInput,
  optionalText,
  parseNumber,
  requiredNumber,
  type Conversion,
} from './form-resolver';

export interface ComponentValues {
  recipeId: string;
  quantity: string;
  unit: 'g' | 'piece';
  pieceWeight: string;
  note: string;
}

export interface DessertFormValues {
  name: string;
  description: string;
  platingNotes: string;
  components: ComponentValues[];
}

export const emptyComponent = (): ComponentValues => ({
  recipeId: '',
  quantity: '',
  unit: 'g',
  pieceWeight: '',
  note: '',
});

export function dessertToFormValues(dessert: DessertResponse | undefined): DessertFormValues {
  return {
    name: dessert?.name ?? '',
    description: dessert?.description ?? '',
    platingNotes: dessert?.platingNotes ?? '',
    components: dessert
      ? dessert.components.map((c) => ({
          recipeId: c.recipeId,
          quantity: numberToInput(c.quantity),
          unit: c.unit,
          pieceWeight: numberToInput(c.pieceWeightG),
          note: c.note ?? '',
        }))
      : [emptyComponent()],
  };
}

function componentFrom(v: ComponentValues): DessertComponent {
  const pieceWeightG = v.unit === 'piece' ? parseNumber(v.pieceWeight) : undefined;
  const note = optionalText(v.note);
  return {
    recipeId: v.recipeId,
    quantity: requiredNumber(v.quantity),
    unit: v.unit,
    ...(pieceWeightG !== undefined ? { pieceWeightG } : {}),
    ...(note ? { note } : {}),
  };
}

export function dessertFromForm(
  values: DessertFormValues,
  id: string,
): Conversion & { candidate: Dessert } {
  const errors: Record<string, string> = {};
  values.components.forEach((c, i) => {
    if (!c.recipeId) errors[`components.${i}.recipeId`] = 'Pick the recipe of this component.';
  });
  const description = optionalText(values.description);
  const platingNotes = optionalText(values.platingNotes);
  return {
    candidate: {
      id,
      name: values.name,
      components: values.components.map(componentFrom),
      photos: [],
      ...(description ? { description } : {}),
      ...(platingNotes ? { platingNotes } : {}),
    },
    errors,
  };
}

export function dessertFieldOf(path: readonly PropertyKey[]): string {
  const [head, index, leaf] = path;
  if (head === 'components') {
    if (typeof index !== 'number') return 'root.components';
    const map: Record<string, string> = {
      recipeId: 'recipeId',
      quantity: 'quantity',
      unit: 'unit',
      pieceWeightG: 'pieceWeight',
      note: 'note',
    };
    return `components.${index}.${map[String(leaf)] ?? 'recipeId'}`;
  }
  if (head === 'name' || head === 'description' || head === 'platingNotes') return head;
  return 'root.form';
}

/** The components that can be computed while typing. */
export function liveDessert(values: DessertFormValues, id: string): Dessert | null {
  const components = values.components
    .map(componentFrom)
    .filter((c) => c.recipeId && Number.isFinite(c.quantity) && c.quantity > 0);
  if (components.length === 0) return null;
  return { id, name: values.name.trim() || 'This dessert', components, photos: [] };
}

export function dessertBody(parsed: Dessert): Omit<Dessert, 'id' | 'photos'> {
  const { id: _id, photos: _photos, ...body } = parsed;
  return body;
}
