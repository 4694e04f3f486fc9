import type { MethodStep, Recipe, RecipeLine, StepKind, StorageKind, Unit } from '@nappe/shared';
import type { RecipeResponse } from '../api/types';
import {
  numberToInput,
  optionalText,
  parseNumber,
  requiredNumber,
  type Conversion,
} from './form-resolver';

export interface LineValues {
  /** "ingredient:<id>", "recipe:<id>", or "" before one is picked. */
  ref: string;
  quantity: string;
  unit: Unit;
  note: string;
}

export interface StepValues {
  name: string;
  kind: StepKind;
  activeMinutes: string;
  waitMinutes: string;
  temperature: string;
  caution: string;
}

export interface RecipeFormValues {
  name: string;
  yieldG: string;
  storage: StorageKind;
  shelfLifeHours: string;
  equipmentName: string;
  equipmentCapacity: string;
  density: string;
  unitWeight: string;
  notes: string;
  lines: LineValues[];
  steps: StepValues[];
}

export const emptyLine = (): LineValues => ({ ref: '', quantity: '', unit: 'g', note: '' });
export const emptyStep = (): StepValues => ({
  name: '',
  kind: 'prep',
  activeMinutes: '',
  waitMinutes: '0',
  temperature: '',
  caution: '',
});

export function refOf(line: RecipeLine): string {
  return line.kind === 'ingredient' ? `ingredient:${line.ingredientId}` : `recipe:${line.recipeId}`;
}

export function parseRef(ref: string): { kind: 'ingredient' | 'recipe'; id: string } | null {
  const at = ref.indexOf(':');
  if (at < 0) return null;
  const kind = ref.slice(0, at);
  const id = ref.slice(at + 1);
  return (kind === 'ingredient' || kind === 'recipe') && id ? { kind, id } : null;
}

export function recipeToFormValues(recipe: RecipeResponse | undefined): RecipeFormValues {
  return {
    name: recipe?.name ?? '',
    yieldG: numberToInput(recipe?.yieldG),
    storage: recipe?.storage ?? 'chilled',
    shelfLifeHours: numberToInput(recipe?.shelfLifeHours),
    equipmentName: recipe?.equipment?.name ?? '',
    equipmentCapacity: numberToInput(recipe?.equipment?.batchCapacityG),
    density: numberToInput(recipe?.densityGPerMl),
    unitWeight: numberToInput(recipe?.unitWeightG),
    notes: recipe?.notes ?? '',
    lines: recipe
      ? recipe.lines.map((line) => ({
          ref: refOf(line),
          quantity: numberToInput(line.quantity),
          unit: line.unit,
          note: line.note ?? '',
        }))
      : [emptyLine()],
    steps: (recipe?.steps ?? []).map((s) => ({
      name: s.name,
      kind: s.kind,
      activeMinutes: numberToInput(s.activeMinutes),
      waitMinutes: numberToInput(s.waitMinutes),
      temperature: numberToInput(s.temperatureC),
      caution: s.caution ?? '',
    })),
  };
}

function lineFrom(values: LineValues): RecipeLine {
  const ref = parseRef(values.ref);
  const note = optionalText(values.note);
  const common = {
    quantity: requiredNumber(values.quantity),
    unit: values.unit,
    ...(note ? { note } : {}),
  };
  return ref?.kind === 'recipe'
    ? { kind: 'recipe', recipeId: ref.id, ...common }
    : { kind: 'ingredient', ingredientId: ref?.id ?? '', ...common };
}

export function stepFrom(values: StepValues): MethodStep {
  const temperatureC = parseNumber(values.temperature);
  const caution = optionalText(values.caution);
  return {
    name: values.name,
    kind: values.kind,
    activeMinutes: parseNumber(values.activeMinutes) ?? 0,
    waitMinutes: parseNumber(values.waitMinutes) ?? 0,
    ...(temperatureC !== undefined ? { temperatureC } : {}),
    ...(caution ? { caution } : {}),
  };
}

