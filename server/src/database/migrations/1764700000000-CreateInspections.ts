import type { MigrationInterface, QueryRunner } from 'typeorm';

// Walk-around inspections, their vehicles, answers, defects, repair certifications and signatures.

export class CreateInspections1764700000000 implements MigrationInterface {
  name = 'CreateInspections1764700000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            CREATE TYPE "public"."inspection_kind" AS ENUM('pre_trip', 'post_trip', 'en_route', 'practice')
        `);
    await queryRunner.query(`
            CREATE TYPE "public"."inspection_status" AS ENUM('in_progress', 'submitted')
        `);
    await queryRunner.query(`
            CREATE TABLE "inspections" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "organization_id" uuid NOT NULL,
                "driver_id" uuid NOT NULL,
                "kind" "public"."inspection_kind" NOT NULL,
                "status" "public"."inspection_status" NOT NULL DEFAULT 'in_progress',
                "locale" character varying(5) NOT NULL,
                "client_id" character varying(64) NOT NULL,
                "started_at" TIMESTAMP WITH TIME ZONE NOT NULL,
                "submitted_at" TIMESTAMP WITH TIME ZONE,
                "odometer" integer,
                "location" character varying(200),
                "vehicles" jsonb NOT NULL,
                "rushed" boolean NOT NULL DEFAULT false,
                "defect_count" integer NOT NULL DEFAULT '0',
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_a484980015782324454d8c88abe" PRIMARY KEY ("id")
            )
        `);
    await queryRunner.query(`
            CREATE UNIQUE INDEX "UQ_inspections_driver_client" ON "inspections" ("driver_id", "client_id")
        `);
    await queryRunner.query(`
            CREATE TYPE "public"."defect_status" AS ENUM(
                'open',
                'repaired',
                'no_repair_needed',
                'deferred'
            )
        `);
    await queryRunner.query(`
            CREATE TABLE "defects" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "organization_id" uuid NOT NULL,
                "inspection_id" uuid NOT NULL,
                "vehicle_id" uuid NOT NULL,
                "item_key" character varying(160) NOT NULL,
                "title" character varying(200) NOT NULL,
                "position_label" character varying(200) NOT NULL,
                "safety" boolean NOT NULL,
                "detail" text,
                "measurement" jsonb,
                "measurement_limit" jsonb,
                "status" "public"."defect_status" NOT NULL DEFAULT 'open',
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_b4bca3e4d032e3b50d1889ad296" PRIMARY KEY ("id")
            )
        `);
    await queryRunner.query(`
            CREATE INDEX "IDX_defects_inspection" ON "defects" ("inspection_id")
        `);
    await queryRunner.query(`
            CREATE INDEX "IDX_defects_vehicle_status" ON "defects" ("vehicle_id", "status")
        `);
    await queryRunner.query(`
            CREATE INDEX "IDX_defects_org_status_created" ON "defects" ("organization_id", "status", "created_at")
        `);
    await queryRunner.query(`
            CREATE TYPE "public"."repair_action" AS ENUM('repaired', 'no_repair_needed', 'deferred')
        `);
    await queryRunner.query(`
            CREATE TABLE "repairs" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "defect_id" uuid NOT NULL,
                "action" "public"."repair_action" NOT NULL,
                "note" text NOT NULL,
                "deferred_until" TIMESTAMP WITH TIME ZONE,
                "mechanic_id" uuid NOT NULL,
                "signed_at" TIMESTAMP WITH TIME ZONE NOT NULL,
                CONSTRAINT "PK_f075e413c4b1d29911f893b33e7" PRIMARY KEY ("id")
            )
        `);
    await queryRunner.query(`
            CREATE INDEX "IDX_repairs_defect" ON "repairs" ("defect_id", "signed_at")
        `);
    await queryRunner.query(`
            CREATE TABLE "inspection_vehicles" (
                "inspection_id" uuid NOT NULL,
                "position" smallint NOT NULL,
                "vehicle_id" uuid NOT NULL,
                CONSTRAINT "PK_673dcde8dd1505fa3576621283b" PRIMARY KEY ("inspection_id", "position")
            )
        `);
    await queryRunner.query(`
            CREATE INDEX "IDX_inspection_vehicles_vehicle" ON "inspection_vehicles" ("vehicle_id", "inspection_id")
        `);
    await queryRunner.query(`
            CREATE TYPE "public"."item_answer" AS ENUM('pass', 'defect', 'not_applicable')
        `);
    await queryRunner.query(`
            CREATE TYPE "public"."item_verdict" AS ENUM('ok', 'near_limit', 'out_of_limit')
        `);
    await queryRunner.query(`
            CREATE TABLE "item_results" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "inspection_id" uuid NOT NULL,
                "item_key" character varying(160) NOT NULL,
                "client_id" character varying(64) NOT NULL,
                "answer" "public"."item_answer" NOT NULL,
                "measurement_quantity" character varying(32),
                "measurement_value" double precision,
                "measurement_unit" character varying(16),
                "verdict" "public"."item_verdict",
                "limit_value" double precision,
                "limit_unit" character varying(16),
                "limit_source" character varying(120),
                "detail" text,
                "heard" text,
                "confidence" real,
                "answered_at" TIMESTAMP WITH TIME ZONE NOT NULL,
                CONSTRAINT "PK_ba00b73a795ad3883c2a1208ad9" PRIMARY KEY ("id")
            )
        `);
    await queryRunner.query(`
            CREATE UNIQUE INDEX "UQ_item_results_inspection_client" ON "item_results" ("inspection_id", "client_id")
        `);
    await queryRunner.query(`
            CREATE UNIQUE INDEX "UQ_item_results_inspection_item" ON "item_results" ("inspection_id", "item_key")
        `);
    await queryRunner.query(`
            CREATE TYPE "public"."signature_role" AS ENUM('driver', 'mechanic', 'next_driver')
        `);
    await queryRunner.query(`
            CREATE TABLE "signatures" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "inspection_id" uuid NOT NULL,
                "defect_id" uuid,
                "role" "public"."signature_role" NOT NULL,
                "signer_id" uuid NOT NULL,
                "name" character varying(120) NOT NULL,
                "drawing" text,
                "statement" text NOT NULL,
                "signed_at" TIMESTAMP WITH TIME ZONE NOT NULL,
                CONSTRAINT "PK_f56eb3cd344ce7f9ae28ce814eb" PRIMARY KEY ("id")
            )
        `);
    await queryRunner.query(`
            CREATE INDEX "IDX_signatures_defect" ON "signatures" ("defect_id")
        `);
    await queryRunner.query(`
            CREATE INDEX "IDX_signatures_inspection" ON "signatures" ("inspection_id", "signed_at")
        `);
    await queryRunner.query(`
            ALTER TABLE "inspections"
            ADD CONSTRAINT "FK_933fe8019e2f954d910bf5c5122" FOREIGN KEY ("organization_id") REFERENCES "organizations"("id") ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "inspections"
            ADD CONSTRAINT "FK_adce1384a3c157bb65d6c6b22c8" FOREIGN KEY ("driver_id") REFERENCES "users"("id") ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "defects"
            ADD CONSTRAINT "FK_5213a6c88ec82ba04aefde3c7e9" FOREIGN KEY ("organization_id") REFERENCES "organizations"("id") ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "defects"
            ADD CONSTRAINT "FK_4ce8bd137e020c3c843df2f1e2a" FOREIGN KEY ("inspection_id") REFERENCES "inspections"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "defects"
            ADD CONSTRAINT "FK_769cc2664ebe7893f3cff0f8f57" FOREIGN KEY ("vehicle_id") REFERENCES "vehicles"("id") ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "repairs"
            ADD CONSTRAINT "FK_67b4c7febe7a1d0ea0a3c4d1cfd" FOREIGN KEY ("defect_id") REFERENCES "defects"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "repairs"
            ADD CONSTRAINT "FK_3ce59f534bde487dff994e5726a" FOREIGN KEY ("mechanic_id") REFERENCES "users"("id") ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "inspection_vehicles"
            ADD CONSTRAINT "FK_e263cbe1e2cf29c0a5680247dc8" FOREIGN KEY ("inspection_id") REFERENCES "inspections"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "inspection_vehicles"
            ADD CONSTRAINT "FK_88946ae2d37f3caeaa996f45b23" FOREIGN KEY ("vehicle_id") REFERENCES "vehicles"("id") ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "item_results"
            ADD CONSTRAINT "FK_a77744eb7530baba34ed5a264a9" FOREIGN KEY ("inspection_id") REFERENCES "inspections"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "signatures"
            ADD CONSTRAINT "FK_5e03e2db594d4644ff8e96a34c5" FOREIGN KEY ("inspection_id") REFERENCES "inspections"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "signatures"
            ADD CONSTRAINT "FK_fbdd618183c2cd8f2d7851ae6ad" FOREIGN KEY ("defect_id") REFERENCES "defects"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "signatures"
            ADD CONSTRAINT "FK_3756743fa6af1eb364101368d7d" FOREIGN KEY ("signer_id") REFERENCES "users"("id") ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    // Newest first for the list's keyset pagination (started_at, id); entity metadata cannot say DESC.
    await queryRunner.query(
      `CREATE INDEX "IDX_inspections_org_started" ON "inspections" ("organization_id", "started_at" DESC, "id" DESC)`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_inspections_org_driver_started" ON "inspections" ("organization_id", "driver_id", "started_at" DESC, "id" DESC)`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_inspections_org_kind_started" ON "inspections" ("organization_id", "kind", "started_at" DESC, "id" DESC)`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "public"."IDX_inspections_org_kind_started"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_inspections_org_driver_started"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_inspections_org_started"`);
    await queryRunner.query(`
            ALTER TABLE "signatures" DROP CONSTRAINT "FK_3756743fa6af1eb364101368d7d"
        `);
    await queryRunner.query(`
            ALTER TABLE "signatures" DROP CONSTRAINT "FK_fbdd618183c2cd8f2d7851ae6ad"
        `);
    await queryRunner.query(`
            ALTER TABLE "signatures" DROP CONSTRAINT "FK_5e03e2db594d4644ff8e96a34c5"
        `);
    await queryRunner.query(`
            ALTER TABLE "item_results" DROP CONSTRAINT "FK_a77744eb7530baba34ed5a264a9"
        `);
    await queryRunner.query(`
            ALTER TABLE "inspection_vehicles" DROP CONSTRAINT "FK_88946ae2d37f3caeaa996f45b23"
        `);
    await queryRunner.query(`
            ALTER TABLE "inspection_vehicles" DROP CONSTRAINT "FK_e263cbe1e2cf29c0a5680247dc8"
        `);
    await queryRunner.query(`
            ALTER TABLE "repairs" DROP CONSTRAINT "FK_3ce59f534bde487dff994e5726a"
        `);
    await queryRunner.query(`
            ALTER TABLE "repairs" DROP CONSTRAINT "FK_67b4c7febe7a1d0ea0a3c4d1cfd"
        `);
    await queryRunner.query(`
            ALTER TABLE "defects" DROP CONSTRAINT "FK_769cc2664ebe7893f3cff0f8f57"
        `);
    await queryRunner.query(`
            ALTER TABLE "defects" DROP CONSTRAINT "FK_4ce8bd137e020c3c843df2f1e2a"
        `);
    await queryRunner.query(`
            ALTER TABLE "defects" DROP CONSTRAINT "FK_5213a6c88ec82ba04aefde3c7e9"
        `);
    await queryRunner.query(`
            ALTER TABLE "inspections" DROP CONSTRAINT "FK_adce1384a3c157bb65d6c6b22c8"
        `);
    await queryRunner.query(`
            ALTER TABLE "inspections" DROP CONSTRAINT "FK_933fe8019e2f954d910bf5c5122"
        `);
    await queryRunner.query(`
            DROP INDEX "public"."IDX_signatures_inspection"
        `);
    await queryRunner.query(`
            DROP INDEX "public"."IDX_signatures_defect"
        `);
    await queryRunner.query(`
            DROP TABLE "signatures"
        `);
    await queryRunner.query(`
            DROP TYPE "public"."signature_role"
        `);
    await queryRunner.query(`
            DROP INDEX "public"."UQ_item_results_inspection_item"
        `);
    await queryRunner.query(`
            DROP INDEX "public"."UQ_item_results_inspection_client"
        `);
    await queryRunner.query(`
            DROP TABLE "item_results"
        `);
    await queryRunner.query(`
            DROP TYPE "public"."item_verdict"
        `);
    await queryRunner.query(`
            DROP TYPE "public"."item_answer"
        `);
    await queryRunner.query(`
            DROP INDEX "public"."IDX_inspection_vehicles_vehicle"
        `);
    await queryRunner.query(`
            DROP TABLE "inspection_vehicles"
        `);
    await queryRunner.query(`
            DROP INDEX "public"."IDX_repairs_defect"
        `);
    await queryRunner.query(`
            DROP TABLE "repairs"
        `);
    await queryRunner.query(`
            DROP TYPE "public"."repair_action"
        `);
    await queryRunner.query(`
            DROP INDEX "public"."IDX_defects_org_status_created"
        `);
    await queryRunner.query(`
            DROP INDEX "public"."IDX_defects_vehicle_status"
        `);
    await queryRunner.query(`
            DROP INDEX "public"."IDX_defects_inspection"
        `);
    await queryRunner.query(`
            DROP TABLE "defects"
        `);
    await queryRunner.query(`
            DROP TYPE "public"."defect_status"
        `);
    await queryRunner.query(`
            DROP INDEX "public"."UQ_inspections_driver_client"
        `);
    await queryRunner.query(`
            DROP TABLE "inspections"
        `);
    await queryRunner.query(`
            DROP TYPE "public"."inspection_status"
        `);
    await queryRunner.query(`
            DROP TYPE "public"."inspection_kind"
        `);
  }
}
