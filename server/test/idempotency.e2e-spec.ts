import request from 'supertest';
import { DataSource, type EntityTarget, type FindOptionsWhere, type ObjectLiteral } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BedsideCheck } from '../src/bedside/entities/bedside-check.entity.js';
import { ClinicianBolus } from '../src/bedside/entities/clinician-bolus.entity.js';
import { IdempotencyKey } from '../src/common/idempotency/idempotency-key.entity.js';
import { Observation } from '../src/observations/entities/observation.entity.js';
import { PcaOrder } from '../src/orders/entities/pca-order.entity.js';
import { SyringeRelease } from '../src/releases/entities/syringe-release.entity.js';
import { CALM_OBSERVATION, ORDER, RELEASE, ROSA, SETTINGS } from './support/pca.js';
import { activeOrder, type PcaTokens, verifiedOrderWithSyringe } from './support/pca-steps.js';
import { createTestApp, DEMO_PASSWORD, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

// The Idempotency-Key header (IETF HTTP API working group draft "The Idempotency-Key HTTP Header
// Field"): a repeat of a create with the same key from the same user answers the first answer and
// writes nothing, even while the first is still running.
describe('Idempotency-Key replay', () => {
  let t: TestApp;
  let tokens: PcaTokens;
  let rosa: string;
  const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
  let keys = 0;
  const newKey = () => `idempotency-spec-${++keys}-${crypto.randomUUID()}`;
  const count = <T extends ObjectLiteral>(entity: EntityTarget<T>, where: FindOptionsWhere<T>) =>
    t.app.get(DataSource).manager.countBy(entity, where);
  const observation = () => ({ ...CALM_OBSERVATION, at: new Date().toISOString() });

  /** The same request 20 times at once. */
  const twenty = (send: () => request.Test) => Promise.all(Array.from({ length: 20 }, send));
  /** One original answer and 19 replays of it: same status, same body. */
  const expectOneAnswer = (responses: request.Response[], status: number) => {
    expect(
      responses.map((response) => response.status),
      JSON.stringify(responses[0].body),
    ).toEqual(Array(20).fill(status));
    for (const response of responses) expect(response.body).toEqual(responses[0].body);
    expect(responses.filter((response) => response.headers['idempotent-replayed'] === 'true')).toHaveLength(19);
  };

  beforeAll(async () => {
    t = await createTestApp();
    tokens = {
      prescriber: await t.tokenFor(DEMO_USER_BY_ROLE.prescriber),
      pharmacist: await t.tokenFor(DEMO_USER_BY_ROLE.pharmacist),
      nurse: await t.tokenFor(DEMO_USER_BY_ROLE.nurse),
    };
    rosa = await t.tokenFor(ROSA.username);
  });
  afterAll(() => t?.close());

  it('20 identical order submissions at once → one order and 20 identical answers', async () => {
    const patient = await t.addPatient();
    const key = newKey();
    const responses = await twenty(() =>
      request(t.http)
        .post('/api/orders')
        .set(bearer(tokens.prescriber))
        .set('Idempotency-Key', key)
        .send({ ...ORDER, patientId: patient.id }),
    );
    expectOneAnswer(responses, 201);
    expect(await count(PcaOrder, { patientId: patient.id })).toBe(1);
    expect(await count(IdempotencyKey, { key })).toBe(1);
  });

  it('20 identical syringe releases at once → one syringe', async () => {
    const patient = await t.addPatient();
    const { body: order } = await request(t.http)
      .post('/api/orders')
      .set(bearer(tokens.prescriber))
      .send({ ...ORDER, patientId: patient.id })
      .expect(201);
    await request(t.http)
      .post(`/api/orders/${order.id}/verify`)
      .set(bearer(tokens.pharmacist))
      .send({ signature: { password: DEMO_PASSWORD } })
      .expect(200);
    const key = newKey();
    const responses = await twenty(() =>
      request(t.http).post(`/api/orders/${order.id}/releases`).set(bearer(tokens.pharmacist)).set('Idempotency-Key', key).send(RELEASE),
    );
    expectOneAnswer(responses, 201);
    expect(await count(SyringeRelease, { orderId: order.id })).toBe(1);
  });

  it('20 identical first bedside checks at once → one pending check', async () => {
    const started = await verifiedOrderWithSyringe(t.http, tokens, await t.addPatient());
    const key = newKey();
    const responses = await twenty(() =>
      request(t.http)
        .post(`/api/orders/${started.id}/bedside-checks`)
        .set(bearer(tokens.nurse))
        .set('Idempotency-Key', key)
        .send({ ...started.patient.identity, releaseCode: started.code, settings: SETTINGS }),
    );
    expectOneAnswer(responses, 201);
    expect(await count(BedsideCheck, { orderId: started.id })).toBe(1);
  });

  it('20 identical clinician boluses at once → one bolus', async () => {
    const started = await activeOrder(t.http, tokens, await t.addPatient());
    const key = newKey();
    const responses = await twenty(() =>
      request(t.http)
        .post(`/api/orders/${started.id}/boluses`)
        .set(bearer(tokens.nurse))
        .set('Idempotency-Key', key)
        .send({ amount: 1, reason: 'Breakthrough pain on coughing', witness: ROSA }),
    );
    expectOneAnswer(responses, 201);
    expect(await count(ClinicianBolus, { orderId: started.id })).toBe(1);
  });

  it('20 identical observations at once → one observation; without the header each request records as before', async () => {
    const started = await activeOrder(t.http, tokens, await t.addPatient());
    const key = newKey();
    const body = observation();
    const responses = await twenty(() =>
      request(t.http).post(`/api/orders/${started.id}/observations`).set(bearer(tokens.nurse)).set('Idempotency-Key', key).send(body),
    );
    expectOneAnswer(responses, 201);
    expect(await count(Observation, { orderId: started.id })).toBe(1);

    const plain = observation();
    for (let i = 0; i < 2; i++) {
      const answer = await request(t.http).post(`/api/orders/${started.id}/observations`).set(bearer(tokens.nurse)).send(plain).expect(201);
      expect(answer.headers['idempotent-replayed']).toBeUndefined();
    }
    expect(await count(Observation, { orderId: started.id })).toBe(3);
  });

  it('frees the key of a refused request: the corrected form sent with the same key is recorded, once', async () => {
    const patient = await t.addPatient();
    const key = newKey();
    const sign = (body: object) =>
      request(t.http).post('/api/orders').set(bearer(tokens.prescriber)).set('Idempotency-Key', key).send(body);
    const refused = await sign({ ...ORDER, patientId: patient.id, demandDose: -1 }).expect(400);
    expect(refused.body.errors.map((error: { field: string }) => error.field)).toContain('demandDose');
    expect(await count(IdempotencyKey, { key })).toBe(0);

    const corrected = await sign({ ...ORDER, patientId: patient.id }).expect(201);
    expect(corrected.headers['idempotent-replayed']).toBeUndefined();
    const again = await sign({ ...ORDER, patientId: patient.id }).expect(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body).toEqual(corrected.body);
    expect(await count(PcaOrder, { patientId: patient.id })).toBe(1);
  });

  it('keeps each user’s keys apart: two nurses sending the same key each record their own observation', async () => {
    const started = await activeOrder(t.http, tokens, await t.addPatient());
    const key = newKey();
    const body = observation();
    const [kai, rosas] = await Promise.all(
      [tokens.nurse, rosa].map((token) =>
        request(t.http).post(`/api/orders/${started.id}/observations`).set(bearer(token)).set('Idempotency-Key', key).send(body),
      ),
    );
    expect([kai.status, rosas.status]).toEqual([201, 201]);
    expect(kai.body.id).not.toBe(rosas.body.id);
    expect(await count(Observation, { orderId: started.id })).toBe(2);
  });

  it('refuses a key sent again with a different body or route (422 naming Idempotency-Key), and writes nothing', async () => {
    const started = await activeOrder(t.http, tokens, await t.addPatient());
    const key = newKey();
    const observe = (body: object, path = 'observations') =>
      request(t.http).post(`/api/orders/${started.id}/${path}`).set(bearer(tokens.nurse)).set('Idempotency-Key', key).send(body);
    const body = observation();
    await observe(body).expect(201);
    const otherBody = await observe({ ...body, painScore: 7 }).expect(422);
    expect(otherBody.body).toMatchObject({
      statusCode: 422,
      message: expect.stringContaining('different request'),
      errors: [{ field: 'Idempotency-Key', message: 'This key was used for a different request' }],
    });
    await observe({ amount: 1, reason: 'Breakthrough pain on coughing', witness: ROSA }, 'boluses').expect(422);
    expect(await count(Observation, { orderId: started.id })).toBe(1);
    expect(await count(ClinicianBolus, { orderId: started.id })).toBe(0);
  });

  it('refuses a key that is empty or longer than 200 characters (400 naming Idempotency-Key)', async () => {
    const started = await activeOrder(t.http, tokens, await t.addPatient());
    for (const key of ['', 'k'.repeat(201)]) {
      const refused = await request(t.http)
        .post(`/api/orders/${started.id}/observations`)
        .set(bearer(tokens.nurse))
        .set('Idempotency-Key', key)
        .send(observation())
        .expect(400);
      expect(refused.body.errors).toEqual([{ field: 'Idempotency-Key', message: expect.stringContaining('1 to 200') }]);
    }
    expect(await count(Observation, { orderId: started.id })).toBe(0);
  });

  it('keeps a key 24 hours: an older one is deleted when a key is claimed, and its reuse runs', async () => {
    const started = await activeOrder(t.http, tokens, await t.addPatient());
    const key = newKey();
    const nurse = await request(t.http).get('/api/auth/me').set(bearer(tokens.nurse)).expect(200);
    await t.app.get(DataSource).manager.insert(IdempotencyKey, {
      userId: nurse.body.id,
      key,
      method: 'POST',
      path: '/api/orders/1/boluses',
      bodyHash: '0'.repeat(64),
      state: 'done',
      responseStatus: 201,
      responseBody: '{}',
      createdAt: new Date(Date.now() - 25 * 60 * 60 * 1000),
    });
    const fresh = await request(t.http)
      .post(`/api/orders/${started.id}/observations`)
      .set(bearer(tokens.nurse))
      .set('Idempotency-Key', key)
      .send(observation())
      .expect(201);
    expect(fresh.headers['idempotent-replayed']).toBeUndefined();
    const rows = await t.app.get(DataSource).manager.findBy(IdempotencyKey, { key });
    expect(rows).toEqual([expect.objectContaining({ path: `/api/orders/${started.id}/observations`, state: 'done', responseStatus: 201 })]);
  });

  it('documents the header and the 422 on every signed-in POST in the OpenAPI document, not on sign-in', async () => {
    const { body: document } = await request(t.http).get('/api/docs-json').expect(200);
    type Operation = { parameters?: { name: string; in: string; description?: string }[]; responses: Record<string, unknown> };
    const post = (path: string) => document.paths[path].post as Operation;
    for (const path of [
      '/api/orders',
      '/api/orders/{orderId}/releases',
      '/api/orders/{orderId}/boluses',
      '/api/orders/{orderId}/naloxone',
    ]) {
      const header = post(path).parameters?.find((parameter) => parameter.name === 'Idempotency-Key');
      expect(header, path).toMatchObject({ in: 'header', description: expect.stringContaining('Idempotent-Replayed: true') });
      expect(post(path).responses, path).toHaveProperty('422');
    }
    expect(
      post('/api/orders/{orderId}/naloxone').parameters?.find((parameter) => parameter.name === 'Idempotency-Key')?.description,
    ).toContain('Without a key, or with a new one: a repeat records a second dose');
    expect(post('/api/auth/login').parameters ?? []).not.toContainEqual(expect.objectContaining({ name: 'Idempotency-Key' }));
  });
});
