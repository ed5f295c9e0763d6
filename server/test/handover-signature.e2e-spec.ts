import { getDataSourceToken } from '@nestjs/typeorm';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedBoardWard } from './support/board-fixture.js';
import { DEMO_PASSWORD } from './support/demo-accounts.js';
import { runningSettings } from './support/handover-steps.js';
import { createTestApp, type TestApp } from './support/test-app.js';

const signature = { password: DEMO_PASSWORD };

describe('handover as a signature', () => {
  let t: TestApp;
  let dataSource: DataSource;
  const token = {} as Record<'kai' | 'rosa' | 'mei', string>;
  const as = (who: keyof typeof token) => ({ Authorization: `Bearer ${token[who]}` });

  beforeAll(async () => {
    t = await createTestApp();
    dataSource = t.app.get<DataSource>(getDataSourceToken());
    token.kai = await t.tokenFor('kai.mendes');
    token.rosa = await t.tokenFor('rosa.adeyemi');
    token.mei = await t.tokenFor('mei.tan');
  });
  afterAll(() => t.close());

  async function ward(code: string, urgentFlag = false) {
    const wardId = await seedBoardWard(dataSource, code, [{ bed: 'H1', startedMinutesAgo: 60, observedMinutesAgo: 10, urgentFlag }]);
    const board = await request(t.http).get(`/api/wards/${wardId}/handover`).set(as('mei')).expect(200);
    const orderId: number = board.body.rows[0].orderId;
    return { orderId, url: `/api/wards/${wardId}/handover/signoffs`, settings: await runningSettings(dataSource, orderId) };
  }

  it('refuses a sign-off without the password or with a wrong one, naming signature.password, and records nothing', async () => {
    const { orderId, url, settings } = await ward('HPW');
    const missing = await request(t.http).post(url).set(as('kai')).send({ orderId, role: 'outgoing' }).expect(400);
    expect(missing.body.errors.map((e: { field: string }) => e.field)).toContain('signature');
    const wrong = await request(t.http)
      .post(url)
      .set(as('kai'))
      .send({ orderId, role: 'outgoing', signature: { password: 'not-my-password' } })
      .expect(401);
    expect(wrong.body.errors).toEqual([{ field: 'signature.password', message: expect.any(String) }]);
    await request(t.http)
      .post(url)
      .set(as('rosa'))
      .send({ orderId, role: 'incoming', settings, signature: { password: 'not-my-password' } })
      .expect(401);
    const listed = await request(t.http).get(url).set(as('mei')).expect(200);
    expect(listed.body).toEqual([]);
  });

  it('refuses to confirm a PCA with an open urgent flag (409 naming it) until the flag is acknowledged', async () => {
    const { orderId, url, settings } = await ward('HUF', true);
    const refused = await request(t.http).post(url).set(as('kai')).send({ orderId, role: 'outgoing', signature }).expect(409);
    expect(refused.body.message).toContain('Sedation level 3');
    expect(refused.body.openUrgentFlags).toEqual([{ id: expect.any(Number), code: 'sedation.3', message: 'Sedation level 3' }]);
    await request(t.http).post(url).set(as('rosa')).send({ orderId, role: 'incoming', settings, signature }).expect(409);
    await request(t.http)
      .post(`/api/flags/${refused.body.openUrgentFlags[0].id}/acknowledge`)
      .set(as('kai'))
      .send({ note: 'Prescriber reviewed, dose reduced' })
      .expect(200);
    await request(t.http).post(url).set(as('kai')).send({ orderId, role: 'outgoing', signature }).expect(201);
  });

  it('refuses the incoming re-entry that differs from the running order, naming each setting, and confirms a match', async () => {
    const { orderId, url, settings } = await ward('HRE');
    const wrong = { ...settings, demandDose: settings.demandDose + 1, lockoutMinutes: settings.lockoutMinutes + 5 };
    const refused = await request(t.http)
      .post(url)
      .set(as('rosa'))
      .send({ orderId, role: 'incoming', settings: wrong, signature })
      .expect(409);
    expect(refused.body.errors.map((e: { field: string }) => e.field)).toEqual(['settings.demandDose', 'settings.lockoutMinutes']);
    expect(refused.body.errors[0].message).toMatch(/^Demand dose differs from the running order/);
    const audit = await request(t.http).get(`/api/orders/${orderId}/audit`).set(as('mei')).expect(200);
    expect(JSON.stringify(audit.body)).toContain('mismatch');
    expect((await request(t.http).get(url).set(as('mei')).expect(200)).body).toEqual([]);

    const confirmed = await request(t.http).post(url).set(as('rosa')).send({ orderId, role: 'incoming', settings, signature }).expect(201);
    expect(confirmed.body).toMatchObject({ role: 'incoming', pumpSettingsMatch: true, nurseName: 'Rosa Adeyemi' });
  });

  it('takes no pump settings from the outgoing nurse', async () => {
    const { orderId, url, settings } = await ward('HOS');
    const refused = await request(t.http).post(url).set(as('kai')).send({ orderId, role: 'outgoing', settings, signature }).expect(400);
    expect(refused.body.errors[0].field).toBe('settings');
  });
});
