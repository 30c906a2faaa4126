import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateSuppliersParts1796185836552 implements MigrationInterface {
  name = 'CreateSuppliersParts1796185836552';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "suppliers" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "shop_id" uuid NOT NULL,
        "name" text NOT NULL,
        "email" text NOT NULL DEFAULT '',
        "account_number" text NOT NULL DEFAULT '',
        "phone" text NOT NULL DEFAULT '',
        "notes" text NOT NULL DEFAULT '',
        "active" boolean NOT NULL DEFAULT true,
        "demo_key" text,
        "version" integer NOT NULL,
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        CONSTRAINT "pk_suppliers" PRIMARY KEY ("id"),
        CONSTRAINT "fk_suppliers_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION
      )`);
    // A shop does not keep two suppliers of the same name, whatever the letter case.
    await queryRunner.query(`CREATE UNIQUE INDEX "uq_suppliers_shop_name" ON "suppliers" ("shop_id", lower("name"))`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "uq_suppliers_shop_demo_key" ON "suppliers" ("shop_id", "demo_key") WHERE "demo_key" IS NOT NULL`,
    );

    await queryRunner.query(`
      CREATE TABLE "parts" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "shop_id" uuid NOT NULL,
        "supplier_id" uuid,
        "kind" text NOT NULL,
        "supplier_part_number" text NOT NULL DEFAULT '',
        "description" text NOT NULL,
        "price_cents" integer NOT NULL DEFAULT 0,
        "sale_unit" jsonb NOT NULL DEFAULT '{"type":"each"}',
        "stock_on_hand" numeric(12,3) NOT NULL DEFAULT '0',
        "retired" boolean NOT NULL DEFAULT false,
        "attributes" jsonb NOT NULL,
        "demo_key" text,
        "version" integer NOT NULL,
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        CONSTRAINT "pk_parts" PRIMARY KEY ("id"),
        CONSTRAINT "ck_parts_kind" CHECK ("kind" IN ('hose','hose-end','adapter','plug','clamp','sleeve','seal','bulkhead')),
        CONSTRAINT "ck_parts_price_cents" CHECK ("price_cents" >= 0),
        CONSTRAINT "ck_parts_stock_on_hand" CHECK ("stock_on_hand" >= 0),
        CONSTRAINT "fk_parts_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION,
        CONSTRAINT "fk_parts_supplier" FOREIGN KEY ("supplier_id") REFERENCES "suppliers"("id") ON DELETE SET NULL ON UPDATE NO ACTION
      )`);
    await queryRunner.query(`CREATE INDEX "idx_parts_shop_kind" ON "parts" ("shop_id", "kind")`);
    await queryRunner.query(`CREATE INDEX "idx_parts_supplier_id" ON "parts" ("supplier_id")`);
    // One row per supplier part number in a shop; parts without a number are not constrained.
    await queryRunner.query(
      `CREATE UNIQUE INDEX "uq_parts_shop_supplier_number" ON "parts" ("shop_id", "supplier_id", "supplier_part_number") WHERE "supplier_part_number" <> ''`,
    );
    await queryRunner.query(`CREATE UNIQUE INDEX "uq_parts_shop_demo_key" ON "parts" ("shop_id", "demo_key") WHERE "demo_key" IS NOT NULL`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "parts"`);
    await queryRunner.query(`DROP TABLE "suppliers"`);
  }
}
