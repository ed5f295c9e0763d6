import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Who created, imported, edited, submitted or sent back each dose-limit library version, and when
 * (library/entities/library-version-event.entity.ts): none of the first four may approve it.
 * Existing versions get their contributions from the audit trail, which recorded each of them,
 * and their author as creator where the trail has nothing (a database seeded before the trail).
 */
export class LibraryIntegrity1764760000000 implements MigrationInterface {
  name = 'LibraryIntegrity1764760000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "library_version_events" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "versionId" integer NOT NULL, "userId" integer NOT NULL, "kind" varchar(20) NOT NULL, "comment" text, "at" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_f8b12bffcb225eaa1edc7eadeed" FOREIGN KEY ("versionId") REFERENCES "library_versions" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_22dd84fa1d444636bab4c77e46e" FOREIGN KEY ("userId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_f8b12bffcb225eaa1edc7eadee" ON "library_version_events" ("versionId") `);
    await queryRunner.query(
      `INSERT INTO "library_version_events" ("versionId", "userId", "kind", "comment", "at")
       SELECT CAST(a."entityId" AS integer), a."userId",
              CASE a."action" WHEN 'library-version.create' THEN 'created' WHEN 'library-version.import' THEN 'imported'
                              WHEN 'library-version.rules-replace' THEN 'edited' ELSE 'submitted' END,
              NULL, replace(replace(a."at", 'T', ' '), 'Z', '')
       FROM "audit_event" a
       JOIN "library_versions" v ON v."id" = CAST(a."entityId" AS integer)
       WHERE a."entityType" = 'library-version' AND a."userId" IS NOT NULL
         AND a."action" IN ('library-version.create', 'library-version.import', 'library-version.rules-replace', 'library-version.submit')
       ORDER BY a."id"`,
    );
    await queryRunner.query(
      `INSERT INTO "library_version_events" ("versionId", "userId", "kind", "comment", "at")
       SELECT v."id", v."authorId", 'created', NULL, v."createdAt" FROM "library_versions" v
       WHERE NOT EXISTS (SELECT 1 FROM "library_version_events" e WHERE e."versionId" = v."id" AND e."kind" IN ('created', 'imported'))`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_f8b12bffcb225eaa1edc7eadee"`);
    await queryRunner.query(`DROP TABLE "library_version_events"`);
  }
}
