import { InitialSchema1764633600000 } from './1764633600000-initial-schema.js';
import { KitchenCatalogue1764720000000 } from './1764720000000-kitchen-catalogue.js';
import { BookingSettings1764806400000 } from './1764806400000-booking-settings.js';
import { OrdersAndPayments1764892800000 } from './1764892800000-orders-and-payments.js';
import { AllergyNotesAndPrep1765200000000 } from './1765200000000-allergy-notes-and-prep.js';
import { SettingsAndTeam1765100000000 } from './1765100000000-settings-and-team.js';
import { GuestDataPrivacy1765460000000 } from './1765460000000-guest-data-privacy.js';
import { PrepTickBatches1765600000000 } from './1765600000000-prep-tick-batches.js';
import { PasswordResetTokens1765700000000 } from './1765700000000-password-reset-tokens.js';
import { RateLimitHits1765810000000 } from './1765810000000-rate-limit-hits.js';

/** Every migration, in order. Listed as classes (a glob does not work with ESM builds). */
export const migrations = [
  InitialSchema1764633600000,
  KitchenCatalogue1764720000000,
  BookingSettings1764806400000,
  OrdersAndPayments1764892800000,
  SettingsAndTeam1765100000000,
  AllergyNotesAndPrep1765200000000,
  GuestDataPrivacy1765460000000,
  PrepTickBatches1765600000000,
  PasswordResetTokens1765700000000,
  RateLimitHits1765810000000,
];
