import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Sessions ended by signing out before their token expired (see auth/token-revocation.service.ts). */
export class RevokedTokens1764739000000 implements MigrationInterface {
  name = 'RevokedTokens1764739000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "revoked_tokens" ("jti" varchar(36) PRIMARY KEY NOT NULL, "userId" integer NOT NULL, "expiresAt" datetime NOT NULL)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_revoked_tokens_expires" ON "revoked_tokens" ("expiresAt")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_revoked_tokens_expires"`);
    await queryRunner.query(`DROP TABLE "revoked_tokens"`);
  }
}
