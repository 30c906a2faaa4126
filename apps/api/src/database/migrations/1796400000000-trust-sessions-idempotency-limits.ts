import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Trust: the refresh grace window (a sealed successor per exchanged token), one order per circuit
 * revision and supplier, receipts booked once per idempotency key, and abuse-limit counters that
 * every API process shares.
 */
export class TrustSessionsIdempotencyLimits1796400000000 implements MigrationInterface {
  name = 'TrustSessionsIdempotencyLimits1796400000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "refresh_tokens" ADD "successor_sealed" text`);

    await queryRunner.query(`
      CREATE TABLE "order_sources" (
        "order_id" uuid NOT NULL,
        "shop_id" uuid NOT NULL,
        "circuit_id" uuid NOT NULL,
        "revision_number" integer NOT NULL,
        "supplier_key" text NOT NULL,
        "created_at" timestamptz NOT NULL DEFAULT now(),
        "updated_at" timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "pk_order_sources" PRIMARY KEY ("order_id", "circuit_id"),
        CONSTRAINT "fk_order_sources_order" FOREIGN KEY ("order_id") REFERENCES "orders"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_order_sources_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_order_sources_circuit" FOREIGN KEY ("circuit_id") REFERENCES "circuits"("id") ON DELETE CASCADE
      )`);
    // The constraint that makes a second (or concurrent) draft of the same revision for the same supplier impossible.
    await queryRunner.query(
      `CREATE UNIQUE INDEX "uq_order_sources_revision_supplier" ON "order_sources" ("circuit_id", "revision_number", "supplier_key")`,
    );
    // Orders drafted before this migration: one source row per circuit they name, at its approved revision.
    await queryRunner.query(`
      INSERT INTO "order_sources" ("order_id", "shop_id", "circuit_id", "revision_number", "supplier_key")
      SELECT o."id", o."shop_id", c."id",
             (SELECT max(r."number") FROM "circuit_revisions" r WHERE r."circuit_id" = c."id" AND r."approved_at" IS NOT NULL),
             coalesce(o."supplier_id"::text, 'none')
        FROM "orders" o
        JOIN "circuits" c ON c."id" = ANY(o."circuit_ids")
       WHERE EXISTS (SELECT 1 FROM "circuit_revisions" r WHERE r."circuit_id" = c."id" AND r."approved_at" IS NOT NULL)
      ON CONFLICT DO NOTHING`);

    await queryRunner.query(`
      CREATE TABLE "order_receipts" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "shop_id" uuid NOT NULL,
        "order_id" uuid NOT NULL,
        "idempotency_key" text,
        "lines_hash" text NOT NULL,
        "lines" jsonb NOT NULL,
        "created_by" uuid,
        "created_at" timestamptz NOT NULL DEFAULT now(),
        "updated_at" timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "pk_order_receipts" PRIMARY KEY ("id"),
        CONSTRAINT "fk_order_receipts_order" FOREIGN KEY ("order_id") REFERENCES "orders"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_order_receipts_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE,
        CONSTRAINT "ck_order_receipts_key_length" CHECK ("idempotency_key" IS NULL OR length("idempotency_key") BETWEEN 1 AND 200)
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "uq_order_receipts_order_key" ON "order_receipts" ("order_id", "idempotency_key") WHERE "idempotency_key" IS NOT NULL`,
    );
    await queryRunner.query(`CREATE INDEX "idx_order_receipts_order_created" ON "order_receipts" ("order_id", "created_at")`);

    // The table layout rate-limiter-flexible's PostgreSQL store expects (its own column names).
    await queryRunner.query(`
      CREATE TABLE "rate_limits" (
        "key" varchar(255) NOT NULL,
        "points" integer NOT NULL DEFAULT 0,
        "expire" bigint,
        CONSTRAINT "pk_rate_limits" PRIMARY KEY ("key")
      )`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "rate_limits"`);
    await queryRunner.query(`DROP TABLE "order_receipts"`);
    await queryRunner.query(`DROP TABLE "order_sources"`);
    await queryRunner.query(`ALTER TABLE "refresh_tokens" DROP COLUMN "successor_sealed"`);
  }
}
