import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** One saved change of the studio settings: who, when, and which fields changed. */
@Entity({ name: 'settings_changes' })
export class SettingsChangeEntity {
  /** Increasing: orders changes saved within the same clock tick. */
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ name: 'changed_by_id', type: 'varchar', length: 36 })
  changedById: string;

  @Column({ name: 'changed_at', type: 'datetime' })
  changedAt: Date;

  /** The names of the settings fields whose value changed. */
  @Column({ type: 'simple-json' })
  fields: string[];
}
