import 'reflect-metadata';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DataSource } from 'typeorm';
import { afterAll, describe, expect, it } from 'vitest';
import { dataSourceOptions } from '../src/database/data-source-options.js';
import { MIGRATIONS } from '../src/database/migrations/index.js';
import { PatientRecord1764750000000 } from '../src/database/migrations/1764750000000-patient-record.js';

// The patient-record migration on a database written before it: each old allergy text becomes
// entries, "none known" phrasings become "no known allergies", an empty text stays "not recorded".
describe('migration: allergies from one text column to entries', () => {
  const directory = mkdtempSync(path.join(tmpdir(), 'lockstep-migration-'));
  afterAll(() => rmSync(directory, { recursive: true, force: true }));
  const file = path.join(directory, 'old.sqlite');
  const before = MIGRATIONS.slice(0, MIGRATIONS.indexOf(PatientRecord1764750000000));

  it('turns each old text into entries and removes the column', async () => {
    const old = new DataSource({ ...dataSourceOptions(file), migrations: before });
    await old.initialize();
    await old.query(`INSERT INTO "wards" ("code", "name", "specialty") VALUES ('OLD', 'Old ward', 'Test')`);
    await old.query(`INSERT INTO "drugs" ("genericName", "doseUnit") VALUES ('morphine', 'mg')`);
    const patient = (mrn: string, allergies: string) =>
      old.query(
        `INSERT INTO "patients" ("mrn", "givenName", "familyName", "dateOfBirth", "sex", "weightKg", "allergies", "wardId", "bed")
         VALUES (?, 'Test', 'Patient', '1970-01-01', 'unknown', 70, ?, 1, ?)`,
        [mrn, allergies, mrn],
      );
    await patient('M1', 'Morphine (itch, not anaphylaxis); Latex');
    await patient('M2', 'NKDA');
    await patient('M3', '');
    await old.destroy();

    const migrated = new DataSource(dataSourceOptions(file));
    await migrated.initialize();
    const entries = await migrated.query(
      `SELECT p."mrn", a."drugId", a."substance", a."reaction", a."severity", a."recordedById" FROM "patient_allergies" a JOIN "patients" p ON p."id" = a."patientId" ORDER BY a."id"`,
    );
    expect(entries).toEqual([
      { mrn: 'M1', drugId: 1, substance: 'Morphine', reaction: 'itch, not anaphylaxis', severity: 'allergy', recordedById: null },
      { mrn: 'M1', drugId: null, substance: 'Latex', reaction: 'not recorded', severity: 'allergy', recordedById: null },
    ]);
    const patients = await migrated.query(`SELECT "mrn", "noKnownAllergies" FROM "patients" ORDER BY "mrn"`);
    expect(patients).toEqual([
      { mrn: 'M1', noKnownAllergies: 0 },
      { mrn: 'M2', noKnownAllergies: 1 },
      { mrn: 'M3', noKnownAllergies: 0 },
    ]);
    const columns = (await migrated.query(`PRAGMA table_info("patients")`)).map((column: { name: string }) => column.name);
    expect(columns).not.toContain('allergies');
    expect(columns).toEqual(expect.arrayContaining(['weightMeasuredOn', 'toleranceOralMorphineMgPerDay', 'toleranceDays']));
    await migrated.destroy();
  });
});
