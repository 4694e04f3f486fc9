import { Column, Entity, ForeignKey, Index, PrimaryColumn } from 'typeorm';
import { User } from '../../users/entities/user.entity.js';
import { TIMESTAMP } from '../../database/portable-schema.js';

export type TeamRole = 'staff' | 'chef';

/**
 * An invitation to join the studio's team. The e-mail carries a random one-time token; only its
 * SHA-256 is stored. It is used once (`acceptedAt`), can be revoked, and expires.
 */
@Entity({ name: 'staff_invitations' })
export class StaffInvitationEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 16 })
  role: TeamRole;

  @Index('UQ_staff_invitations_token', { unique: true })
  @Column({ name: 'token_hash', type: 'varchar', length: 64 })
  tokenHash: string;

  @ForeignKey(() => User, { onDelete: 'RESTRICT' })
  @Column({ name: 'invited_by_id', type: 'varchar', length: 36 })
  invitedById: string;

  @Column({ name: 'expires_at', type: TIMESTAMP })
  expiresAt: Date;

  @Column({ name: 'accepted_at', type: TIMESTAMP, nullable: true })
  acceptedAt: Date | null;

  @ForeignKey(() => User, { onDelete: 'SET NULL' })
  @Column({ name: 'accepted_user_id', type: 'varchar', length: 36, nullable: true })
  acceptedUserId: string | null;

  @Column({ name: 'revoked_at', type: TIMESTAMP, nullable: true })
  revokedAt: Date | null;

  @Column({ name: 'created_at', type: TIMESTAMP })
  createdAt: Date;
}
