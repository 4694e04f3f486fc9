import { Check } from 'typeorm';
import { GuestDataAccessEntity } from '../allergy-notes/entities/guest-data-access.entity.js';
import { OrderSubstitutionEntity } from '../allergy-notes/entities/order-substitution.entity.js';
import { DessertComponentEntity } from '../kitchen/entities/dessert-component.entity.js';
import { IngredientEntity } from '../kitchen/entities/ingredient.entity.js';
import { MenuDessertEntity } from '../kitchen/entities/menu-dessert.entity.js';
import { MenuEntity } from '../kitchen/entities/menu.entity.js';
import { RecipeLineEntity } from '../kitchen/entities/recipe-line.entity.js';
import { RecipeEntity } from '../kitchen/entities/recipe.entity.js';
import { OutboxMessageEntity } from '../mail/entities/outbox-message.entity.js';
import { OrderEventEntity } from '../orders/entities/order-event.entity.js';
import { OrderGuestEntity } from '../orders/entities/order-guest.entity.js';
import { OrderEntity } from '../orders/entities/order.entity.js';
import { PaymentEntity } from '../payments/entities/payment.entity.js';
import { ConsentRecordEntity } from '../privacy/entities/consent-record.entity.js';
import { OrderGuestSummaryEntity } from '../privacy/entities/order-guest-summary.entity.js';
import { PrivacyAuditEntity } from '../privacy/entities/privacy-audit.entity.js';
import { StaffInvitationEntity } from '../studio/entities/staff-invitation.entity.js';
import { StudioSettings } from '../studio/entities/studio-settings.entity.js';
import { User } from '../users/entities/user.entity.js';
import { SCHEMA_DB_TYPE } from './portable-schema.js';

type EntityClass = abstract new (...args: never[]) => unknown;

/**
 * The CHECK constraints of the PostgreSQL migrations (`migrations/postgres/`), by name, so that
 * TypeORM's schema builder knows them and finds nothing to drop. The SQLite migrations write the
 * same rules as unnamed inline checks, which TypeORM's SQLite reader does not load at all, so
 * there they are not declared (declaring them would make the builder want to add them again).
 * Booleans need no `IN (0, 1)` rule on PostgreSQL: the type is boolean.
 */
