import request from 'supertest';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../src/audit/entities/audit-event.entity.js';
import { BedsideCheck } from '../src/bedside/entities/bedside-check.entity.js';
import { SyringeRelease } from '../src/releases/entities/syringe-release.entity.js';
import { RELEASE, SETTINGS } from './support/pca.js';
import { activeOrder, type PcaTokens, verifiedOrderWithSyringe } from './support/pca-steps.js';
import { createTestApp, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

// Syringes accounted for: one ready or running syringe per order unless the pharmacist gives a
// reason (shared secondReleaseRefusal), and one pending bedside check per syringe (pendingCheckRefusal).
describe('syringe release and first-check guards', () => {
  let t: TestApp;
  let tokens: PcaTokens;
  const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
  const releasesOf = (orderId: number) => t.app.get(DataSource).manager.countBy(SyringeRelease, { orderId });

  beforeAll(async () => {
    t = await createTestApp();
    tokens = {
      prescriber: await t.tokenFor(DEMO_USER_BY_ROLE.prescriber),
      pharmacist: await t.tokenFor(DEMO_USER_BY_ROLE.pharmacist),
      nurse: await t.tokenFor(DEMO_USER_BY_ROLE.nurse),
    };
  });
  afterAll(() => t?.close());

  it('refuses a second syringe while one is ready, naming it, and writes nothing', async () => {
    const order = await verifiedOrderWithSyringe(t.http, tokens, await t.addPatient());
    const response = await request(t.http)
      .post(`/api/orders/${order.id}/releases`)
      .set(bearer(tokens.pharmacist))
      .send(RELEASE)
      .expect(409);
    expect(response.body.message).toBe(`This order already has syringe ${order.code} (ready): give a reason to release a second`);
    expect(response.body.openReleaseCodes).toEqual([order.code]);
    expect(await releasesOf(order.id)).toBe(1);
  });

  it('refuses a second syringe while one is running; a short reason is a 400 naming the field', async () => {
    const order = await activeOrder(t.http, tokens, await t.addPatient());
    const refused = await request(t.http).post(`/api/orders/${order.id}/releases`).set(bearer(tokens.pharmacist)).send(RELEASE).expect(409);
    expect(refused.body.message).toContain(`${order.code} (in use)`);
    const short = await request(t.http)
      .post(`/api/orders/${order.id}/releases`)
      .set(bearer(tokens.pharmacist))
      .send({ ...RELEASE, secondSyringeReason: 'spare' })
      .expect(400);
    expect(JSON.stringify(short.body)).toContain('secondSyringeReason');
    expect(await releasesOf(order.id)).toBe(1);
  });

  it('releases a second syringe with a reason and audits the reason with the release', async () => {
    const order = await activeOrder(t.http, tokens, await t.addPatient());
    const reason = 'Running syringe nearly empty, replacement for the night';
    const { body } = await request(t.http)
      .post(`/api/orders/${order.id}/releases`)
      .set(bearer(tokens.pharmacist))
      .send({ ...RELEASE, secondSyringeReason: reason })
      .expect(201);
    expect(await releasesOf(order.id)).toBe(2);
    const events = await t.app.get(DataSource).manager.findBy(AuditEvent, { action: 'order.release', entityId: String(order.id) });
    const summaries = events.map((event) => event.summary);
    expect(
      summaries.some((summary) => summary.includes(reason) && summary.includes(body.releaseCode) && summary.includes(order.code)),
    ).toBe(true);
  });

  it('20 releases at once without a key for an order with a ready syringe → none written', async () => {
    const order = await verifiedOrderWithSyringe(t.http, tokens, await t.addPatient());
    const responses = await Promise.all(
      Array.from({ length: 20 }, () =>
        request(t.http).post(`/api/orders/${order.id}/releases`).set(bearer(tokens.pharmacist)).send(RELEASE),
      ),
    );
    expect(responses.map((response) => response.status)).toEqual(Array(20).fill(409));
    expect(await releasesOf(order.id)).toBe(1);
  });

  it('refuses a first check of a syringe whose check is under way, naming it; 20 at once start one', async () => {
    const order = await verifiedOrderWithSyringe(t.http, tokens, await t.addPatient());
    const body = { ...order.patient.identity, releaseCode: order.code, settings: SETTINGS };
    const responses = await Promise.all(
      Array.from({ length: 20 }, () => request(t.http).post(`/api/orders/${order.id}/bedside-checks`).set(bearer(tokens.nurse)).send(body)),
    );
    const started = responses.filter((response) => response.status === 201);
    expect(started).toHaveLength(1);
    const refused = responses.filter((response) => response.status === 409);
    expect(refused).toHaveLength(19);
    expect(refused[0].body.message).toBe(
      `A check of this syringe is already under way (check ${started[0].body.id}, waiting for the second nurse): finish it before starting another`,
    );
    expect(await t.app.get(DataSource).manager.countBy(BedsideCheck, { orderId: order.id })).toBe(1);
  });
});
