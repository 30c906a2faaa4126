import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateBuildsCircuitsUploads1796185917823 implements MigrationInterface {
  name = 'CreateBuildsCircuitsUploads1796185917823';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "builds" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "shop_id" uuid NOT NULL,
        "vehicle_year" text NOT NULL DEFAULT '',
        "vehicle_make" text NOT NULL DEFAULT '',
        "vehicle_model" text NOT NULL DEFAULT '',
        "vehicle_engine" text NOT NULL DEFAULT '',
        "vehicle_transmission" text NOT NULL DEFAULT '',
        "customer_name" text NOT NULL DEFAULT '',
        "customer_phone" text NOT NULL DEFAULT '',
        "customer_email" text NOT NULL DEFAULT '',
        "notes" text NOT NULL DEFAULT '',
        "status" text NOT NULL DEFAULT 'open',
        "created_by" uuid,
        "version" integer NOT NULL,
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        CONSTRAINT "pk_builds" PRIMARY KEY ("id"),
        CONSTRAINT "ck_builds_status" CHECK ("status" IN ('open','on-hold','done')),
        CONSTRAINT "fk_builds_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION,
        CONSTRAINT "fk_builds_created_by" FOREIGN KEY ("created_by") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION
      )`);
    await queryRunner.query(`CREATE INDEX "idx_builds_shop_updated" ON "builds" ("shop_id", "updated_at")`);

    await queryRunner.query(`
      CREATE TABLE "circuits" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "shop_id" uuid NOT NULL,
        "build_id" uuid NOT NULL,
        "name" text NOT NULL,
        "kind" text NOT NULL,
        "fluid" text NOT NULL,
        "max_pressure_psi" numeric NOT NULL,
        "max_temp_f" numeric NOT NULL,
        "status" text NOT NULL DEFAULT 'draft',
        "draft" jsonb NOT NULL,
        "draft_version" integer NOT NULL DEFAULT 1,
        "version" integer NOT NULL,
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        CONSTRAINT "pk_circuits" PRIMARY KEY ("id"),
        CONSTRAINT "ck_circuits_kind" CHECK ("kind" IN ('transmission-cooler','engine-oil-cooler','fuel','turbo-oil','power-steering','coolant','other')),
        CONSTRAINT "ck_circuits_status" CHECK ("status" IN ('draft','in-review','returned','approved','ordered','installed')),
        CONSTRAINT "fk_circuits_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION,
        CONSTRAINT "fk_circuits_build" FOREIGN KEY ("build_id") REFERENCES "builds"("id") ON DELETE CASCADE ON UPDATE NO ACTION
      )`);
    await queryRunner.query(`CREATE INDEX "idx_circuits_shop_build" ON "circuits" ("shop_id", "build_id")`);

    await queryRunner.query(`
      CREATE TABLE "circuit_revisions" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "shop_id" uuid NOT NULL,
        "circuit_id" uuid NOT NULL,
        "number" integer NOT NULL,
        "document" jsonb NOT NULL,
        "draft_version" integer NOT NULL,
        "author_id" uuid,
        "message" text NOT NULL DEFAULT '',
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        CONSTRAINT "pk_circuit_revisions" PRIMARY KEY ("id"),
        CONSTRAINT "ck_circuit_revisions_number" CHECK ("number" >= 1),
        CONSTRAINT "fk_circuit_revisions_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION,
        CONSTRAINT "fk_circuit_revisions_circuit" FOREIGN KEY ("circuit_id") REFERENCES "circuits"("id") ON DELETE CASCADE ON UPDATE NO ACTION,
        CONSTRAINT "fk_circuit_revisions_author" FOREIGN KEY ("author_id") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION
      )`);
    await queryRunner.query(`CREATE UNIQUE INDEX "uq_circuit_revisions_circuit_number" ON "circuit_revisions" ("circuit_id", "number")`);
    // A revision is what a reviewer signed off: its document and number never change once written.
    await queryRunner.query(`
      CREATE FUNCTION "circuit_revisions_immutable"() RETURNS trigger LANGUAGE plpgsql AS \$\$
      BEGIN
        IF NEW."document" IS DISTINCT FROM OLD."document" OR NEW."number" IS DISTINCT FROM OLD."number"
           OR NEW."circuit_id" IS DISTINCT FROM OLD."circuit_id" OR NEW."draft_version" IS DISTINCT FROM OLD."draft_version" THEN
          RAISE EXCEPTION 'circuit revisions are immutable';
        END IF;
        RETURN NEW;
      END \$\$`);
    await queryRunner.query(`
      CREATE TRIGGER "trg_circuit_revisions_immutable" BEFORE UPDATE ON "circuit_revisions"
      FOR EACH ROW EXECUTE FUNCTION "circuit_revisions_immutable"()`);

    await queryRunner.query(`
      CREATE TABLE "uploads" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "shop_id" uuid NOT NULL,
        "build_id" uuid,
        "kind" text NOT NULL,
        "file_name" text NOT NULL,
        "mime_type" text NOT NULL,
        "size_bytes" integer NOT NULL,
        "sha256" text NOT NULL,
        "storage_key" text NOT NULL,
        "width_px" integer,
        "height_px" integer,
        "uploaded_by" uuid,
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        CONSTRAINT "pk_uploads" PRIMARY KEY ("id"),
        CONSTRAINT "ck_uploads_kind" CHECK ("kind" IN ('photo','price-list')),
        CONSTRAINT "ck_uploads_size" CHECK ("size_bytes" > 0),
        CONSTRAINT "fk_uploads_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION,
        CONSTRAINT "fk_uploads_build" FOREIGN KEY ("build_id") REFERENCES "builds"("id") ON DELETE CASCADE ON UPDATE NO ACTION,
        CONSTRAINT "fk_uploads_uploaded_by" FOREIGN KEY ("uploaded_by") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION
      )`);
    await queryRunner.query(`CREATE INDEX "idx_uploads_shop_build" ON "uploads" ("shop_id", "build_id")`);
    await queryRunner.query(`CREATE UNIQUE INDEX "uq_uploads_storage_key" ON "uploads" ("storage_key")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "uploads"`);
    await queryRunner.query(`DROP TABLE "circuit_revisions"`);
    await queryRunner.query(`DROP FUNCTION "circuit_revisions_immutable"()`);
    await queryRunner.query(`DROP TABLE "circuits"`);
    await queryRunner.query(`DROP TABLE "builds"`);
  }
}
