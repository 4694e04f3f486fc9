import { InitialSchema1764633600000 } from './1764633600000-initial-schema.js';
import { KitchenCatalogue1764720000000 } from './1764720000000-kitchen-catalogue.js';

/** Every migration, in order. Listed as classes (a glob does not work with ESM builds). */
export const migrations = [InitialSchema1764633600000, KitchenCatalogue1764720000000];
