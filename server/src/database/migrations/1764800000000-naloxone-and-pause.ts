import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Pauses of a running PCA (by a nurse, or by naloxone given), each open until a two-nurse resume. */
export class NaloxoneAndPause1764800000000 implements MigrationInterface {
  name = 'NaloxoneAndPause1764800000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "pca_pauses" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "orderId" integer NOT NULL, "cause" varchar(16) NOT NULL, "reason" text NOT NULL, "pausedById" integer NOT NULL, "pausedAt" datetime NOT NULL, "naloxoneDose" real, "naloxoneUnit" varchar(8), "naloxoneGivenAt" datetime, "resumedAt" datetime, "resumedById" integer, "resumeWitnessId" integer, "resumeReason" text, "rowVersion" integer NOT NULL DEFAULT (0), CONSTRAINT "FK_6535f4fd2aaa7defeeed665097c" FOREIGN KEY ("orderId") REFERENCES "pca_orders" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_c2c7c2a42e54c532a96e0f6fe88" FOREIGN KEY ("pausedById") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_9a07edb60764dc7a7d4c9ff7943" FOREIGN KEY ("resumedById") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_461eacc73785397c84c9403067e" FOREIGN KEY ("resumeWitnessId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_6535f4fd2aaa7defeeed665097" ON "pca_pauses" ("orderId") `);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_6535f4fd2aaa7defeeed665097"`);
    await queryRunner.query(`DROP TABLE "pca_pauses"`);
  }
}
