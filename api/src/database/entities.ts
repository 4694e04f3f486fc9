import { GuestDataAccessEntity } from '../allergy-notes/entities/guest-data-access.entity.js';
import { OrderSubstitutionEntity } from '../allergy-notes/entities/order-substitution.entity.js';
import { PrepTaskTickEntity } from '../prep/entities/prep-task-tick.entity.js';
import { ConsentRecordEntity } from '../privacy/entities/consent-record.entity.js';
import { OrderGuestSummaryEntity } from '../privacy/entities/order-guest-summary.entity.js';
import { PrivacyAuditEntity } from '../privacy/entities/privacy-audit.entity.js';
import { AuthSession } from '../auth/entities/auth-session.entity.js';
import { PasswordResetTokenEntity } from '../auth/entities/password-reset-token.entity.js';
import { kitchenEntities } from '../kitchen/entities/kitchen-entities.js';
import { OutboxMessageEntity } from '../mail/entities/outbox-message.entity.js';
import { OrderEventEntity } from '../orders/entities/order-event.entity.js';
import { OrderGuestEntity } from '../orders/entities/order-guest.entity.js';
import { OrderEntity } from '../orders/entities/order.entity.js';
import { PaymentEntity } from '../payments/entities/payment.entity.js';
import { ProcessedWebhookEventEntity } from '../payments/entities/processed-webhook-event.entity.js';
import { StudioSettings } from '../studio/entities/studio-settings.entity.js';
import { User } from '../users/entities/user.entity.js';
import { declareSchemaOutsideEntity } from './portable-schema.js';
import { declarePostgresChecks } from './postgres-checks.js';
import { RateLimitHitEntity } from './rate-limit-hit.entity.js';
import { SettingsChangeEntity } from '../studio/entities/settings-change.entity.js';
import { StaffInvitationEntity } from '../studio/entities/staff-invitation.entity.js';

export const bookingEntities = [
  OrderEntity,
  OrderGuestEntity,
  OrderEventEntity,
  PaymentEntity,
  ProcessedWebhookEventEntity,
  OutboxMessageEntity,
];

/** Every entity, listed once for the app module, the CLI data source and the tests. */
export const entities = [
  User,
  AuthSession,
  PasswordResetTokenEntity,
  StudioSettings,
  ...kitchenEntities,
  ...bookingEntities,
  SettingsChangeEntity,
  StaffInvitationEntity,
  OrderSubstitutionEntity,
  GuestDataAccessEntity,
  PrepTaskTickEntity,
  OrderGuestSummaryEntity,
  ConsentRecordEntity,
  PrivacyAuditEntity,
  RateLimitHitEntity,
];

// The prep tick's entity is being reworked in another change; until it declares these itself, its
// timestamp type, foreign key and index (all in the migrations) are declared from here. Each is
// skipped once the entity declares it.
declareSchemaOutsideEntity(PrepTaskTickEntity, {
  timestamps: ['doneAt'],
  foreignKeys: [{ property: 'doneBy', target: () => User, onDelete: 'SET NULL' }],
  indexes: [{ name: 'IDX_prep_task_ticks_date', properties: ['productionDate'] }],
});

declarePostgresChecks();
