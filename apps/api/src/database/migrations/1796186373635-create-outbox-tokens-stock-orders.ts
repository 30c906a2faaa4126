import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateOutboxTokensStockOrders1796186373635 implements MigrationInterface {
  name = 'CreateOutboxTokensStockOrders1796186373635';

  async up(queryRunner: QueryRunner): Promise<void> {
    // Every e-mail the app tried to send, with its outcome.
    await queryRunner.query(`
      CREATE TABLE "outbox" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "shop_id" uuid,
        "to_address" text NOT NULL,
        "subject" text NOT NULL,
        "status" text NOT NULL,
        "error" text,
        "message_id" text,
        "attachment_names" text[] NOT NULL DEFAULT '{}',
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        CONSTRAINT "pk_outbox" PRIMARY KEY ("id"),
        CONSTRAINT "ck_outbox_status" CHECK ("status" IN ('sent','failed')),
        CONSTRAINT "fk_outbox_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE
      )`);
    await queryRunner.query(`CREATE INDEX "idx_outbox_shop_created" ON "outbox" ("shop_id", "created_at")`);

    // One-time links (invitation, password reset); only a digest of the token is stored.
    await queryRunner.query(`
      CREATE TABLE "user_tokens" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "user_id" uuid NOT NULL,
        "purpose" text NOT NULL,
        "token_hash" text NOT NULL,
        "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        "used_at" TIMESTAMP WITH TIME ZONE,
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        CONSTRAINT "pk_user_tokens" PRIMARY KEY ("id"),
        CONSTRAINT "ck_user_tokens_purpose" CHECK ("purpose" IN ('invite','reset')),
        CONSTRAINT "fk_user_tokens_user" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE
      )`);
    await queryRunner.query(`CREATE UNIQUE INDEX "uq_user_tokens_hash" ON "user_tokens" ("token_hash")`);
    await queryRunner.query(`CREATE INDEX "idx_user_tokens_user" ON "user_tokens" ("user_id")`);

    await queryRunner.query(`
      CREATE TABLE "stock_adjustments" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "shop_id" uuid NOT NULL,
        "part_id" uuid NOT NULL,
        "delta" numeric(12,3) NOT NULL,
        "reason" text NOT NULL,
        "actor_id" uuid,
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        CONSTRAINT "pk_stock_adjustments" PRIMARY KEY ("id"),
        CONSTRAINT "fk_stock_adjustments_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_stock_adjustments_part" FOREIGN KEY ("part_id") REFERENCES "parts"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_stock_adjustments_actor" FOREIGN KEY ("actor_id") REFERENCES "users"("id") ON DELETE SET NULL
      )`);
    await queryRunner.query(`CREATE INDEX "idx_stock_adjustments_part_created" ON "stock_adjustments" ("part_id", "created_at")`);

    await queryRunner.query(`
      CREATE TABLE "orders" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "shop_id" uuid NOT NULL,
        "supplier_id" uuid,
        "status" text NOT NULL DEFAULT 'draft',
        "circuit_ids" uuid[] NOT NULL DEFAULT '{}',
        "tax_rate_percent" numeric(6,3) NOT NULL DEFAULT 0,
        "subtotal_cents" integer NOT NULL DEFAULT 0,
        "tax_cents" integer NOT NULL DEFAULT 0,
        "total_cents" integer NOT NULL DEFAULT 0,
        "created_by" uuid,
        "sent_at" TIMESTAMP WITH TIME ZONE,
        "version" integer NOT NULL,
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        CONSTRAINT "pk_orders" PRIMARY KEY ("id"),
        CONSTRAINT "ck_orders_status" CHECK ("status" IN ('draft','sent','received','partially-received')),
        CONSTRAINT "fk_orders_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_orders_supplier" FOREIGN KEY ("supplier_id") REFERENCES "suppliers"("id") ON DELETE SET NULL,
        CONSTRAINT "fk_orders_created_by" FOREIGN KEY ("created_by") REFERENCES "users"("id") ON DELETE SET NULL
      )`);
    await queryRunner.query(`CREATE INDEX "idx_orders_shop_created" ON "orders" ("shop_id", "created_at")`);

    await queryRunner.query(`
      CREATE TABLE "order_lines" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "order_id" uuid NOT NULL,
        "position" integer NOT NULL,
        "part_id" uuid,
        "description" text NOT NULL,
        "supplier_part_number" text NOT NULL DEFAULT '',
        "sale_unit" text NOT NULL,
        "quantity" numeric(12,3) NOT NULL,
        "unit_price_cents" integer NOT NULL,
        "line_total_cents" integer NOT NULL,
        "received_quantity" numeric(12,3) NOT NULL DEFAULT 0,
        CONSTRAINT "pk_order_lines" PRIMARY KEY ("id"),
        CONSTRAINT "ck_order_lines_quantity" CHECK ("quantity" > 0 AND "received_quantity" >= 0),
        CONSTRAINT "fk_order_lines_order" FOREIGN KEY ("order_id") REFERENCES "orders"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_order_lines_part" FOREIGN KEY ("part_id") REFERENCES "parts"("id") ON DELETE SET NULL
      )`);
    await queryRunner.query(`CREATE INDEX "idx_order_lines_order" ON "order_lines" ("order_id", "position")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "order_lines"`);
    await queryRunner.query(`DROP TABLE "orders"`);
    await queryRunner.query(`DROP TABLE "stock_adjustments"`);
    await queryRunner.query(`DROP TABLE "user_tokens"`);
    await queryRunner.query(`DROP TABLE "outbox"`);
  }
}
