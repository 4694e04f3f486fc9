import { Column, Entity, ForeignKey, Index, PrimaryGeneratedColumn } from 'typeorm';
import { User } from '../../users/entities/user.entity.js';
import { TIMESTAMP } from '../../database/portable-schema.js';

/** One saved change of the studio settings: who, when, and which fields changed. */
@Entity({ name: 'settings_changes' })
export class SettingsChangeEntity {
  /** Increasing: orders changes saved within the same clock tick. */
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @ForeignKey(() => User, { onDelete: 'RESTRICT' })
  @Column({ name: 'changed_by_id', type: 'varchar', length: 36 })
  changedById: string;

  @Index('IDX_settings_changes_at')
  @Column({ name: 'changed_at', type: TIMESTAMP })
  changedAt: Date;

  /** The names of the settings fields whose value changed. */
  @Column({ type: 'simple-json' })
  fields: string[];
}