/** The whole form as a recipe, for the shared schema to judge before saving. */
export function recipeFromForm(
  values: RecipeFormValues,
  id: string,
): Conversion & { candidate: Recipe } {
  const errors: Record<string, string> = {};
  values.lines.forEach((line, i) => {
    if (!parseRef(line.ref)) errors[`lines.${i}.ref`] = 'Pick an ingredient or a recipe.';
  });
  const equipmentName = values.equipmentName.trim();
  const capacity = parseNumber(values.equipmentCapacity);
  if (equipmentName && capacity === undefined) {
    errors.equipmentCapacity = 'Give the most one batch can hold, in grams.';
  } else if (!equipmentName && capacity !== undefined) {
    errors.equipmentName = 'Name the equipment this capacity is for.';
  }
  const density = parseNumber(values.density);
  const unitWeight = parseNumber(values.unitWeight);
  const notes = optionalText(values.notes);
  const candidate: Recipe = {
    id,
    name: values.name,
    lines: values.lines.map(lineFrom),
    yieldG: requiredNumber(values.yieldG),
    steps: values.steps.map(stepFrom),
    storage: values.storage,
    shelfLifeHours: requiredNumber(values.shelfLifeHours),
    ...(equipmentName && capacity !== undefined
      ? { equipment: { name: equipmentName, batchCapacityG: capacity } }
      : {}),
    ...(density !== undefined ? { densityGPerMl: density } : {}),
    ...(unitWeight !== undefined ? { unitWeightG: unitWeight } : {}),
    ...(notes ? { notes } : {}),
  };
  return { candidate, errors };
}

/** Which form field a path of the recipe schema belongs to. */
export function recipeFieldOf(path: readonly PropertyKey[]): string {
  const [head, index, leaf] = path;
  if (head === 'lines') {
    if (typeof index !== 'number') return 'root.lines';
    if (leaf === 'ingredientId' || leaf === 'recipeId' || leaf === 'kind')
      return `lines.${index}.ref`;
    return `lines.${index}.${leaf === 'quantity' || leaf === 'unit' || leaf === 'note' ? leaf : 'ref'}`;
  }
  if (head === 'steps') {
    if (typeof index !== 'number') return 'root.steps';
    const map: Record<string, string> = {
      name: 'name',
      kind: 'kind',
      activeMinutes: 'activeMinutes',
      waitMinutes: 'waitMinutes',
      temperatureC: 'temperature',
      caution: 'caution',
    };
    return `steps.${index}.${map[String(leaf)] ?? 'name'}`;
  }
  if (head === 'equipment') return index === 'name' ? 'equipmentName' : 'equipmentCapacity';
  if (head === 'densityGPerMl') return 'density';
  if (head === 'unitWeightG') return 'unitWeight';
  if (
    head === 'name' ||
    head === 'yieldG' ||
    head === 'storage' ||
    head === 'shelfLifeHours' ||
    head === 'notes'
  ) {
    return head;
  }
  return 'root.form';
}

/**
 * What can be computed while typing: the complete lines only, when the yield is a number.
 * Null, with the reason, when there is nothing to compute yet.
 */
export function liveRecipe(
  values: RecipeFormValues,
  id: string,
): { recipe: Recipe; lineIndexes: number[] } | { recipe: null; reason: string } {
  const yieldG = parseNumber(values.yieldG);
  const complete: Array<{ line: RecipeLine; index: number }> = [];
  values.lines.forEach((v, index) => {
    const line = lineFrom(v);
    const ref = parseRef(v.ref);
    if (ref && Number.isFinite(line.quantity) && line.quantity > 0) complete.push({ line, index });
  });
  if (complete.length === 0)
    return { recipe: null, reason: 'Add a line with a quantity to see the figures.' };
  if (yieldG === undefined || !(yieldG > 0)) {
    return { recipe: null, reason: 'Enter the measured yield in grams to see the figures.' };
  }
  return {
    recipe: {
      id,
      name: values.name.trim() || 'This recipe',
      lines: complete.map((c) => c.line),
      yieldG,
      steps: [],
      storage: values.storage,
      shelfLifeHours: 1,
      ...(parseNumber(values.density) ? { densityGPerMl: parseNumber(values.density)! } : {}),
      ...(parseNumber(values.unitWeight) ? { unitWeightG: parseNumber(values.unitWeight)! } : {}),
    },
    lineIndexes: complete.map((c) => c.index),
  };
}

export function recipeBody(parsed: Recipe): Omit<Recipe, 'id'> {
  const { id: _id, ...body } = parsed;
  return body;
}

/** zod's own words ("Invalid input: expected number…") where the recipe schema has none. */
export function rephraseRecipeMessage(field: string, message: string): string {
  if (!/^(Invalid input|Too small|Too big|Invalid option)/.test(message)) return message;
  if (/\.(activeMinutes|waitMinutes)$/.test(field)) {
    return 'Minutes are a whole number, 0 or more (up to 14 days of waiting).';
  }
  if (field.endsWith('.temperature')) return 'Use a temperature from −60 to 300 °C.';
  if (field.endsWith('.unit')) return 'Pick a unit from the list.';
  return 'Check this value.';
}
