import type { MigrationInterface, QueryRunner } from "typeorm";

export class Register1796164859341 implements MigrationInterface {
    name = 'Register1796164859341'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "areas" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "site_id" uuid NOT NULL, "code" text NOT NULL, "name" text NOT NULL, "archived_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_5110493f6342f34c978c084d0d6" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "areas_site_code_key" ON "areas"  ("site_id", "code") `);
        await queryRunner.query(`CREATE TABLE "assembly_events" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "assembly_id" uuid NOT NULL, "position_id" uuid, "site_id" uuid NOT NULL, "kind" text NOT NULL, "occurred_at" TIMESTAMP WITH TIME ZONE NOT NULL, "occurred_at_estimated" boolean NOT NULL DEFAULT false, "recorded_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "actor_id" uuid, "work_order" text, "hour_meter_hours" double precision, "note" text, "data" jsonb NOT NULL DEFAULT '{}', "voids_event_id" uuid, CONSTRAINT "PK_b2b386e00ba6b4ca9a3d9d8df88" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "assembly_events_site_id_idx" ON "assembly_events"  ("site_id") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "assembly_events_voids_idx" ON "assembly_events"  ("voids_event_id") WHERE voids_event_id IS NOT NULL`);
        await queryRunner.query(`CREATE INDEX "assembly_events_position_idx" ON "assembly_events"  ("position_id", "occurred_at") `);
        await queryRunner.query(`CREATE INDEX "assembly_events_assembly_idx" ON "assembly_events"  ("assembly_id", "occurred_at") `);
        await queryRunner.query(`CREATE TABLE "constructions" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "code" text NOT NULL, "name" text NOT NULL, "tube_compound" text, "reinforcement" text, "cover_compound" text, "size_code" text NOT NULL, "working_pressure_kpa" double precision, "burst_pressure_kpa" double precision, "vacuum_rating_kpa" double precision, "min_temp_c" double precision, "max_temp_c" double precision, "min_bend_radius_mm" double precision, "weight_kg_per_m" double precision, "electrical" text, "food_contact_certified" boolean, "maker" text, "part_number" text, "service_life_months" integer, "shelf_life_months" integer, "storage_life_months" integer, "notes" text, "archived_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_6f9140ade15430dea23f3d84a2f" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "constructions_code_key" ON "constructions"  ("code") `);
        await queryRunner.query(`CREATE INDEX "constructions_size_code_idx" ON "constructions"  ("size_code") `);
        await queryRunner.query(`CREATE TABLE "fitting_types" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "code" text NOT NULL, "name" text NOT NULL, "style" text NOT NULL, "material" text NOT NULL, "sizes" jsonb NOT NULL DEFAULT '[]', "notes" text, "archived_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_08bdd2a74b6cecce4d2a224fe0f" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "fitting_types_code_key" ON "fitting_types"  ("code") `);
        await queryRunner.query(`CREATE TABLE "equipment" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "site_id" uuid NOT NULL, "area_id" uuid NOT NULL, "asset_number" text NOT NULL, "name" text NOT NULL, "has_hour_meter" boolean NOT NULL DEFAULT false, "hour_meter_hours" double precision, "hour_meter_read_at" TIMESTAMP WITH TIME ZONE, "archived_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_0722e1b9d6eb19f5874c1678740" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "equipment_site_id_idx" ON "equipment"  ("site_id") `);
        await queryRunner.query(`CREATE INDEX "equipment_area_id_idx" ON "equipment"  ("area_id") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "equipment_site_asset_number_key" ON "equipment"  ("site_id", "asset_number") `);
        await queryRunner.query(`CREATE TABLE "positions" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "site_id" uuid NOT NULL, "equipment_id" uuid NOT NULL, "code" text NOT NULL, "name" text NOT NULL, "service_code" text NOT NULL, "medium_code" text, "max_operating_pressure_kpa" double precision, "min_temp_c" double precision, "max_temp_c" double precision, "size_code" text NOT NULL, "required_length_mm" double precision, "end_a_connection" text, "end_b_connection" text, "suction_duty" boolean, "routed_bend_radius_mm" double precision, "criticality" text NOT NULL DEFAULT 'medium', "inspection_interval_days" integer, "notes" text, "archived_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_17e4e62ccd5749b289ae3fae6f3" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "positions_site_id_idx" ON "positions"  ("site_id") `);
        await queryRunner.query(`CREATE INDEX "positions_equipment_id_idx" ON "positions"  ("equipment_id") `);
        await queryRunner.query(`CREATE INDEX "positions_service_code_idx" ON "positions"  ("service_code") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "positions_site_code_key" ON "positions"  ("site_id", "code") `);
        await queryRunner.query(`CREATE TABLE "assemblies" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "number" text NOT NULL, "construction_id" uuid NOT NULL, "hose_batch" text, "hose_manufactured_on" date, "overall_length_mm" double precision, "cut_length_mm" double precision, "end_a_fitting_type_id" uuid, "end_b_fitting_type_id" uuid, "end_a_crimp_mm" double precision, "end_b_crimp_mm" double precision, "built_on" date, "built_on_estimated" boolean NOT NULL DEFAULT false, "builder" text, "cost" double precision, "status" text NOT NULL, "site_id" uuid NOT NULL, "store_location" text, "position_id" uuid, "installed_at" TIMESTAMP WITH TIME ZONE, "installed_at_estimated" boolean NOT NULL DEFAULT false, "predates_records" boolean NOT NULL DEFAULT false, "proof_test" jsonb, "check_outcome" text, "check_results" jsonb, "last_inspected_at" TIMESTAMP WITH TIME ZONE, "next_inspection_due" date, "notes" text, "version" integer NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_25f742ba403068985d28f3fe0c7" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "assemblies_number_key" ON "assemblies"  ("number") `);
        await queryRunner.query(`CREATE INDEX "assemblies_construction_id_idx" ON "assemblies"  ("construction_id") `);
        await queryRunner.query(`CREATE INDEX "assemblies_site_id_idx" ON "assemblies"  ("site_id") `);
        await queryRunner.query(`CREATE INDEX "assemblies_check_outcome_idx" ON "assemblies"  ("check_outcome") `);
        await queryRunner.query(`CREATE INDEX "assemblies_next_inspection_due_idx" ON "assemblies"  ("next_inspection_due") `);
        await queryRunner.query(`CREATE INDEX "assemblies_site_status_idx" ON "assemblies"  ("site_id", "status") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "assemblies_one_per_position" ON "assemblies"  ("position_id") WHERE status IN ('installed', 'tagged_out')`);
        await queryRunner.query(`CREATE TABLE "check_overrides" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "assembly_id" uuid NOT NULL, "position_id" uuid NOT NULL, "check_code" text NOT NULL, "reason" text NOT NULL, "review_on" date NOT NULL, "actor_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_fedf3853ac96238d6bd4ebe694c" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "check_overrides_assembly_position_idx" ON "check_overrides"  ("assembly_id", "position_id") `);
        await queryRunner.query(`CREATE TABLE "idempotency_records" ("key" text NOT NULL, "user_id" uuid NOT NULL, "action" text NOT NULL, "request_hash" text NOT NULL, "response_status" integer NOT NULL, "response_body" jsonb NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_f97e644e78e639ac55614cbaffe" PRIMARY KEY ("key"))`);
        await queryRunner.query(`CREATE TABLE "site_services" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "site_id" uuid NOT NULL, "service_code" text NOT NULL, "settings" jsonb NOT NULL, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_8479e7dc1c242d667ad925115bb" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "site_services_site_service_key" ON "site_services"  ("site_id", "service_code") `);
        await queryRunner.query(`ALTER TABLE "sites" ADD "default_units" jsonb NOT NULL DEFAULT '{"lengthUnit": "mm", "pressureUnit": "bar", "temperatureUnit": "C"}'`);
        await queryRunner.query(`ALTER TABLE "sites" ADD "currency" text NOT NULL DEFAULT 'GBP'`);
        await queryRunner.query(`ALTER TABLE "sites" ADD "rule_set_codes" text array NOT NULL DEFAULT '{}'`);
        await queryRunner.query(`ALTER TABLE "areas" ADD CONSTRAINT "FK_71e4a33b9fa99b61afc082e0ce6" FOREIGN KEY ("site_id") REFERENCES "sites"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "equipment" ADD CONSTRAINT "FK_0edc0275046aebde088240b26af" FOREIGN KEY ("area_id") REFERENCES "areas"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "positions" ADD CONSTRAINT "FK_025f5a0e2abbe5a526504c4dfc4" FOREIGN KEY ("equipment_id") REFERENCES "equipment"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "assemblies" ADD CONSTRAINT "FK_52eee9ef90006909734d56cb089" FOREIGN KEY ("construction_id") REFERENCES "constructions"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "assemblies" ADD CONSTRAINT "FK_8421a63af95edea816d5d7218ad" FOREIGN KEY ("end_a_fitting_type_id") REFERENCES "fitting_types"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "assemblies" ADD CONSTRAINT "FK_3332200d86209401f233dd03595" FOREIGN KEY ("end_b_fitting_type_id") REFERENCES "fitting_types"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "assemblies" ADD CONSTRAINT "FK_cb48bec3a07b9075c6663357901" FOREIGN KEY ("position_id") REFERENCES "positions"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "site_services" ADD CONSTRAINT "FK_4a01fea33a2dba56c87b71462f5" FOREIGN KEY ("site_id") REFERENCES "sites"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        // Events and overrides are records of what happened in the plant: append-only, like the audit trail.
        for (const table of ["assembly_events", "check_overrides"]) {
            await queryRunner.query(`CREATE TRIGGER "${table}_append_only" BEFORE UPDATE OR DELETE ON "${table}" FOR EACH ROW EXECUTE FUNCTION "refuse_change"()`);
            await queryRunner.query(`CREATE TRIGGER "${table}_no_truncate" BEFORE TRUNCATE ON "${table}" FOR EACH STATEMENT EXECUTE FUNCTION "refuse_change"()`);
        }
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        for (const table of ["assembly_events", "check_overrides"]) {
            await queryRunner.query(`DROP TRIGGER "${table}_no_truncate" ON "${table}"`);
            await queryRunner.query(`DROP TRIGGER "${table}_append_only" ON "${table}"`);
        }
        await queryRunner.query(`ALTER TABLE "site_services" DROP CONSTRAINT "FK_4a01fea33a2dba56c87b71462f5"`);
        await queryRunner.query(`ALTER TABLE "assemblies" DROP CONSTRAINT "FK_cb48bec3a07b9075c6663357901"`);
        await queryRunner.query(`ALTER TABLE "assemblies" DROP CONSTRAINT "FK_3332200d86209401f233dd03595"`);
        await queryRunner.query(`ALTER TABLE "assemblies" DROP CONSTRAINT "FK_8421a63af95edea816d5d7218ad"`);
        await queryRunner.query(`ALTER TABLE "assemblies" DROP CONSTRAINT "FK_52eee9ef90006909734d56cb089"`);
        await queryRunner.query(`ALTER TABLE "positions" DROP CONSTRAINT "FK_025f5a0e2abbe5a526504c4dfc4"`);
        await queryRunner.query(`ALTER TABLE "equipment" DROP CONSTRAINT "FK_0edc0275046aebde088240b26af"`);
        await queryRunner.query(`ALTER TABLE "areas" DROP CONSTRAINT "FK_71e4a33b9fa99b61afc082e0ce6"`);
        await queryRunner.query(`ALTER TABLE "sites" DROP COLUMN "rule_set_codes"`);
        await queryRunner.query(`ALTER TABLE "sites" DROP COLUMN "currency"`);
        await queryRunner.query(`ALTER TABLE "sites" DROP COLUMN "default_units"`);
        await queryRunner.query(`DROP INDEX "public"."site_services_site_service_key"`);
        await queryRunner.query(`DROP TABLE "site_services"`);
        await queryRunner.query(`DROP TABLE "idempotency_records"`);
        await queryRunner.query(`DROP INDEX "public"."check_overrides_assembly_position_idx"`);
        await queryRunner.query(`DROP TABLE "check_overrides"`);
        await queryRunner.query(`DROP INDEX "public"."assemblies_one_per_position"`);
        await queryRunner.query(`DROP INDEX "public"."assemblies_site_status_idx"`);
        await queryRunner.query(`DROP INDEX "public"."assemblies_next_inspection_due_idx"`);
        await queryRunner.query(`DROP INDEX "public"."assemblies_check_outcome_idx"`);
        await queryRunner.query(`DROP INDEX "public"."assemblies_site_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."assemblies_construction_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."assemblies_number_key"`);
        await queryRunner.query(`DROP TABLE "assemblies"`);
        await queryRunner.query(`DROP INDEX "public"."positions_site_code_key"`);
        await queryRunner.query(`DROP INDEX "public"."positions_service_code_idx"`);
        await queryRunner.query(`DROP INDEX "public"."positions_equipment_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."positions_site_id_idx"`);
        await queryRunner.query(`DROP TABLE "positions"`);
        await queryRunner.query(`DROP INDEX "public"."equipment_site_asset_number_key"`);
        await queryRunner.query(`DROP INDEX "public"."equipment_area_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."equipment_site_id_idx"`);
        await queryRunner.query(`DROP TABLE "equipment"`);
        await queryRunner.query(`DROP INDEX "public"."fitting_types_code_key"`);
        await queryRunner.query(`DROP TABLE "fitting_types"`);
        await queryRunner.query(`DROP INDEX "public"."constructions_size_code_idx"`);
        await queryRunner.query(`DROP INDEX "public"."constructions_code_key"`);
        await queryRunner.query(`DROP TABLE "constructions"`);
        await queryRunner.query(`DROP INDEX "public"."assembly_events_assembly_idx"`);
        await queryRunner.query(`DROP INDEX "public"."assembly_events_position_idx"`);
        await queryRunner.query(`DROP INDEX "public"."assembly_events_voids_idx"`);
        await queryRunner.query(`DROP INDEX "public"."assembly_events_site_id_idx"`);
        await queryRunner.query(`DROP TABLE "assembly_events"`);
        await queryRunner.query(`DROP INDEX "public"."areas_site_code_key"`);
        await queryRunner.query(`DROP TABLE "areas"`);
    }

}
