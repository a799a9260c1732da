import type { MigrationInterface, QueryRunner } from 'typeorm';

// Organisations, their users and invitations, and their vehicles.
export class CreateFoundation1764633600000 implements MigrationInterface {
  name = 'CreateFoundation1764633600000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "organizations" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "name" character varying(120) NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_6b031fcd0863e3f6b44230163f9" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(
      `CREATE TYPE "public"."user_role" AS ENUM('driver', 'mechanic', 'supervisor', 'trainer', 'admin')`,
    );
    await queryRunner.query(`CREATE TYPE "public"."user_status" AS ENUM('active', 'invited')`);
    await queryRunner.query(
      `CREATE TABLE "users" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "email" character varying(254) NOT NULL, "name" character varying(120) NOT NULL, "role" "public"."user_role" NOT NULL, "is_student" boolean NOT NULL DEFAULT false, "password_hash" character varying(100), "status" "public"."user_status" NOT NULL DEFAULT 'invited', "settings" jsonb NOT NULL DEFAULT '{}', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_a3ffb1c0c8416b9fc6f907b7433" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_users_organization_id" ON "users"  ("organization_id") `);
    await queryRunner.query(
      `CREATE TABLE "invitations" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "user_id" uuid NOT NULL, "token_hash" character(64) NOT NULL, "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "accepted_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_872ac94a64b3d44fc4b554780cd" UNIQUE ("token_hash"), CONSTRAINT "PK_5dec98cfdfd562e4ad3648bbb07" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_invitations_user_id" ON "invitations"  ("user_id") `);
    await queryRunner.query(
      `CREATE TYPE "public"."vehicle_kind" AS ENUM('tractor', 'trailer', 'straight_truck', 'bus')`,
    );
    await queryRunner.query(`CREATE TYPE "public"."vehicle_status" AS ENUM('in_service', 'out_of_service')`);
    await queryRunner.query(
      `CREATE TABLE "vehicles" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "unit_number" character varying(20) NOT NULL, "kind" "public"."vehicle_kind" NOT NULL, "vin" character varying(17) NOT NULL, "plate" character varying(12) NOT NULL, "status" "public"."vehicle_status" NOT NULL DEFAULT 'in_service', "status_reason" text, "status_since" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "config" jsonb NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_18d8646b59304dce4af3a9e35b6" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(
      `ALTER TABLE "users" ADD CONSTRAINT "FK_21a659804ed7bf61eb91688dea7" FOREIGN KEY ("organization_id") REFERENCES "organizations"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "invitations" ADD CONSTRAINT "FK_fecdffec754fa4d5cea98709776" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "vehicles" ADD CONSTRAINT "FK_f9603f682ee2d499d3abfd50225" FOREIGN KEY ("organization_id") REFERENCES "organizations"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
    // Case-insensitive uniqueness, which entity metadata cannot express (declared there with synchronize: false).
    await queryRunner.query(`CREATE UNIQUE INDEX "UQ_users_email_lower" ON "users" (lower("email"))`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_vehicles_org_unit_number_lower" ON "vehicles" ("organization_id", lower("unit_number"))`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "public"."UQ_vehicles_org_unit_number_lower"`);
    await queryRunner.query(`DROP INDEX "public"."UQ_users_email_lower"`);
    await queryRunner.query(`ALTER TABLE "vehicles" DROP CONSTRAINT "FK_f9603f682ee2d499d3abfd50225"`);
    await queryRunner.query(`ALTER TABLE "invitations" DROP CONSTRAINT "FK_fecdffec754fa4d5cea98709776"`);
    await queryRunner.query(`ALTER TABLE "users" DROP CONSTRAINT "FK_21a659804ed7bf61eb91688dea7"`);
    await queryRunner.query(`DROP TABLE "vehicles"`);
    await queryRunner.query(`DROP TYPE "public"."vehicle_status"`);
    await queryRunner.query(`DROP TYPE "public"."vehicle_kind"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_invitations_user_id"`);
    await queryRunner.query(`DROP TABLE "invitations"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_users_organization_id"`);
    await queryRunner.query(`DROP TABLE "users"`);
    await queryRunner.query(`DROP TYPE "public"."user_status"`);
    await queryRunner.query(`DROP TYPE "public"."user_role"`);
    await queryRunner.query(`DROP TABLE "organizations"`);
  }
}
