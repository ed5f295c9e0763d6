import request from 'supertest';
import type { App } from 'supertest/types.js';
import { DEMO_PASSWORD } from './test-app.js';

// Patient 1 (KB100231, born 1968-03-14) on Harbour; drug 1 morphine. Regimen after ASHP
// Standardize 4 Safety, PCA standards (2023): 1 mg/mL, demand 1 mg, lockout 10 min.
export const ORDER = {
  patientId: 1,
  drugId: 1,
  concentrationPerMl: 1,
  doseUnit: 'mg',
  demandDose: 1,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
  fourHourLimit: 30,
  clinicianBolusDose: 2,
  reviewDate: '2030-01-02',
  overrides: [],
  signature: { password: DEMO_PASSWORD },
};
export const SETTINGS = {
  drugId: 1,
  concentrationPerMl: 1,
  syringeVolumeMl: 50,
  loadingDose: null,
  demandDose: 1,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
  oneHourLimit: null,
  fourHourLimit: 30,
};
export const IDENTITY = { patientMrn: 'KB100231', patientDateOfBirth: '1968-03-14' };
export const RELEASE = {
  concentrationPerMl: 1,
  volumeMl: 50,
  batch: 'KB-77',
  expiresAt: '2030-01-01T12:00:00Z',
  preparedBy: 'Lin Park',
  checkedBy: 'Tomas Ortiz',
};
export const ROSA = { username: 'rosa.adeyemi', password: DEMO_PASSWORD };

export type PcaTokens = { prescriber: string; pharmacist: string; nurse: string };
const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

/** Signed by the prescriber, verified by the pharmacist, with a ready 50 mL syringe. */
export async function verifiedOrderWithSyringe(http: App, tokens: PcaTokens, order: object = ORDER): Promise<{ id: number; code: string }> {
  const { body: created } = await request(http).post('/api/orders').set(bearer(tokens.prescriber)).send(order).expect(201);
  await request(http)
    .post(`/api/orders/${created.id}/verify`)
    .set(bearer(tokens.pharmacist))
    .send({ signature: { password: DEMO_PASSWORD } })
    .expect(200);
  const { body: release } = await request(http)
    .post(`/api/orders/${created.id}/releases`)
    .set(bearer(tokens.pharmacist))
    .send(RELEASE)
    .expect(201);
  return { id: created.id, code: release.releaseCode };
}

/** As above, then started by a matching two-nurse bedside check (kai.mendes, then rosa.adeyemi). */
export async function activeOrder(
  http: App,
  tokens: PcaTokens,
  order: object = ORDER,
  settings: object = SETTINGS,
): Promise<{ id: number; code: string }> {
  const started = await verifiedOrderWithSyringe(http, tokens, order);
  const first = await request(http)
    .post(`/api/orders/${started.id}/bedside-checks`)
    .set(bearer(tokens.nurse))
    .send({ ...IDENTITY, releaseCode: started.code, settings })
    .expect(201);
  await request(http)
    .post(`/api/orders/${started.id}/bedside-checks/${first.body.id}/second`)
    .set(bearer(tokens.nurse))
    .send({ ...ROSA, settings })
    .expect(200);
  return started;
}
