import { randomUUID } from 'node:crypto';
import { Role } from '@nappe/shared';
import {
  BeforeInsert,
  Column,
  CreateDateColumn,
  Entity,
  Index,
  PrimaryColumn,
  UpdateDateColumn,
} from 'typeorm';
import { TIMESTAMP } from '../../database/portable-schema.js';

@Entity({ name: 'users' })
export class User {
  /**
   * A random UUID, made here rather than by the database: the column is `varchar(36)` on both
   * databases (every table that refers to a user says so), which TypeORM's generated `uuid`
   * column would turn into PostgreSQL's `uuid` type.
   */
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @BeforeInsert()
  protected assignId(): void {
    this.id ??= randomUUID();
  }

  /** Stored lower-cased and trimmed; unique. */
  @Index('UQ_users_email', { unique: true })
  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ name: 'password_hash', type: 'varchar', length: 255 })
  passwordHash: string;

  @Column({ type: 'varchar', length: 16 })
  role: Role;

  /** Set when the chef removes a team member: they can no longer sign in; their history stays. */
  @Column({ name: 'removed_at', type: TIMESTAMP, nullable: true })
  removedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: TIMESTAMP })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: TIMESTAMP })
  updatedAt: Date;
}
