import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/** The studio's own settings: exactly one row, id 1. Later migrations add the money and capacity settings. */
@Entity({ name: 'studio_settings' })
export class StudioSettings {
  @PrimaryColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 200 })
  tagline: string;

  @Column({ type: 'varchar', length: 120 })
  city: string;

  /** ISO 4217 code, e.g. EUR. */
  @Column({ type: 'varchar', length: 3 })
  currency: string;

  /** IANA time-zone name, e.g. Europe/Brussels. */
  @Column({ name: 'time_zone', type: 'varchar', length: 64 })
  timeZone: string;

  @UpdateDateColumn({ name: 'updated_at' })
  updatedAt: Date;
}
