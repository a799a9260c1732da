import type { MigrationInterface, QueryRunner } from 'typeorm';

// Students' narrated practice attempts and their trainers' reviews.
export class CreateTraining1764950000000 implements MigrationInterface {
  name = 'CreateTraining1764950000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TYPE "public"."training_attempt_status" AS ENUM('recording', 'finished')`);
    await queryRunner.query(
      `CREATE TABLE "training_attempts" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "student_id" uuid NOT NULL, "client_id" character varying(64) NOT NULL, "kind" character varying(16) NOT NULL DEFAULT 'practice', "status" "public"."training_attempt_status" NOT NULL DEFAULT 'recording', "locale" character varying(5) NOT NULL, "vehicles" jsonb NOT NULL, "started_at" TIMESTAMP WITH TIME ZONE NOT NULL, "finished_at" TIMESTAMP WITH TIME ZONE, "duration_ms" integer, "segments" jsonb NOT NULL, "score" jsonb, "audio_object_key" character varying(300), "audio_mime_type" character varying(60), "audio_size_bytes" integer, "audio_sha256" character(64), "audio_duration_ms" integer, CONSTRAINT "PK_becd54bf0556d4db97cc5f63405" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_training_attempts_org_started" ON "training_attempts" ("organization_id", "started_at") `,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_training_attempts_student_client" ON "training_attempts" ("student_id", "client_id") `,
    );
    await queryRunner.query(`CREATE TYPE "public"."training_grade" AS ENUM('pass', 'needs_practice', 'fail')`);
    await queryRunner.query(
      `CREATE TABLE "training_reviews" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "attempt_id" uuid NOT NULL, "trainer_id" uuid NOT NULL, "marks" jsonb NOT NULL, "grade" "public"."training_grade" NOT NULL, "comment" text NOT NULL, "reviewed_at" TIMESTAMP WITH TIME ZONE NOT NULL, CONSTRAINT "PK_03377c302e45f3516d989bc7231" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE UNIQUE INDEX "UQ_training_reviews_attempt" ON "training_reviews" ("attempt_id") `);
    await queryRunner.query(
      `ALTER TABLE "training_attempts" ADD CONSTRAINT "FK_64420a9bfc31cc05243440dd37c" FOREIGN KEY ("organization_id") REFERENCES "organizations"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "training_attempts" ADD CONSTRAINT "FK_f7555ad09a5e46eaafab4dd1576" FOREIGN KEY ("student_id") REFERENCES "users"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "training_reviews" ADD CONSTRAINT "FK_5b60df92bf5c290019463584ab3" FOREIGN KEY ("organization_id") REFERENCES "organizations"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "training_reviews" ADD CONSTRAINT "FK_8fdef0eb0b1c71695bd2d692956" FOREIGN KEY ("attempt_id") REFERENCES "training_attempts"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "training_reviews" ADD CONSTRAINT "FK_cd91d122863f65dd64260671adf" FOREIGN KEY ("trainer_id") REFERENCES "users"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "training_reviews" DROP CONSTRAINT "FK_cd91d122863f65dd64260671adf"`);
    await queryRunner.query(`ALTER TABLE "training_reviews" DROP CONSTRAINT "FK_8fdef0eb0b1c71695bd2d692956"`);
    await queryRunner.query(`ALTER TABLE "training_reviews" DROP CONSTRAINT "FK_5b60df92bf5c290019463584ab3"`);
    await queryRunner.query(`ALTER TABLE "training_attempts" DROP CONSTRAINT "FK_f7555ad09a5e46eaafab4dd1576"`);
    await queryRunner.query(`ALTER TABLE "training_attempts" DROP CONSTRAINT "FK_64420a9bfc31cc05243440dd37c"`);
    await queryRunner.query(`DROP INDEX "public"."UQ_training_reviews_attempt"`);
    await queryRunner.query(`DROP TABLE "training_reviews"`);
    await queryRunner.query(`DROP TYPE "public"."training_grade"`);
    await queryRunner.query(`DROP INDEX "public"."UQ_training_attempts_student_client"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_training_attempts_org_started"`);
    await queryRunner.query(`DROP TABLE "training_attempts"`);
    await queryRunner.query(`DROP TYPE "public"."training_attempt_status"`);
  }
}
