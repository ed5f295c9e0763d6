import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The replay store for the `Idempotency-Key` header (see common/idempotency/). */
export class IdempotencyKeys1764860000000 implements MigrationInterface {
  name = 'IdempotencyKeys1764860000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "idempotency_keys" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "userId" integer NOT NULL, "key" varchar(200) NOT NULL, "method" varchar(10) NOT NULL, "path" varchar(2000) NOT NULL, "bodyHash" varchar(64) NOT NULL, "state" varchar(12) NOT NULL, "responseStatus" integer, "responseBody" text, "createdAt" datetime NOT NULL)`,
    );
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_idempotency_keys_user_key" ON "idempotency_keys" ("userId", "key") `);
    await queryRunner.query(`CREATE INDEX "IDX_idempotency_keys_created" ON "idempotency_keys" ("createdAt") `);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_idempotency_keys_created"`);
    await queryRunner.query(`DROP INDEX "IDX_idempotency_keys_user_key"`);
    await queryRunner.query(`DROP TABLE "idempotency_keys"`);
  }
}
