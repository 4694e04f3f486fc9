import type { MigrationInterface, QueryRunner } from 'typeorm';

/** PostgreSQL twin of `../1765600000000-prep-tick-batches.ts` (see there for the why). */
export class PrepTickBatches1765600000000 implements MigrationInterface {
  name = 'PrepTickBatches1765600000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "prep_task_ticks" ADD COLUMN "batches" integer`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "prep_task_ticks" DROP COLUMN "batches"`);
  }
}