export const POSTGRES_CHECKS: ReadonlyArray<[EntityClass, name: string, expression: string]> = [
  [User, 'CHK_users_role', `"role" IN ('client', 'chef', 'staff')`],
  [StudioSettings, 'CHK_studio_settings_single_row', `"id" = 1`],
  [StudioSettings, 'CHK_studio_settings_tax_rate', `"tax_rate_bp" BETWEEN 0 AND 10000`],
  [StudioSettings, 'CHK_studio_settings_deposit', `"deposit_percent" BETWEEN 1 AND 100`],
  [
    StudioSettings,
    'CHK_studio_settings_balance_due',
    `"balance_due_days_before" BETWEEN 0 AND 365`,
  ],
  [StudioSettings, 'CHK_studio_settings_capacity', `"daily_plate_capacity" >= 1`],
  [
    StudioSettings,
    'CHK_studio_settings_final_count',
    `"final_guest_count_days_before" BETWEEN 0 AND 365`,
  ],
  [StudioSettings, 'CHK_studio_settings_spare', `"spare_percent" BETWEEN 0 AND 100`],
  [
    StudioSettings,
    'CHK_studio_settings_retention',
    `"guest_data_retention_days" BETWEEN 0 AND 3650`,
  ],
  [
    StudioSettings,
    'CHK_studio_settings_plating_buffer',
    `"plating_buffer_minutes" BETWEEN 0 AND 720`,
  ],
  [IngredientEntity, 'CHK_ingredients_pack_size', `"pack_size" > 0`],
  [IngredientEntity, 'CHK_ingredients_pack_price', `"pack_price_minor" >= 0`],
  [IngredientEntity, 'CHK_ingredients_density', `"density_g_per_ml" > 0`],
  [IngredientEntity, 'CHK_ingredients_unit_weight', `"unit_weight_g" > 0`],
  [IngredientEntity, 'CHK_ingredients_count_unit', `"count_unit" IN ('piece', 'leaf')`],
  [RecipeEntity, 'CHK_recipes_yield', `"yield_g" > 0`],
  [RecipeEntity, 'CHK_recipes_storage', `"storage" IN ('dry', 'chilled', 'frozen')`],
  [RecipeEntity, 'CHK_recipes_shelf_life', `"shelf_life_hours" > 0`],
  [RecipeEntity, 'CHK_recipes_density', `"density_g_per_ml" > 0`],
  [RecipeEntity, 'CHK_recipes_unit_weight', `"unit_weight_g" > 0`],
  [RecipeLineEntity, 'CHK_recipe_lines_position', `"position" >= 0`],
  [RecipeLineEntity, 'CHK_recipe_lines_quantity', `"quantity" > 0`],
  [
    RecipeLineEntity,
    'CHK_recipe_lines_one_source',
    `("ingredient_id" IS NULL) <> ("sub_recipe_id" IS NULL)`,
  ],
  [
    RecipeLineEntity,
    'CHK_recipe_lines_not_itself',
    `"sub_recipe_id" IS NULL OR "sub_recipe_id" <> "recipe_id"`,
  ],
  [DessertComponentEntity, 'CHK_dessert_components_position', `"position" >= 0`],
  [DessertComponentEntity, 'CHK_dessert_components_quantity', `"quantity" > 0`],
  [DessertComponentEntity, 'CHK_dessert_components_unit', `"unit" IN ('g', 'piece')`],
  [DessertComponentEntity, 'CHK_dessert_components_piece_weight', `"piece_weight_g" > 0`],
  [MenuEntity, 'CHK_menus_price', `"price_per_guest_minor" >= 0`],
  [MenuEntity, 'CHK_menus_min_guests', `"min_guests" >= 1`],
  [MenuEntity, 'CHK_menus_lead_days', `"lead_days" >= 0`],
  [MenuEntity, 'CHK_menus_guest_range', `"max_guests" >= "min_guests"`],
  [MenuDessertEntity, 'CHK_menu_desserts_position', `"position" >= 0`],
  [
    OrderEntity,
    'CHK_orders_status',
    `"status" IN ('pending_payment', 'requested', 'confirmed', 'completed', 'expired', 'declined', 'cancelled')`,
  ],
  [OrderEntity, 'CHK_orders_guest_count', `"guest_count" >= 1`],
  [OrderEntity, 'CHK_orders_plates', `"plates" >= 1`],
  [OrderEntity, 'CHK_orders_total', `"total_minor" >= 0`],
  [OrderEntity, 'CHK_orders_retained', `"retained_minor" >= 0`],
  [OrderGuestEntity, 'CHK_order_guests_position', `"position" >= 0`],
  [OrderEventEntity, 'CHK_order_events_seq', `"seq" >= 1`],
  [
    OrderEventEntity,
    'CHK_order_events_actor_role',
    `"actor_role" IN ('client', 'chef', 'staff', 'system')`,
  ],
  [
    PaymentEntity,
    'CHK_payments_kind',
    `"kind" IN ('deposit', 'full', 'balance', 'top_up', 'refund')`,
  ],
  [
    PaymentEntity,
    'CHK_payments_status',
    `"status" IN ('pending', 'succeeded', 'failed', 'expired')`,
  ],
  [PaymentEntity, 'CHK_payments_amount', `"amount_minor" > 0`],
  [
    PaymentEntity,
    'CHK_payments_refund_of',
    `("kind" = 'refund') = ("refund_of_payment_id" IS NOT NULL)`,
  ],
  [
    OutboxMessageEntity,
    'CHK_outbox_messages_status',
    `"status" IN ('pending', 'sending', 'sent', 'failed')`,
  ],
  [StaffInvitationEntity, 'CHK_staff_invitations_role', `"role" IN ('staff', 'chef')`],
  [OrderSubstitutionEntity, 'CHK_order_substitutions_guest_position', `"guest_position" >= 0`],
  [
    GuestDataAccessEntity,
    'CHK_guest_data_access_log_what',
    `"what" IN ('allergy_notes', 'briefing', 'briefing_pdf', 'guest_list')`,
  ],
  [OrderGuestSummaryEntity, 'CHK_order_guest_summaries_listed', `"guests_listed" >= 0`],
  [OrderGuestSummaryEntity, 'CHK_order_guest_summaries_with_notes', `"guests_with_notes" >= 0`],
  [
    OrderGuestSummaryEntity,
    'CHK_order_guest_summaries_reason',
    `"reason" IN ('retention', 'account_deleted')`,
  ],
  [OrderGuestSummaryEntity, 'CHK_order_guest_summaries_retention', `"retention_days" >= 0`],
  [ConsentRecordEntity, 'CHK_consent_records_kind', `"kind" IN ('booking_terms', 'guest_data')`],
  [
    PrivacyAuditEntity,
    'CHK_privacy_audit_action',
    `"action" IN ('data_exported', 'account_deleted')`,
  ],
];

let declared = false;

/** Declares the checks above on their entities, on PostgreSQL only (see above). Runs once. */
export function declarePostgresChecks(): void {
  if (SCHEMA_DB_TYPE !== 'postgres' || declared) return;
  declared = true;
  for (const [entity, name, expression] of POSTGRES_CHECKS) Check(name, expression)(entity);
}
