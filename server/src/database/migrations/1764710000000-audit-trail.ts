import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The append-only audit chain. Triggers refuse any UPDATE or DELETE, whatever code runs. */
export class AuditTrail1764710000000 implements MigrationInterface {
  name = 'AuditTrail1764710000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "audit_event" ("id" integer PRIMARY KEY NOT NULL, "at" varchar(30) NOT NULL, "userId" integer, "actorName" varchar(120), "action" varchar(60) NOT NULL, "entityType" varchar(30) NOT NULL, "entityId" varchar(64) NOT NULL, "summary" text NOT NULL, "prevHash" varchar(64) NOT NULL, "hash" varchar(64) NOT NULL)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_06d570d7d1b40fbc994b5955be" ON "audit_event" ("at")`);
    await queryRunner.query(`CREATE INDEX "IDX_33c3131edaf1292ed22c59cd88" ON "audit_event" ("userId")`);
    await queryRunner.query(`CREATE INDEX "IDX_98117695956bc9ebd1fcb6d635" ON "audit_event" ("entityType", "entityId")`);
    await queryRunner.query(
      `CREATE TRIGGER "audit_event_no_update" BEFORE UPDATE ON "audit_event" BEGIN SELECT RAISE(ABORT, 'audit events are append-only'); END`,
    );
    await queryRunner.query(
      `CREATE TRIGGER "audit_event_no_delete" BEFORE DELETE ON "audit_event" BEGIN SELECT RAISE(ABORT, 'audit events are append-only'); END`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "audit_event"`);
  }
}
