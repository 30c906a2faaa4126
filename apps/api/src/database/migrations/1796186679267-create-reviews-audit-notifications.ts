import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateReviewsAuditNotifications1796186679267 implements MigrationInterface {
  name = 'CreateReviewsAuditNotifications1796186679267';

  async up(queryRunner: QueryRunner): Promise<void> {
    // Sign-off locks a revision: who approved it and when.
    await queryRunner.query(`
      ALTER TABLE "circuit_revisions"
        ADD "locked_at" TIMESTAMP WITH TIME ZONE,
        ADD "approved_by" uuid,
        ADD "approved_at" TIMESTAMP WITH TIME ZONE,
        ADD CONSTRAINT "fk_circuit_revisions_approved_by" FOREIGN KEY ("approved_by") REFERENCES "users"("id") ON DELETE SET NULL`);
    // A locked revision is what the shop lead signed off: nothing on it changes any more, except a
    // deleted user's id becoming NULL (the foreign keys' ON DELETE SET NULL).
    await queryRunner.query(`
      CREATE FUNCTION "circuit_revisions_locked"() RETURNS trigger LANGUAGE plpgsql AS \$\$
      BEGIN
        IF OLD."locked_at" IS NOT NULL AND (
             (NEW."message", NEW."locked_at", NEW."approved_at") IS DISTINCT FROM (OLD."message", OLD."locked_at", OLD."approved_at")
             OR (NEW."author_id" IS DISTINCT FROM OLD."author_id" AND NEW."author_id" IS NOT NULL)
             OR (NEW."approved_by" IS DISTINCT FROM OLD."approved_by" AND NEW."approved_by" IS NOT NULL)) THEN
          RAISE EXCEPTION 'circuit revision % is locked by its sign-off', OLD."number";
        END IF;
        RETURN NEW;
      END \$\$`);
    await queryRunner.query(`
      CREATE TRIGGER "trg_circuit_revisions_locked" BEFORE UPDATE ON "circuit_revisions"
      FOR EACH ROW EXECUTE FUNCTION "circuit_revisions_locked"()`);

    // One submission of one revision for sign-off; the flag counts are cached for the queue.
    await queryRunner.query(`
      CREATE TABLE "circuit_reviews" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "shop_id" uuid NOT NULL,
        "circuit_id" uuid NOT NULL,
        "revision_id" uuid NOT NULL,
        "revision_number" integer NOT NULL,
        "status" text NOT NULL DEFAULT 'in-review',
        "message" text NOT NULL DEFAULT '',
        "submitted_by" uuid,
        "submitted_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT clock_timestamp(),
        "blockers" integer NOT NULL,
        "cautions" integer NOT NULL,
        "decided_by" uuid,
        "decided_at" TIMESTAMP WITH TIME ZONE,
        "decision_note" text,
        CONSTRAINT "pk_circuit_reviews" PRIMARY KEY ("id"),
        CONSTRAINT "ck_circuit_reviews_status" CHECK ("status" IN ('in-review','approved','returned')),
        CONSTRAINT "ck_circuit_reviews_counts" CHECK ("blockers" >= 0 AND "cautions" >= 0),
        CONSTRAINT "ck_circuit_reviews_decided" CHECK (("status" = 'in-review') = ("decided_at" IS NULL)),
        CONSTRAINT "fk_circuit_reviews_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_circuit_reviews_circuit" FOREIGN KEY ("circuit_id") REFERENCES "circuits"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_circuit_reviews_revision" FOREIGN KEY ("revision_id") REFERENCES "circuit_revisions"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_circuit_reviews_submitted_by" FOREIGN KEY ("submitted_by") REFERENCES "users"("id") ON DELETE SET NULL,
        CONSTRAINT "fk_circuit_reviews_decided_by" FOREIGN KEY ("decided_by") REFERENCES "users"("id") ON DELETE SET NULL
      )`);
    await queryRunner.query(`CREATE INDEX "idx_circuit_reviews_shop_status" ON "circuit_reviews" ("shop_id", "status", "submitted_at")`);
    await queryRunner.query(`CREATE INDEX "idx_circuit_reviews_circuit" ON "circuit_reviews" ("circuit_id", "submitted_at")`);
    // At most one review under way per circuit.
    await queryRunner.query(
      `CREATE UNIQUE INDEX "uq_circuit_reviews_open" ON "circuit_reviews" ("circuit_id") WHERE "status" = 'in-review'`,
    );

    await queryRunner.query(`
      CREATE TABLE "review_acknowledgements" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "shop_id" uuid NOT NULL,
        "review_id" uuid NOT NULL,
        "flag_key" text NOT NULL,
        "note" text NOT NULL,
        "by_user_id" uuid,
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT clock_timestamp(),
        CONSTRAINT "pk_review_acknowledgements" PRIMARY KEY ("id"),
        CONSTRAINT "ck_review_acknowledgements_note" CHECK (length(btrim("note")) >= 3),
        CONSTRAINT "fk_review_acknowledgements_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_review_acknowledgements_review" FOREIGN KEY ("review_id") REFERENCES "circuit_reviews"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_review_acknowledgements_by" FOREIGN KEY ("by_user_id") REFERENCES "users"("id") ON DELETE SET NULL
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "uq_review_acknowledgements_key" ON "review_acknowledgements" ("review_id", "flag_key")`,
    );

    // Who did what to a circuit, written in the same transaction as the change; `seq` keeps the order.
    await queryRunner.query(`
      CREATE TABLE "audit_events" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "seq" bigint GENERATED ALWAYS AS IDENTITY,
        "shop_id" uuid NOT NULL,
        "circuit_id" uuid NOT NULL,
        "actor_id" uuid,
        "action" text NOT NULL,
        "revision_number" integer,
        "details" jsonb NOT NULL DEFAULT '{}',
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT clock_timestamp(),
        CONSTRAINT "pk_audit_events" PRIMARY KEY ("id"),
        CONSTRAINT "ck_audit_events_action" CHECK ("action" IN ('submit','acknowledge','approve','return','order','install')),
        CONSTRAINT "fk_audit_events_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_audit_events_circuit" FOREIGN KEY ("circuit_id") REFERENCES "circuits"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_audit_events_actor" FOREIGN KEY ("actor_id") REFERENCES "users"("id") ON DELETE SET NULL
      )`);
    await queryRunner.query(`CREATE INDEX "idx_audit_events_circuit_seq" ON "audit_events" ("circuit_id", "seq")`);

    // Messages to users about reviews; the mail side delivers them and sets `sent_at`.
    await queryRunner.query(`
      CREATE TABLE "notifications" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "shop_id" uuid NOT NULL,
        "recipient_id" uuid NOT NULL,
        "subject" text NOT NULL,
        "body" text NOT NULL,
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT clock_timestamp(),
        "sent_at" TIMESTAMP WITH TIME ZONE,
        CONSTRAINT "pk_notifications" PRIMARY KEY ("id"),
        CONSTRAINT "fk_notifications_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE,
        CONSTRAINT "fk_notifications_recipient" FOREIGN KEY ("recipient_id") REFERENCES "users"("id") ON DELETE CASCADE
      )`);
    await queryRunner.query(`CREATE INDEX "idx_notifications_unsent" ON "notifications" ("created_at") WHERE "sent_at" IS NULL`);
    await queryRunner.query(`CREATE INDEX "idx_notifications_recipient" ON "notifications" ("recipient_id", "created_at")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "notifications"`);
    await queryRunner.query(`DROP TABLE "audit_events"`);
    await queryRunner.query(`DROP TABLE "review_acknowledgements"`);
    await queryRunner.query(`DROP TABLE "circuit_reviews"`);
    await queryRunner.query(`DROP TRIGGER "trg_circuit_revisions_locked" ON "circuit_revisions"`);
    await queryRunner.query(`DROP FUNCTION "circuit_revisions_locked"()`);
    await queryRunner.query(`
      ALTER TABLE "circuit_revisions"
        DROP CONSTRAINT "fk_circuit_revisions_approved_by",
        DROP COLUMN "approved_at",
        DROP COLUMN "approved_by",
        DROP COLUMN "locked_at"`);
  }
}
