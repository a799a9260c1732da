import type { MigrationInterface, QueryRunner } from 'typeorm';

// Measured checks passed without a reading, defects fixed on the spot, and the readings an
// organisation requires (kept on each inspection as they were when it began).
export class ReadingsAndSpotFixes1765200000000 implements MigrationInterface {
  name = 'ReadingsAndSpotFixes1765200000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "organizations" ADD "required_readings" jsonb NOT NULL DEFAULT '[]'`);
    await queryRunner.query(`ALTER TABLE "inspections" ADD "required_readings" jsonb NOT NULL DEFAULT '[]'`);
    await queryRunner.query(`CREATE TYPE "public"."item_no_reading" AS ENUM('visual', 'no_gauge')`);
    await queryRunner.query(`ALTER TABLE "item_results" ADD "no_reading" "public"."item_no_reading"`);
    await queryRunner.query(`ALTER TABLE "item_results" ADD "fixed" jsonb`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "item_results" DROP COLUMN "fixed"`);
    await queryRunner.query(`ALTER TABLE "item_results" DROP COLUMN "no_reading"`);
    await queryRunner.query(`DROP TYPE "public"."item_no_reading"`);
    await queryRunner.query(`ALTER TABLE "inspections" DROP COLUMN "required_readings"`);
    await queryRunner.query(`ALTER TABLE "organizations" DROP COLUMN "required_readings"`);
  }
}
