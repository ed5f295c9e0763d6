import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Proposed changes to a ward's clinical settings: an admin proposes (signed), a charge nurse or a pharmacist
 * signs off or declines (signed); the settings apply only at the sign-off.
 */
export class WardPolicyChanges1764820000000 implements MigrationInterface {
  name = 'WardPolicyChanges1764820000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "ward_policy_changes" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "wardId" integer NOT NULL, "status" varchar(16) NOT NULL, "settings" text NOT NULL, "reason" text NOT NULL, "proposedById" integer NOT NULL, "proposedAt" datetime NOT NULL, "idempotencyKey" varchar(200), "decidedById" integer, "decidedAt" datetime, "declineReason" text, CONSTRAINT "FK_819528307ba38c0c9a48fce2c07" FOREIGN KEY ("wardId") REFERENCES "wards" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_6817936a5bf47191086231b7cb9" FOREIGN KEY ("proposedById") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_37faa4c59e0ed461a1813096140" FOREIGN KEY ("decidedById") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_819528307ba38c0c9a48fce2c0" ON "ward_policy_changes" ("wardId") `);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_819528307ba38c0c9a48fce2c0"`);
    await queryRunner.query(`DROP TABLE "ward_policy_changes"`);
  }
}
