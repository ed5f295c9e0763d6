import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The words the old free-text field used for "none known"; such a record becomes "no known allergies". */
const NONE_KNOWN = new Set(['none', 'nil', 'nka', 'nkda', 'none known', 'no known allergies', 'no known drug allergies']);

type MigratedAllergy = { substance: string; reaction: string };

/**
 * The entries in one old free-text allergy field: split on `,` or `;` outside parentheses, text in
 * parentheses kept as the reaction ("not recorded" when there is none). Null when the text says
 * "none known"; an empty list when it is empty. Frozen with this migration.
 */
export function allergyEntriesFromText(text: string): MigratedAllergy[] | null {
  const trimmed = text.trim();
  if (NONE_KNOWN.has(trimmed.toLowerCase().replace(/[.\s]+$/, ''))) return null;
  const parts: string[] = [];
  let depth = 0;
  let current = '';
  for (const character of trimmed) {
    if (character === '(') depth += 1;
    if (character === ')') depth = Math.max(0, depth - 1);
    if ((character === ',' || character === ';') && depth === 0) {
      parts.push(current);
      current = '';
    } else current += character;
  }
  parts.push(current);
  return parts
    .map((part) => part.trim())
    .filter((part) => part !== '')
    .map((part) => {
      const open = part.indexOf('(');
      const close = part.lastIndexOf(')');
      const substance = (open >= 0 ? part.slice(0, open) + (close > open ? part.slice(close + 1) : '') : part).trim() || part;
      const reaction = open >= 0 ? part.slice(open + 1, close > open ? close : undefined).trim() : '';
      return { substance: substance.slice(0, 120), reaction: (reaction || 'not recorded').slice(0, 200) };
    });
}

/**
 * The patient record: allergies become entries (`patient_allergies`: a formulary drug or free text,
 * reaction, severity, who recorded it and when) instead of one text column, with "no known
 * allergies" recorded apart from "nothing recorded"; opioid tolerance gets its basis (oral
 * morphine mg a day and for how many days); the weight gets the day it was measured. Each old
 * allergy text becomes entries of severity `allergy` (the old field did not say), tied to a
 * formulary drug when the substance is exactly its generic name, with no recorder.
 */
export class PatientRecord1764750000000 implements MigrationInterface {
  name = 'PatientRecord1764750000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "patient_allergies" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "patientId" integer NOT NULL, "drugId" integer, "substance" varchar(120) NOT NULL, "reaction" varchar(200) NOT NULL, "severity" varchar(12) NOT NULL, "recordedById" integer, "recordedAt" datetime, CONSTRAINT "FK_6f475d246eec23c35096beb4883" FOREIGN KEY ("patientId") REFERENCES "patients" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_a25f745011e4fd80e1e1acb755a" FOREIGN KEY ("drugId") REFERENCES "drugs" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_b64b7565c0d92cb769979ce798a" FOREIGN KEY ("recordedById") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_6f475d246eec23c35096beb488" ON "patient_allergies" ("patientId") `);

    const drugs: { id: number; genericName: string }[] = await queryRunner.query(`SELECT "id", "genericName" FROM "drugs"`);
    const drugIdOf = new Map(drugs.map((drug) => [drug.genericName.toLowerCase(), drug.id]));
    const patients: { id: number; allergies: string }[] = await queryRunner.query(`SELECT "id", "allergies" FROM "patients"`);
    const noneKnown: number[] = [];
    for (const patient of patients) {
      const entries = allergyEntriesFromText(patient.allergies);
      if (entries === null) {
        noneKnown.push(patient.id);
        continue;
      }
      for (const entry of entries) {
        await queryRunner.query(
          `INSERT INTO "patient_allergies" ("patientId", "drugId", "substance", "reaction", "severity", "recordedById", "recordedAt") VALUES (?, ?, ?, ?, 'allergy', NULL, NULL)`,
          [patient.id, drugIdOf.get(entry.substance.toLowerCase()) ?? null, entry.substance, entry.reaction],
        );
      }
    }

