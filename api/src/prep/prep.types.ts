import type { LabelSegment } from '@nappe/shared';

/** One component label as `labels.pdf` prints it (API-internal: no JSON route sends it). */
export interface ComponentLabel {
  recipeId: string;
  recipeName: string;
  madeOn: string;
  useBy: string;
  storage: string;
  storageCaution?: string;
  grams: number;
  segments: LabelSegment[];
  mayContain: string[];
}
