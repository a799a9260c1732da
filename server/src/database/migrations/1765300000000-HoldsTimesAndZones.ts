import type { MigrationInterface, QueryRunner } from 'typeorm';

// A hold put on a unit by hand (with its reason, kept apart from the defects' hold), the server's
// own time of receipt of each answer, and the organisation's time zone.
export class HoldsTimesAndZones1765300000000 implements MigrationInterface {
  name = 'HoldsTimesAndZones1765300000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "vehicles" ADD "manual_hold_reason" text`);
    await queryRunner.query(
      `ALTER TABLE "item_results" ADD "received_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now()`,
    );
    await queryRunner.query(`ALTER TABLE "organizations" ADD "time_zone" character varying(64) NOT NULL DEFAULT 'UTC'`);
    // A unit out of service with no open safety defect was put there by hand: keep its hold.
    await queryRunner.query(
      `UPDATE "vehicles" v SET "manual_hold_reason" = coalesce(v."status_reason", 'Out of service')
        WHERE v."status" = 'out_of_service'
          AND NOT EXISTS (SELECT 1 FROM "defects" d WHERE d."vehicle_id" = v."id" AND d."status" = 'open' AND d."safety")`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "organizations" DROP COLUMN "time_zone"`);
    await queryRunner.query(`ALTER TABLE "item_results" DROP COLUMN "received_at"`);
    await queryRunner.query(`ALTER TABLE "vehicles" DROP COLUMN "manual_hold_reason"`);
  }
}
