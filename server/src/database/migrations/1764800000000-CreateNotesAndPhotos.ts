import type { MigrationInterface, QueryRunner } from 'typeorm';

// Voice notes and defect photos of an inspection; their files live in ObjectStorage.
export class CreateNotesAndPhotos1764800000000 implements MigrationInterface {
  name = 'CreateNotesAndPhotos1764800000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            CREATE TABLE "photos" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "organization_id" uuid NOT NULL,
                "inspection_id" uuid NOT NULL,
                "item_key" character varying(160) NOT NULL,
                "client_id" character varying(64) NOT NULL,
                "object_key" character varying(512) NOT NULL,
                "mime_type" character varying(40) NOT NULL,
                "size_bytes" integer NOT NULL,
                "sha256" character(64) NOT NULL,
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_5220c45b8e32d49d767b9b3d725" PRIMARY KEY ("id")
            )
        `);
    await queryRunner.query(`
            CREATE UNIQUE INDEX "UQ_photos_inspection_client" ON "photos" ("inspection_id", "client_id")
        `);
    await queryRunner.query(`
            CREATE TABLE "voice_notes" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "organization_id" uuid NOT NULL,
                "inspection_id" uuid NOT NULL,
                "item_key" character varying(160) NOT NULL,
                "client_id" character varying(64) NOT NULL,
                "object_key" character varying(512) NOT NULL,
                "mime_type" character varying(40) NOT NULL,
                "duration_ms" integer NOT NULL,
                "size_bytes" integer NOT NULL,
                "sha256" character(64) NOT NULL,
                "heard" text,
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_eedc496446b9f8a5c05ede50115" PRIMARY KEY ("id")
            )
        `);
    await queryRunner.query(`
            CREATE UNIQUE INDEX "UQ_voice_notes_inspection_client" ON "voice_notes" ("inspection_id", "client_id")
        `);
    await queryRunner.query(`
            ALTER TABLE "photos"
            ADD CONSTRAINT "FK_e3ce396576d3be3ded2927c8b60" FOREIGN KEY ("organization_id") REFERENCES "organizations"("id") ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "photos"
            ADD CONSTRAINT "FK_d7d0fd3b998695805090b171474" FOREIGN KEY ("inspection_id") REFERENCES "inspections"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "voice_notes"
            ADD CONSTRAINT "FK_20b268eeaa0ebceaa3d8af77e66" FOREIGN KEY ("organization_id") REFERENCES "organizations"("id") ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE "voice_notes"
            ADD CONSTRAINT "FK_7d786242e4bbab3e4b079a315f1" FOREIGN KEY ("inspection_id") REFERENCES "inspections"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE "voice_notes" DROP CONSTRAINT "FK_7d786242e4bbab3e4b079a315f1"
        `);
    await queryRunner.query(`
            ALTER TABLE "voice_notes" DROP CONSTRAINT "FK_20b268eeaa0ebceaa3d8af77e66"
        `);
    await queryRunner.query(`
            ALTER TABLE "photos" DROP CONSTRAINT "FK_d7d0fd3b998695805090b171474"
        `);
    await queryRunner.query(`
            ALTER TABLE "photos" DROP CONSTRAINT "FK_e3ce396576d3be3ded2927c8b60"
        `);
    await queryRunner.query(`
            DROP INDEX "public"."UQ_voice_notes_inspection_client"
        `);
    await queryRunner.query(`
            DROP TABLE "voice_notes"
        `);
    await queryRunner.query(`
            DROP INDEX "public"."UQ_photos_inspection_client"
        `);
    await queryRunner.query(`
            DROP TABLE "photos"
        `);
  }
}
