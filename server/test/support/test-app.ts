import 'reflect-metadata';
import { rmSync } from 'node:fs';
import type { INestApplication } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import request from 'supertest';
import type { App } from 'supertest/types.js';
import { DataSource, Like } from 'typeorm';
import type { WristbandEntry } from '@lockstep/shared';
import { AppModule } from '../../src/app.module.js';
import { configureApp } from '../../src/app.setup.js';
import { Patient } from '../../src/patients/entities/patient.entity.js';
import { DEMO_PASSWORD } from './demo-accounts.js';
import { IDENTITY, REGIMEN } from './pca.js';

export { DEMO_PASSWORD, DEMO_USER_BY_ROLE } from './demo-accounts.js';

/** A patient a test orders for: the id, the bed (on Harbour) and what the nurse reads off the wristband at the bedside. */
export type TestPatient = { id: number; bed: string; identity: WristbandEntry };

/** The shared fixture's patient 1 (NOAH ACHTERBERG), for tests about him or the demo: the demo gives him an order awaiting verification. */
export const PATIENT_1: TestPatient = { id: REGIMEN.patientId, bed: 'H02', identity: IDENTITY };

export interface TestApp {
  app: INestApplication;
  http: App;
  databasePath: string;
  /** Signs in and returns the bearer token. */
  tokenFor(username: string, password?: string): Promise<string>;
  /**
   * A new invented patient with no PCA, for a test that signs its own: a patient may have only one
   * open PCA, and the demo gives patient 1 one awaiting verification. A copy of patient 1's record
   * (ward, date of birth, weight, risk factors, every column the table has) under a new MRN, name
   * and bed, written through the app's own DataSource, so the order check finds the same as for
   * him. Allergy entries (their own table) are not copied.
   */
  addPatient(): Promise<TestPatient>;
  close(): Promise<void>;
}

/**
 * The real application on this test file's temporary SQLite file (see setup-env.ts), migrated and
 * seeded with the demo data, exactly as `npm start` builds it (same module, pipes and filters).
 * One app per test file.
 */
export async function createTestApp(): Promise<TestApp> {
  const directory = process.env.LOCKSTEP_TEST_DIRECTORY!;
  const databasePath = process.env.DATABASE_PATH!;

  const app = configureApp(await NestFactory.create(AppModule, { logger: false }));
  await app.init();
  const http = app.getHttpServer() as App;

  return {
    app,
    http,
    databasePath,
    async tokenFor(username, password = DEMO_PASSWORD) {
      const response = await request(http).post('/api/auth/login').send({ username, password });
      if (response.status !== 200) throw new Error(`Sign-in as ${username} failed: ${response.status}`);
      return response.body.accessToken as string;
    },
    async addPatient() {
      return app.get(DataSource).transaction(async (manager) => {
        // Numbered from the database, so a second app on the same file does not repeat an MRN.
        const number = (await manager.countBy(Patient, { mrn: Like('KT%') })) + 1;
        const { id: _id, allergies: _allergies, ...twin } = await manager.findOneByOrFail(Patient, { id: PATIENT_1.id });
        const patient = await manager.save(
          manager.create(Patient, {
            ...twin,
            mrn: `KT${String(number).padStart(6, '0')}`,
            givenName: 'Test',
            familyName: `Patient ${number}`,
            bed: `T${number}`,
          }),
        );
        return { id: patient.id, bed: patient.bed, identity: { patientMrn: patient.mrn, patientDateOfBirth: patient.dateOfBirth } };
      });
    },
    async close() {
      await app.close();
      rmSync(directory, { recursive: true, force: true });
    },
  };
}
