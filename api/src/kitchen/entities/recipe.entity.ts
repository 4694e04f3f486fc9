import type { Equipment, MethodStep, StorageKind } from '@nappe/shared';
import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { TIMESTAMP } from '../../database/portable-schema.js';

/** A recipe (a component or a sub-preparation). Its lines are rows of `recipe_lines`. */
@Entity({ name: 'recipes' })
export class RecipeEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Index('IDX_recipes_name')
  @Column({ type: 'varchar', length: 120 })
  name: string;

  /** Measured yield of one batch as written, grams. */
  @Column({ name: 'yield_g', type: 'double precision' })
  yieldG: number;

  @Column({ type: 'varchar', length: 8 })
  storage: StorageKind;

  @Column({ name: 'shelf_life_hours', type: 'double precision' })
  shelfLifeHours: number;

  @Column({ type: 'simple-json' })
  steps: MethodStep[];

  @Column({ type: 'simple-json', nullable: true })
  equipment: Equipment | null;

  @Column({ name: 'density_g_per_ml', type: 'double precision', nullable: true })
  densityGPerMl: number | null;

  @Column({ name: 'unit_weight_g', type: 'double precision', nullable: true })
  unitWeightG: number | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @CreateDateColumn({ name: 'created_at', type: TIMESTAMP })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: TIMESTAMP })
  updatedAt: Date;
}
