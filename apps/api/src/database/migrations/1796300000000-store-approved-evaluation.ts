import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The lock of a signed-off revision, without or with its stored evaluation among the locked columns. */
function lockFunction(lockedColumns: string[]): string {
  const columns = lockedColumns.map((column) => `"${column}"`);
  const tuple = (row: 'NEW' | 'OLD') => `(${columns.map((column) => `${row}.${column}`).join(', ')})`;
  return `
    CREATE OR REPLACE FUNCTION "circuit_revisions_locked"() RETURNS trigger LANGUAGE plpgsql AS \$\$
    BEGIN
      IF OLD."locked_at" IS NOT NULL AND (
           ${tuple('NEW')} IS DISTINCT FROM ${tuple('OLD')}
           OR (NEW."author_id" IS DISTINCT FROM OLD."author_id" AND NEW."author_id" IS NOT NULL)
           OR (NEW."approved_by" IS DISTINCT FROM OLD."approved_by" AND NEW."approved_by" IS NOT NULL)) THEN
        RAISE EXCEPTION 'circuit revision % is locked by its sign-off', OLD."number";
      END IF;
      RETURN NEW;
    END \$\$`;
}

/**
 * The rules check a reviewer signed off is stored on the revision, so its cut list and bill of
 * materials never change with later shop rules or catalogue edits. It is written in the same
 * UPDATE that sets `locked_at` (the trigger sees the old row still unlocked), and locked from then on.
 */
export class StoreApprovedEvaluation1796300000000 implements MigrationInterface {
  name = 'StoreApprovedEvaluation1796300000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "circuit_revisions" ADD "evaluation" jsonb`);
    await queryRunner.query(lockFunction(['message', 'locked_at', 'approved_at', 'evaluation']));
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(lockFunction(['message', 'locked_at', 'approved_at']));
    await queryRunner.query(`ALTER TABLE "circuit_revisions" DROP COLUMN "evaluation"`);
  }
}
