import type { MigrationInterface, QueryRunner } from "typeorm";

export class ImportJobs1796166100000 implements MigrationInterface {
    name = 'ImportJobs1796166100000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "import_jobs" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "user_id" uuid NOT NULL, "kind" text NOT NULL, "site_id" uuid, "file_name" text NOT NULL, "file_bytes" integer NOT NULL, "content" text NOT NULL, "status" text NOT NULL, "total_rows" integer NOT NULL DEFAULT '0', "processed_rows" integer NOT NULL DEFAULT '0', "error_count" integer NOT NULL DEFAULT '0', "problems" jsonb NOT NULL DEFAULT '[]', "preview" jsonb NOT NULL DEFAULT '[]', "written_rows" integer NOT NULL DEFAULT '0', "message" text, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "finished_at" TIMESTAMP WITH TIME ZONE, CONSTRAINT "PK_4d206c602f173f98e4bb85819a3" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "import_jobs_user_id_idx" ON "import_jobs"  ("user_id") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "public"."import_jobs_user_id_idx"`);
        await queryRunner.query(`DROP TABLE "import_jobs"`);
    }

}
