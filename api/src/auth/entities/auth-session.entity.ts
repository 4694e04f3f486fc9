import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryColumn,
} from 'typeorm';
import { User } from '../../users/entities/user.entity.js';
import { TIMESTAMP } from '../../database/portable-schema.js';

/**
 * One signed-in session (one device). The access token names it (`sid`), so revoking the
 * session ends both the access token and the refresh token at once. The refresh token is
 * rotated on every use; presenting the previous one again revokes the session (reuse detection).
 */
@Entity({ name: 'auth_sessions' })
export class AuthSession {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Index('IDX_auth_sessions_user')
  @Column({ name: 'user_id', type: 'varchar', length: 36 })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: User;

  /** SHA-256 (hex) of the current refresh secret. */
  @Column({ name: 'refresh_hash', type: 'varchar', length: 64 })
  refreshHash: string;

  /** SHA-256 (hex) of the secret this one replaced, kept to detect reuse of a stolen token. */
  @Column({ name: 'previous_refresh_hash', type: 'varchar', length: 64, nullable: true })
  previousRefreshHash: string | null;

  @Column({ name: 'expires_at', type: TIMESTAMP })
  expiresAt: Date;

  @Column({ name: 'revoked_at', type: TIMESTAMP, nullable: true })
  revokedAt: Date | null;

  @Column({ name: 'revoked_reason', type: 'varchar', length: 32, nullable: true })
  revokedReason: string | null;

  @CreateDateColumn({ name: 'created_at', type: TIMESTAMP })
  createdAt: Date;

  @Column({ name: 'last_used_at', type: TIMESTAMP })
  lastUsedAt: Date;
}
