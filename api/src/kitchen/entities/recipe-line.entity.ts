import type { Unit } from '@nappe/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { IngredientEntity } from './ingredient.entity.js';
import { RecipeEntity } from './recipe.entity.js';

/**
 * One line of a recipe: an ingredient or a sub-recipe (exactly one of the two ids is set).
 * The recipe's own lines go with it (CASCADE); what a line points at cannot be deleted while the
 * line exists (RESTRICT). The relations only declare the keys; code reads and writes the ids.
 */
@Entity({ name: 'recipe_lines' })
export class RecipeLineEntity {
  @PrimaryColumn({ name: 'recipe_id', type: 'varchar', length: 36 })
  recipeId: string;

  @ManyToOne(() => RecipeEntity, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'recipe_id' })
  recipe?: RecipeEntity;

  @PrimaryColumn({ type: 'integer' })
  position: number;

  @Index('IDX_recipe_lines_ingredient')
  @Column({ name: 'ingredient_id', type: 'varchar', length: 36, nullable: true })
  ingredientId: string | null;

  @ManyToOne(() => IngredientEntity, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'ingredient_id' })
  ingredient?: IngredientEntity;

  @Index('IDX_recipe_lines_sub_recipe')
  @Column({ name: 'sub_recipe_id', type: 'varchar', length: 36, nullable: true })
  subRecipeId: string | null;

  @ManyToOne(() => RecipeEntity, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'sub_recipe_id' })
  subRecipe?: RecipeEntity;

  @Column({ type: 'double precision' })
  quantity: number;

  @Column({ type: 'varchar', length: 16 })
  unit: Unit;

  @Column({ type: 'varchar', length: 200, nullable: true })
  note: string | null;
}
