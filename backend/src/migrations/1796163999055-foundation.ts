import type { MigrationInterface, QueryRunner } from "typeorm";

export class Foundation1796163999055 implements MigrationInterface {
    name = 'Foundation1796163999055'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "app_settings" ("key" text NOT NULL, "value" jsonb NOT NULL, CONSTRAINT "PK_975c2db59c65c05fd9c6b63a2ab" PRIMARY KEY ("key"))`);
        await queryRunner.query(`CREATE TABLE "attempt_counters" ("key" text NOT NULL, "count" integer NOT NULL DEFAULT '0', "window_started_at" TIMESTAMP WITH TIME ZONE NOT NULL, "last_at" TIMESTAMP WITH TIME ZONE NOT NULL, CONSTRAINT "PK_02a349cf172a0c5a28010135949" PRIMARY KEY ("key"))`);
        await queryRunner.query(`CREATE TABLE "audit_entries" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "actor_id" uuid, "action" text NOT NULL, "entity_type" text NOT NULL, "entity_id" uuid, "site_id" uuid, "before" jsonb, "after" jsonb, CONSTRAINT "PK_6b1623bcad4d04530b76548d619" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "audit_entries_at_idx" ON "audit_entries"  ("at") `);
        await queryRunner.query(`CREATE INDEX "audit_entries_site_id_idx" ON "audit_entries"  ("site_id") `);
        await queryRunner.query(`CREATE INDEX "audit_entries_entity_idx" ON "audit_entries"  ("entity_type", "entity_id", "at") `);
        await queryRunner.query(`CREATE TABLE "link_tokens" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "user_id" uuid NOT NULL, "purpose" text NOT NULL, "token_hash" text NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "used_at" TIMESTAMP WITH TIME ZONE, CONSTRAINT "PK_af579a5188d3dfebc6bb1a4f6fd" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "link_tokens_user_id_idx" ON "link_tokens"  ("user_id") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "link_tokens_token_hash_key" ON "link_tokens"  ("token_hash") `);
        await queryRunner.query(`CREATE TABLE "sessions" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "user_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "revoked_at" TIMESTAMP WITH TIME ZONE, "ip_address" text, "user_agent" text, CONSTRAINT "PK_3238ef96f18b355b671619111bc" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "sessions_user_id_idx" ON "sessions"  ("user_id") `);
        await queryRunner.query(`CREATE TABLE "sites" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "code" text NOT NULL, "name" text NOT NULL, "time_zone" text NOT NULL DEFAULT 'UTC', "archived_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_4f5eccb1dfde10c9170502595a7" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "sites_code_key" ON "sites"  ("code") `);
        await queryRunner.query(`CREATE TABLE "users" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "email" text NOT NULL, "name" text NOT NULL, "password_hash" text, "role" text NOT NULL, "all_sites" boolean NOT NULL DEFAULT false, "site_ids" uuid array NOT NULL DEFAULT '{}', "access_expires_on" date, "active" boolean NOT NULL DEFAULT true, "session_version" integer NOT NULL DEFAULT '1', "preferences" jsonb NOT NULL DEFAULT '{}', "last_sign_in_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_a3ffb1c0c8416b9fc6f907b7433" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "users_email_key" ON "users"  ("email") `);
        await queryRunner.query(`CREATE INDEX "users_role_idx" ON "users"  ("role") `);
        // Records of what happened are append-only: the application can add audit rows, never change them.
        await queryRunner.query(`CREATE FUNCTION "refuse_change"() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN RAISE EXCEPTION 'append_only: % rows cannot be %d', TG_TABLE_NAME, lower(TG_OP) USING ERRCODE = '42501'; END $$`);
        await queryRunner.query(`CREATE TRIGGER "audit_entries_append_only" BEFORE UPDATE OR DELETE ON "audit_entries" FOR EACH ROW EXECUTE FUNCTION "refuse_change"()`);
        await queryRunner.query(`CREATE TRIGGER "audit_entries_no_truncate" BEFORE TRUNCATE ON "audit_entries" FOR EACH STATEMENT EXECUTE FUNCTION "refuse_change"()`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TRIGGER "audit_entries_no_truncate" ON "audit_entries"`);
        await queryRunner.query(`DROP TRIGGER "audit_entries_append_only" ON "audit_entries"`);
        await queryRunner.query(`DROP FUNCTION "refuse_change"()`);
        await queryRunner.query(`DROP INDEX "public"."users_role_idx"`);
        await queryRunner.query(`DROP INDEX "public"."users_email_key"`);
        await queryRunner.query(`DROP TABLE "users"`);
        await queryRunner.query(`DROP INDEX "public"."sites_code_key"`);
        await queryRunner.query(`DROP TABLE "sites"`);
        await queryRunner.query(`DROP INDEX "public"."sessions_user_id_idx"`);
        await queryRunner.query(`DROP TABLE "sessions"`);
        await queryRunner.query(`DROP INDEX "public"."link_tokens_token_hash_key"`);
        await queryRunner.query(`DROP INDEX "public"."link_tokens_user_id_idx"`);
        await queryRunner.query(`DROP TABLE "link_tokens"`);
        await queryRunner.query(`DROP INDEX "public"."audit_entries_entity_idx"`);
        await queryRunner.query(`DROP INDEX "public"."audit_entries_site_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."audit_entries_at_idx"`);
        await queryRunner.query(`DROP TABLE "audit_entries"`);
        await queryRunner.query(`DROP TABLE "attempt_counters"`);
        await queryRunner.query(`DROP TABLE "app_settings"`);
    }

}
