import type { Composition, DietaryInfo, IngredientAllergens, Unit } from '@nappe/shared';
import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { TIMESTAMP } from '../../database/portable-schema.js';

@Entity({ name: 'ingredients' })
export class IngredientEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Index('IDX_ingredients_name')
  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ name: 'label_name', type: 'varchar', length: 300, nullable: true })
  labelName: string | null;

  @Column({ name: 'pack_size', type: 'double precision' })
  packSize: number;

  @Column({ name: 'pack_unit', type: 'varchar', length: 16 })
  packUnit: Unit;

  /** Price of one pack, integer minor units. */
  @Column({ name: 'pack_price_minor', type: 'integer' })
  packPriceMinor: number;

  @Column({ name: 'density_g_per_ml', type: 'double precision', nullable: true })
  densityGPerMl: number | null;

  @Column({ name: 'unit_weight_g', type: 'double precision', nullable: true })
  unitWeightG: number | null;

  @Column({ name: 'count_unit', type: 'varchar', length: 8, nullable: true })
  countUnit: 'piece' | 'leaf' | null;

  @Column({ type: 'simple-json' })
  allergens: IngredientAllergens;

  @Column({ type: 'simple-json' })
  dietary: DietaryInfo;

  @Column({ type: 'simple-json', nullable: true })
  composition: Composition | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @CreateDateColumn({ name: 'created_at', type: TIMESTAMP })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: TIMESTAMP })
  updatedAt: Date;
}
