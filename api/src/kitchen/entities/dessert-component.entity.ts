import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { DessertEntity } from './dessert.entity.js';
import { RecipeEntity } from './recipe.entity.js';

/**
 * A recipe portion on one plate of a dessert. It goes with its dessert (CASCADE) and keeps its
 * recipe from being deleted (RESTRICT).
 */
@Entity({ name: 'dessert_components' })
export class DessertComponentEntity {
  @PrimaryColumn({ name: 'dessert_id', type: 'varchar', length: 36 })
  dessertId: string;

  @ManyToOne(() => DessertEntity, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'dessert_id' })
  dessert?: DessertEntity;

  @PrimaryColumn({ type: 'integer' })
  position: number;

  @Index('IDX_dessert_components_recipe')
  @Column({ name: 'recipe_id', type: 'varchar', length: 36 })
  recipeId: string;

  @ManyToOne(() => RecipeEntity, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'recipe_id' })
  recipe?: RecipeEntity;

  @Column({ type: 'double precision' })
  quantity: number;

  @Column({ type: 'varchar', length: 8 })
  unit: 'g' | 'piece';

  @Column({ name: 'piece_weight_g', type: 'double precision', nullable: true })
  pieceWeightG: number | null;

  @Column({ type: 'varchar', length: 200, nullable: true })
  note: string | null;
}
