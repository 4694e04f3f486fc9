import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import type { StoredPhoto } from '../../files/stored-photo.js';
import { TIMESTAMP } from '../../database/portable-schema.js';

/** A menu: the desserts every guest is served (rows of `menu_desserts`), its price and limits. */
@Entity({ name: 'menus' })
export class MenuEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Index('IDX_menus_name')
  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'text', nullable: true })
  description: string | null;

  /** Integer minor units. */
  @Column({ name: 'price_per_guest_minor', type: 'integer' })
  pricePerGuestMinor: number;

  @Column({ name: 'min_guests', type: 'integer' })
  minGuests: number;

  @Column({ name: 'max_guests', type: 'integer' })
  maxGuests: number;

  @Column({ name: 'lead_days', type: 'integer' })
  leadDays: number;

  @Column({ type: 'boolean' })
  active: boolean;

  /** Set by photo uploads only, never by a request body. */
  @Column({ type: 'simple-json', default: '[]' })
  photos: StoredPhoto[];

  @CreateDateColumn({ name: 'created_at', type: TIMESTAMP })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: TIMESTAMP })
  updatedAt: Date;
}
