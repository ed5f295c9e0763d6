import 'reflect-metadata';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { DataSource } from 'typeorm';
import { afterAll, describe, expect, it } from 'vitest';
import { meetsOpioidTolerance } from '@lockstep/shared';
import { dataSourceOptions } from '../src/database/data-source-options.js';
import { Random } from '../src/database/scale/random.js';
import { writeHospital } from '../src/database/scale/scale-hospital.js';
import { ScaleWriter } from '../src/database/scale/scale-writer.js';

// A small benchmark hospital through the scale seed's writers, on the migrated schema: every
// foreign key holds, and patients have the record the app reads (allergy entries or "no known
// allergies", a weight's measured day, a tolerance basis where tolerant).
describe('scale seed', () => {
  const directory = mkdtempSync(path.join(tmpdir(), 'lockstep-scale-'));
  afterAll(() => rmSync(directory, { recursive: true, force: true }));

  it('writes a small hospital whose patients have the full record', async () => {
    const file = path.join(directory, 'scale.sqlite');
    const dataSource = new DataSource(dataSourceOptions(file));
    await dataSource.initialize();
    await dataSource.destroy();
    const db = new Database(file);
    db.pragma('foreign_keys = OFF');
    const writer = new ScaleWriter(db);
    const options = { wards: 2, beds: 12, active: 4, days: 1, out: file, seed: 7 };
    db.transaction(() => writeHospital(writer, new Random(options.seed), options, 'not-a-real-hash', Date.now()))();
    expect(db.pragma('foreign_key_check')).toEqual([]);

    const patients = db.prepare(`SELECT * FROM patients`).all() as Record<string, number | string | null>[];
    expect(patients.length).toBeGreaterThan(0);
    const withEntries = new Set(
      (db.prepare(`SELECT DISTINCT patientId FROM patient_allergies`).all() as { patientId: number }[]).map((r) => r.patientId),
    );
    for (const patient of patients) {
      expect(patient.weightMeasuredOn, String(patient.mrn)).toMatch(/^\d{4}-\d{2}-\d{2}$/);
      // Either entries or "no known allergies", never both and never neither.
      expect(withEntries.has(patient.id as number) !== (patient.noKnownAllergies === 1), String(patient.mrn)).toBe(true);
      const basis = {
        oralMorphineMgPerDay: patient.toleranceOralMorphineMgPerDay as number | null,
        days: patient.toleranceDays as number | null,
      };
      expect(meetsOpioidTolerance(basis), String(patient.mrn)).toBe(patient.opioidTolerant === 1);
    }
    db.close();
  });
});
