import request from 'supertest';
import type { App } from 'supertest/types.js';
import { DEMO_PASSWORD } from './demo-accounts.js';
import { ORDER, RELEASE, ROSA, SETTINGS } from './pca.js';
import type { TestPatient } from './test-app.js';

export type PcaTokens = { prescriber: string; pharmacist: string; nurse: string };
/** A step's order: its id, the release code of its syringe and the patient it is for. */
export type StartedPca = { id: number; code: string; patient: TestPatient };
const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

/**
 * Signed by the prescriber for `patient` (the order's own patientId is replaced), verified by the
 * pharmacist, with a ready 50 mL syringe. A patient may have only one open PCA: give each order
 * its own patient (TestApp.addPatient) unless the earlier one has been finished.
 */
export async function verifiedOrderWithSyringe(
  http: App,
  tokens: PcaTokens,
  patient: TestPatient,
  order: object = ORDER,
): Promise<StartedPca> {
  const { body: created } = await request(http)
    .post('/api/orders')
    .set(bearer(tokens.prescriber))
    .send({ ...order, patientId: patient.id })
    .expect(201);
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
  return { id: created.id, code: release.releaseCode, patient };
}

/** As above, then started by a matching two-nurse bedside check (kai.mendes, then rosa.adeyemi) at `patient`'s wristband. */
export async function activeOrder(
  http: App,
  tokens: PcaTokens,
  patient: TestPatient,
  order: object = ORDER,
  settings: object = SETTINGS,
): Promise<StartedPca> {
  const started = await verifiedOrderWithSyringe(http, tokens, patient, order);
  const first = await request(http)
    .post(`/api/orders/${started.id}/bedside-checks`)
    .set(bearer(tokens.nurse))
    .send({ ...patient.identity, releaseCode: started.code, settings })
    .expect(201);
  await request(http)
    .post(`/api/orders/${started.id}/bedside-checks/${first.body.id}/second`)
    .set(bearer(tokens.nurse))
    .send({ ...ROSA, settings })
    .expect(200);
  return started;
}
