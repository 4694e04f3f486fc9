import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A prep task ticked done: who, when, and for how many batches. The key is stable across re-plans (prep-task-key.ts). */
@Entity({ name: 'prep_task_ticks' })
export class PrepTaskTickEntity {
  @PrimaryColumn({ name: 'task_key', type: 'varchar', length: 64 })
  taskKey: string;

  @Column({ name: 'production_date', type: 'varchar', length: 10 })
  productionDate: string;

  @Column({ name: 'recipe_id', type: 'varchar', length: 36 })
  recipeId: string;

  @Column({ name: 'step_index', type: 'integer' })
  stepIndex: number;

  /** The batches the task had when it was ticked; the schedule shows any added since. */
  @Column({ type: 'integer', nullable: true })
  batches: number | null;

  @Column({ name: 'done_by', type: 'varchar', length: 36, nullable: true })
  doneBy: string | null;

  @Column({ name: 'done_by_name', type: 'varchar', length: 120 })
  doneByName: string;

  @Column({ name: 'done_at', type: 'datetime' })
  doneAt: Date;
}
