import type { MigrationInterface, QueryRunner } from 'typeorm';

// The fleet board, the supervisor's list (filters, sorts, keyset pages), review flags and record retention.
export class FleetReviewRetention1764900000000 implements MigrationInterface {
  name = 'FleetReviewRetention1764900000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "organizations" ADD "retention_months" integer NOT NULL DEFAULT 3`);
    await queryRunner.query(`ALTER TABLE "inspections" ADD "recurring_defect" boolean NOT NULL DEFAULT false`);
    await queryRunner.query(`ALTER TABLE "inspections" ADD "duration_seconds" integer`);
    // Reports submitted before this migration: from the start to their last answer.
    await queryRunner.query(`
            UPDATE "inspections" i SET "duration_seconds" = GREATEST(0, round(extract(epoch FROM r.last_at - i.started_at)))::int
            FROM (SELECT inspection_id, max(answered_at) AS last_at FROM item_results GROUP BY inspection_id) r
            WHERE r.inspection_id = i.id AND i.status = 'submitted'
        `);
    // Keyset pages newest first (entity metadata cannot say DESC or WHERE): by submission time, and
    // partial indexes for the selective filters so a filtered page never scans the whole organisation.
    await queryRunner.query(
      `CREATE INDEX "IDX_inspections_org_submitted" ON "inspections" ("organization_id", "submitted_at" DESC, "id" DESC) WHERE "submitted_at" IS NOT NULL`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_inspections_org_defects_started" ON "inspections" ("organization_id", "started_at" DESC, "id" DESC) WHERE "defect_count" > 0`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_inspections_org_rushed_started" ON "inspections" ("organization_id", "started_at" DESC, "id" DESC) WHERE "rushed"`,
    );
    // Walk-arounds in progress are few among many submitted ones: a small index of their own.
    await queryRunner.query(
      `CREATE INDEX "IDX_inspections_org_open_started" ON "inspections" ("organization_id", "started_at" DESC, "id" DESC) WHERE "status" = 'in_progress'`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "public"."IDX_inspections_org_open_started"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_inspections_org_rushed_started"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_inspections_org_defects_started"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_inspections_org_submitted"`);
    await queryRunner.query(`ALTER TABLE "inspections" DROP COLUMN "duration_seconds"`);
    await queryRunner.query(`ALTER TABLE "inspections" DROP COLUMN "recurring_defect"`);
    await queryRunner.query(`ALTER TABLE "organizations" DROP COLUMN "retention_months"`);
  }
}