    await queryRunner.query(`DROP INDEX "IDX_e2c7db64914a7509774c3cae8a"`);
    await queryRunner.query(
      `CREATE TABLE "temporary_patients" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "mrn" varchar(32) NOT NULL, "givenName" varchar(80) NOT NULL, "familyName" varchar(80) NOT NULL, "dateOfBirth" varchar(10) NOT NULL, "sex" varchar(10) NOT NULL, "weightKg" real, "opioidTolerant" boolean NOT NULL DEFAULT (0), "sleepApnoea" boolean NOT NULL DEFAULT (0), "otherSedatives" boolean NOT NULL DEFAULT (0), "wardId" integer NOT NULL, "bed" varchar(16) NOT NULL, "weightMeasuredOn" varchar(10), "noKnownAllergies" boolean NOT NULL DEFAULT (0), "toleranceOralMorphineMgPerDay" real, "toleranceDays" integer, CONSTRAINT "UQ_2fe90c44da84b034e30bdadb9d0" UNIQUE ("mrn"), CONSTRAINT "FK_e2c7db64914a7509774c3cae8a1" FOREIGN KEY ("wardId") REFERENCES "wards" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_patients"("id", "mrn", "givenName", "familyName", "dateOfBirth", "sex", "weightKg", "opioidTolerant", "sleepApnoea", "otherSedatives", "wardId", "bed") SELECT "id", "mrn", "givenName", "familyName", "dateOfBirth", "sex", "weightKg", "opioidTolerant", "sleepApnoea", "otherSedatives", "wardId", "bed" FROM "patients"`,
    );
    await queryRunner.query(`DROP TABLE "patients"`);
    await queryRunner.query(`ALTER TABLE "temporary_patients" RENAME TO "patients"`);
    await queryRunner.query(`CREATE INDEX "IDX_e2c7db64914a7509774c3cae8a" ON "patients" ("wardId") `);
    for (const id of noneKnown) await queryRunner.query(`UPDATE "patients" SET "noKnownAllergies" = 1 WHERE "id" = ?`, [id]);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_e2c7db64914a7509774c3cae8a"`);
    await queryRunner.query(`ALTER TABLE "patients" RENAME TO "temporary_patients"`);
    await queryRunner.query(
      `CREATE TABLE "patients" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "mrn" varchar(32) NOT NULL, "givenName" varchar(80) NOT NULL, "familyName" varchar(80) NOT NULL, "dateOfBirth" varchar(10) NOT NULL, "sex" varchar(10) NOT NULL, "weightKg" real, "allergies" text NOT NULL DEFAULT (''), "opioidTolerant" boolean NOT NULL DEFAULT (0), "sleepApnoea" boolean NOT NULL DEFAULT (0), "otherSedatives" boolean NOT NULL DEFAULT (0), "wardId" integer NOT NULL, "bed" varchar(16) NOT NULL, CONSTRAINT "UQ_2fe90c44da84b034e30bdadb9d0" UNIQUE ("mrn"), CONSTRAINT "FK_e2c7db64914a7509774c3cae8a1" FOREIGN KEY ("wardId") REFERENCES "wards" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    // Entries back to one line of text ("Morphine (itch); Latex (not recorded)"), or the old words for none known.
    await queryRunner.query(
      `INSERT INTO "patients"("id", "mrn", "givenName", "familyName", "dateOfBirth", "sex", "weightKg", "allergies", "opioidTolerant", "sleepApnoea", "otherSedatives", "wardId", "bed")
       SELECT p."id", p."mrn", p."givenName", p."familyName", p."dateOfBirth", p."sex", p."weightKg",
              COALESCE((SELECT group_concat(a."substance" || ' (' || a."reaction" || ')', '; ') FROM "patient_allergies" a WHERE a."patientId" = p."id"),
                       CASE WHEN p."noKnownAllergies" = 1 THEN 'No known drug allergies' ELSE '' END),
              p."opioidTolerant", p."sleepApnoea", p."otherSedatives", p."wardId", p."bed"
       FROM "temporary_patients" p`,
    );
    await queryRunner.query(`DROP TABLE "temporary_patients"`);
    await queryRunner.query(`CREATE INDEX "IDX_e2c7db64914a7509774c3cae8a" ON "patients" ("wardId") `);
    await queryRunner.query(`DROP INDEX "IDX_6f475d246eec23c35096beb488"`);
    await queryRunner.query(`DROP TABLE "patient_allergies"`);
  }
}
