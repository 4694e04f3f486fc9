import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import type { StoredPhoto } from '../../files/stored-photo.js';
import { TIMESTAMP } from '../../database/portable-schema.js';

/** A plated dessert. Its components are rows of `dessert_components`. */
@Entity({ name: 'desserts' })
export class DessertEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Index('IDX_desserts_name')
  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'text', nullable: true })
  description: string | null;

  @Column({ name: 'plating_notes', type: 'text', nullable: true })
  platingNotes: string | null;

  /** Set by photo uploads only, never by a request body. */
  @Column({ type: 'simple-json', default: '[]' })
  photos: StoredPhoto[];

  @CreateDateColumn({ name: 'created_at', type: TIMESTAMP })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: TIMESTAMP })
  updatedAt: Date;
}
