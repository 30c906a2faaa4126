import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateShopRules1796185848071 implements MigrationInterface {
  name = 'CreateShopRules1796185848071';

  async up(queryRunner: QueryRunner): Promise<void> {
    // One row per shop, created on the admin's first save; until then the defaults apply.
    await queryRunner.query(`
      CREATE TABLE "shop_rules" (
        "shop_id" uuid NOT NULL,
        "rules" jsonb NOT NULL,
        "version" integer NOT NULL,
        "updated_by" uuid,
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        CONSTRAINT "pk_shop_rules" PRIMARY KEY ("shop_id"),
        CONSTRAINT "fk_shop_rules_shop" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION,
        CONSTRAINT "fk_shop_rules_updated_by" FOREIGN KEY ("updated_by") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION
      )`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "shop_rules"`);
  }
}
