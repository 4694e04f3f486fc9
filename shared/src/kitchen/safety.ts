import { celsiusToFahrenheit, formatCelsius as C, sugarStageAt } from './reference-steps.js';
import type { MethodStep, Recipe, StorageKind } from './types.js';

/**
 * Safety cautions for method steps, from what the step does and the temperature it reaches.
 * General guidance only: every caution ends by deferring to the local food code and licensed
 * practice, which take precedence.
 */

export const LOCAL_CODE_DEFERRAL =
  'General guidance only: follow your local food code and licensed practice, which take precedence.';

export type SafetyTopic =
  | 'hot_sugar'
  | 'hot_cooking'
  | 'custard'
  | 'cooling'
  | 'cold_holding'
  | 'frozen_storage'
  | 'hot_oven';

export interface SafetyNote {
  topic: SafetyTopic;
  text: string;
  source: string;
}

/** Sugar above this is a burn hazard: it sticks to skin and holds its heat. */
export const HOT_SUGAR_FROM_C = 110;
export const CUSTARD_FINISH_C = { min: 82, max: 85 } as const;
export const CUSTARD_CURDLES_ABOVE_C = 87;
export const COLD_HOLDING_MAX_C = 5;
export const FROZEN_STORAGE_MAX_C = -18;

const COOLING_TEXT =
  'Cool from 57 °C to 21 °C within 2 hours, then to 5 °C or below within 6 hours in total: shallow containers, an ice bath or a blast chiller.';
const COOLING_SOURCE = 'FDA Food Code §3-501.14(A)';

/** The cautions a step needs (empty when none). */
export function safetyNotesForStep(step: Pick<MethodStep, 'kind' | 'temperatureC'>): SafetyNote[] {
  const notes: SafetyNote[] = [];
  const t = step.temperatureC;
  if (step.kind === 'sugar_syrup' || step.kind === 'caramel') {
    const stage = t !== undefined ? sugarStageAt(t) : undefined;
    const at = t !== undefined ? ` at ${C(t)}${stage ? ` (${stage.name})` : ''}` : '';
    notes.push({
      topic: 'hot_sugar',
      text: `Hot sugar${at} burns and sticks to skin: use a deep, heavy pan, keep children and distractions away, pour away from you in a thin stream, and keep cold running water at hand for burns.`,
      source: 'common practice, no source',
    });
  } else if (step.kind === 'cook' && t !== undefined && t >= HOT_SUGAR_FROM_C) {
    notes.push({
      topic: 'hot_cooking',
      text: `At ${C(t)} fat or sugar burns on contact and can spit: a deep pan, long sleeves, and cold running water at hand for burns.`,
      source: 'common practice, no source',
    });
  }
  if (step.kind === 'custard') {
    const low = t !== undefined && t < CUSTARD_FINISH_C.min;
    const high = t !== undefined && t > CUSTARD_CURDLES_ABOVE_C;
    notes.push({
      topic: 'custard',
      text:
        `Cook the custard to ${CUSTARD_FINISH_C.min}–${C(CUSTARD_FINISH_C.max)}, until it coats the back of a spoon; above about 85–87 °C it curdles.` +
        (low ? ` ${C(t)} is below that finish.` : '') +
        (high ? ` ${C(t)} is above it: expect curdling.` : '') +
        ` Eggs held for service need at least 63 °C for 15 s (FDA Food Code §3-401.11(A)(1)). Then: ${COOLING_TEXT}`,
      source: `common practice (finish); ${COOLING_SOURCE} (cooling)`,
    });
  }
  if (step.kind === 'cool') {
    notes.push({ topic: 'cooling', text: COOLING_TEXT, source: COOLING_SOURCE });
  }
  if (step.kind === 'chill' || step.kind === 'rest') {
    if (step.kind === 'chill' || (t !== undefined && t <= 10)) {
      notes.push({
        topic: 'cold_holding',
        text:
          `Hold cold at ${C(COLD_HOLDING_MAX_C)} or below.` +
          (t !== undefined && t > COLD_HOLDING_MAX_C
            ? ` ${C(t)} is too warm for cold holding.`
            : ''),
        source: 'FDA Food Code §3-501.16(A)(2)',
      });
    }
  }
  if (step.kind === 'freeze') {
    notes.push({
      topic: 'frozen_storage',
      text:
        `Store frozen at ${C(FROZEN_STORAGE_MAX_C)} (0 °F) or below.` +
        (t !== undefined && t > FROZEN_STORAGE_MAX_C ? ` ${C(t)} is too warm for storage.` : ''),
      source: 'USDA FSIS, "Freezing and Food Safety"',
    });
  }
  if (step.kind === 'bake' && t !== undefined) {
    notes.push({
      topic: 'hot_oven',
      text: `Oven at ${C(t)} (${celsiusToFahrenheit(t)} °F): dry oven gloves for trays, and open the door away from your face.`,
      source: 'common practice, no source',
    });
  }
  return notes;
}

/** One caution text for a step, with the deferral to the local food code; undefined when none. */
export function cautionForStep(
  step: Pick<MethodStep, 'kind' | 'temperatureC'>,
): string | undefined {
  const notes = safetyNotesForStep(step);
  if (notes.length === 0) return undefined;
  return `${notes.map((n) => n.text).join(' ')} ${LOCAL_CODE_DEFERRAL}`;
}

/** A storage caution for a recipe (frozen: ≤ −18 °C; chilled: ≤ 5 °C). */
export function storageCaution(storage: StorageKind): string | undefined {
  switch (storage) {
    case 'frozen':
      return `Keep frozen at ${C(FROZEN_STORAGE_MAX_C)} or below (USDA FSIS). ${LOCAL_CODE_DEFERRAL}`;
    case 'chilled':
      return `Keep at ${C(COLD_HOLDING_MAX_C)} or below (FDA Food Code §3-501.16). ${LOCAL_CODE_DEFERRAL}`;
    case 'dry':
      return undefined;
  }
}

/** The recipe with every step's caution filled from its kind and temperature where the chef left it empty. */
export function withSafetyCautions<R extends Pick<Recipe, 'steps'>>(recipe: R): R {
  return {
    ...recipe,
    steps: recipe.steps.map((s) => {
      if (s.caution) return s;
      const caution = cautionForStep(s);
      return caution ? { ...s, caution } : s;
    }),
  };
}
