import { Column, Entity, ForeignKey, Index, PrimaryColumn } from 'typeorm';
import { User } from '../../users/entities/user.entity.js';
import { TIMESTAMP } from '../../database/portable-schema.js';

export type PrivacyAuditAction = 'data_exported' | 'account_deleted';

/**
 * A client's data-protection request and what was done (GDPR Art. 15, 17, 20): who, when, and
 * counts — never the personal data itself. The user id stays as an anonymous reference after
 * the account is erased. Per-order changes are also in each order's own audit trail.
 */
@Entity({ name: 'privacy_audit' })
@Index('IDX_privacy_audit_user', ['userId', 'at'])
export class PrivacyAuditEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 20 })
  action: PrivacyAuditAction;

  @ForeignKey(() => User, { onDelete: 'RESTRICT' })
  @Column({ name: 'user_id', type: 'varchar', length: 36 })
  userId: string;

  /** What was done, in numbers and order references: never names, e-mails or guest details. */
  @Column({ type: 'simple-json' })
  detail: Record<string, unknown>;

  @Column({ type: TIMESTAMP })
  at: Date;
}
