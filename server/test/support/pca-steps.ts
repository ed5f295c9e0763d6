import request from 'supertest';
import type { App } from 'supertest/types.js';
import { DEMO_PASSWORD } from './demo-accounts.js';
import { IDENTITY, ORDER, RELEASE, ROSA, SETTINGS } from './pca.js';

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
