/**
 * Sweeteners for mix balance, on the sucrose = 100 scale, per gram of dry sweetener solids.
 *
 * PAC (freezing-point depression): by molar mass, PAC = 342.30 / M × 100 — at equal mass, the
 * number of dissolved molecules relative to sucrose (colligative). For starch hydrolysates
 * (glucose syrups, maltodextrins) the number-average molar mass follows from the dextrose
 * equivalent, Mn ≈ 18016 / DE, so PAC ≈ 342.30 × DE / 180.16 ≈ 1.9 × DE (stated approximation).
 *
 * POD (relative sweetness): sucrose 100, dextrose 70, lactose 16 (REFERENCES.md). The other
 * values vary between sources and with concentration: common practice, no source.
 */

export const SUCROSE_MOLAR_MASS = 342.3;
export const DEXTROSE_MOLAR_MASS = 180.16;
export const ETHANOL_MOLAR_MASS = 46.07;

/** Freezing-point depression relative to sucrose for a solute of molar mass `molarMass`. */
export function pacFromMolarMass(molarMass: number): number {
  return (SUCROSE_MOLAR_MASS / molarMass) * 100;
}

/** Freezing-point depression of a starch hydrolysate of dextrose equivalent `de`. */
export function pacFromDextroseEquivalent(de: number): number {
  return pacFromMolarMass((DEXTROSE_MOLAR_MASS * 100) / de);
}

export interface SweetenerDefinition {
  label: string;
  pod: number;
  pac: number;
  podBasis: string;
  pacBasis: string;
}

export const SWEETENERS = {
  sucrose: {
    label: 'sucrose',
    pod: 100,
    pac: pacFromMolarMass(SUCROSE_MOLAR_MASS),
    podBasis: 'definition',
    pacBasis: 'definition (M 342.30)',
  },
  dextrose: {
    label: 'dextrose (anhydrous)',
    pod: 70,
    pac: pacFromMolarMass(DEXTROSE_MOLAR_MASS),
    podBasis: 'REFERENCES.md',
    pacBasis: 'molar mass 180.16',
  },
  fructose: {
    label: 'fructose',
    pod: 170,
    pac: pacFromMolarMass(DEXTROSE_MOLAR_MASS),
    podBasis: 'common practice, no source (quoted 120–180)',
    pacBasis: 'molar mass 180.16',
  },
  lactose: {
    label: 'lactose',
    pod: 16,
    pac: pacFromMolarMass(SUCROSE_MOLAR_MASS),
    podBasis: 'REFERENCES.md',
    pacBasis: 'molar mass 342.30',
  },
  invert_sugar: {
    label: 'invert sugar (dry solids)',
    pod: 130,
    pac: pacFromMolarMass(DEXTROSE_MOLAR_MASS),
    podBasis: 'common practice, no source',
    pacBasis: 'equal glucose and fructose, molar mass 180.16',
  },
  glucose_syrup_de40: {
    label: 'glucose syrup solids DE 40',
    pod: 45,
    pac: pacFromDextroseEquivalent(40),
    podBasis: 'common practice, no source',
    pacBasis: '1.9 × DE',
  },
  glucose_syrup_de60: {
    label: 'glucose syrup solids DE 60',
    pod: 60,
    pac: pacFromDextroseEquivalent(60),
    podBasis: 'common practice, no source',
    pacBasis: '1.9 × DE',
  },
  maltodextrin_de18: {
    label: 'maltodextrin DE 18',
    pod: 10,
    pac: pacFromDextroseEquivalent(18),
    podBasis: 'common practice, no source',
    pacBasis: '1.9 × DE',
  },
  sorbitol: {
    label: 'sorbitol',
    pod: 60,
    pac: pacFromMolarMass(182.17),
    podBasis: 'common practice, no source (quoted 50–60)',
    pacBasis: 'molar mass 182.17',
  },
  trehalose: {
    label: 'trehalose (anhydrous)',
    pod: 45,
    pac: pacFromMolarMass(SUCROSE_MOLAR_MASS),
    podBasis: 'common practice, no source',
    pacBasis: 'molar mass 342.30',
  },
} as const satisfies Record<string, SweetenerDefinition>;

export type SugarKind = keyof typeof SWEETENERS;
export const SUGAR_KINDS = Object.keys(SWEETENERS) as SugarKind[];

/** Ethanol's freezing-point depression on the same scale (≈ 743). */
export const ETHANOL_PAC = pacFromMolarMass(ETHANOL_MOLAR_MASS);
