import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A prep tick records the batches the task had when it was ticked. Task keys no longer include
 * the orders or the batch count, so confirming another order into the same batch keeps the
 * tick, and the schedule shows the batches added since.
 */
export class PrepTickBatches1765600000000 implements MigrationInterface {
  name = 'PrepTickBatches1765600000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "prep_task_ticks" ADD COLUMN "batches" integer`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "prep_task_ticks" DROP COLUMN "batches"`);
  }
}
