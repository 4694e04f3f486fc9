import { Column, Entity, ForeignKey, Index, PrimaryColumn } from 'typeorm';
import { User } from '../../users/entities/user.entity.js';
import { TIMESTAMP } from '../../database/portable-schema.js';

/**
 * One password-reset link sent by e-mail. Only the SHA-256 (hex) of its one-time token is kept,
 * as for staff invitations. It works once (`usedAt`), until `expiresAt`, and only while no newer
 * link was asked for (`replacedAt`). Rows are kept after use: counting those created in the last
 * hour caps the e-mails an account receives.
 */
@Entity({ name: 'password_reset_tokens' })
@Index('IDX_password_reset_tokens_user', ['userId', 'createdAt'])
export class PasswordResetTokenEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @ForeignKey(() => User, { onDelete: 'CASCADE' })
  @Column({ name: 'user_id', type: 'varchar', length: 36 })
  userId: string;

  @Index('UQ_password_reset_tokens_token', { unique: true })
  @Column({ name: 'token_hash', type: 'varchar', length: 64 })
  tokenHash: string;

  @Column({ name: 'created_at', type: TIMESTAMP })
  createdAt: Date;

  @Column({ name: 'expires_at', type: TIMESTAMP })
  expiresAt: Date;

  @Column({ name: 'used_at', type: TIMESTAMP, nullable: true })
  usedAt: Date | null;

  @Column({ name: 'replaced_at', type: TIMESTAMP, nullable: true })
  replacedAt: Date | null;
}
