import './support/lift-password-rate-limit.js';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  NCI_PDQ_EQUIANALGESIC_SOURCE,
  type AuditPage,
  type EquianalgesicFactor,
  type OrderListEntry,
  type UsageResponse,
} from '@lockstep/shared';
import { EquianalgesicFactors1764780000000 } from '../src/database/migrations/1764780000000-equianalgesic-factors.js';
import { createTestApp, DEMO_PASSWORD, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

// Demo formulary: drug 1 morphine, 2 hydromorphone, 3 fentanyl (server/src/database/seed).
const MORPHINE = 1;
const HYDROMORPHONE = 2;
const FENTANYL = 3;
const AFP_2000 = 'American Family Physician 2000;61(3):755, equianalgesic table';

type Role = keyof typeof DEMO_USER_BY_ROLE;

describe('pharmacy’s equianalgesic table', () => {
  let t: TestApp;
  const tokens = {} as Record<Role, string>;
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  const put = (drugId: number | string, route: string, body: object, role: Role = 'pharmacist') =>
    request(t.http)
      .put(`/api/equianalgesic-factors/${drugId}/${route}`)
      .set(as(role))
      .set('Idempotency-Key', crypto.randomUUID())
      .send(body);
  const table = async (role: Role = 'nurse') =>
    (await request(t.http).get('/api/equianalgesic-factors').set(as(role)).expect(200)).body as EquianalgesicFactor[];
  const latestEvent = async () =>
    ((await request(t.http).get('/api/audit?limit=1').set(as('admin')).expect(200)).body as AuditPage).events[0];
  const signed = { signature: { password: DEMO_PASSWORD } };

  beforeAll(async () => {
    t = await createTestApp();
    for (const role of Object.keys(DEMO_USER_BY_ROLE) as Role[]) tokens[role] = await t.tokenFor(DEMO_USER_BY_ROLE[role]);
  });
  afterAll(() => t.close());

  it('ships the NCI PDQ factors, which every role may read (NCI PDQ Cancer Pain, equianalgesic table, 2008 and 2014)', async () => {
    for (const role of Object.keys(DEMO_USER_BY_ROLE) as Role[]) {
      const rows = await table(role);
      expect(rows.map(({ drugId, route, amount, unit }) => [drugId, route, amount, unit])).toEqual([
        [FENTANYL, 'parenteral', 100, 'mcg'],
        [HYDROMORPHONE, 'parenteral', 2, 'mg'],
        [MORPHINE, 'parenteral', 10, 'mg'],
        [MORPHINE, 'oral', 30, 'mg'],
      ]);
      expect(rows.find((row) => row.drugId === HYDROMORPHONE)).toMatchObject({ source: NCI_PDQ_EQUIANALGESIC_SOURCE, changedByName: null });
    }
    await request(t.http).get('/api/equianalgesic-factors').expect(401);
  });

  it('lets only a pharmacist change a factor', async () => {
    const body = { amount: 1.5, unit: 'mg', source: AFP_2000, ...signed };
    for (const role of ['nurse', 'charge_nurse', 'prescriber', 'admin'] as Role[])
      await put(HYDROMORPHONE, 'parenteral', body, role).expect(403);
    await request(t.http).put(`/api/equianalgesic-factors/${HYDROMORPHONE}/parenteral`).send(body).expect(401);
    expect((await table()).find((row) => row.drugId === HYDROMORPHONE)?.amount).toBe(2);
  });

  it('refuses a wrong password, naming the signature, and changes nothing', async () => {
    const before = await latestEvent();
    const response = await put(HYDROMORPHONE, 'parenteral', {
      amount: 1.5,
      unit: 'mg',
      source: AFP_2000,
      signature: { password: 'not-it' },
    }).expect(401);
    expect(response.body.errors).toEqual([{ field: 'signature.password', message: 'The password you signed with is not correct' }]);
    expect((await table()).find((row) => row.drugId === HYDROMORPHONE)?.amount).toBe(2);
    expect((await latestEvent()).id).toBe(before.id);
  });

  it.each([
    [{ amount: 0 }, 'amount', 'Amount must be more than 0'],
    [{ amount: -2 }, 'amount', 'Amount must be more than 0'],
    [{ amount: '1.5' }, 'amount', 'Amount must be a number'],
    [{ amount: 0.5, unit: 'mcg' }, 'amount', 'At least 1 mcg: check the amount'],
    [{ amount: 5000 }, 'amount', 'At most 1,000 mg: check the amount'],
    [{ unit: 'g' }, 'unit', 'Unit must be mg or mcg'],
    [{ source: '   ' }, 'source', 'Name the source of this factor'],
    [{ source: undefined }, 'source', 'Name the source of this factor'],
  ])('answers %o with a 400 naming %s', async (change, field, message) => {
    const response = await put(HYDROMORPHONE, 'parenteral', { amount: 1.5, unit: 'mg', source: AFP_2000, ...signed, ...change }).expect(
      400,
    );
    expect(response.body.errors).toEqual([{ field, message }]);
  });

  it('refuses an amount too large to be a number (1e999 reads as Infinity), never storing it as no factor', async () => {
    const raw = `{"amount":1e999,"unit":"mg","source":"x","signature":{"password":"${DEMO_PASSWORD}"}}`;
    const response = await request(t.http)
      .put(`/api/equianalgesic-factors/${HYDROMORPHONE}/parenteral`)
      .set(as('pharmacist'))
      .set('Content-Type', 'application/json')
      .send(raw)
      .expect(400);
    expect(response.body.errors).toEqual([{ field: 'amount', message: 'Amount must be a number' }]);
  });

  it('keeps the reference, parenteral morphine 10 mg, and the one oral row on morphine', async () => {
    const reference = await put(MORPHINE, 'parenteral', { amount: 8, unit: 'mg', source: 'x', ...signed }).expect(400);
    expect(reference.body.errors[0].field).toBe('amount');
    expect(reference.body.errors[0].message).toMatch(/reference/);
    await put(HYDROMORPHONE, 'oral', { amount: 7.5, unit: 'mg', source: 'x', ...signed }).expect(409);
    await put(999, 'parenteral', { amount: 1, unit: 'mg', source: 'x', ...signed }).expect(404);
    const badRoute = await put(HYDROMORPHONE, 'rectal', { amount: 1, unit: 'mg', source: 'x', ...signed }).expect(400);
    expect(badRoute.body.errors).toEqual([{ field: 'route', message: 'route must be parenteral or oral' }]);
  });

  it('records a signed change with before and after; the same change sent again records nothing', async () => {
    const response = await put(HYDROMORPHONE, 'parenteral', { amount: 1.5, unit: 'mg', source: ` ${AFP_2000} `, ...signed }).expect(200);
    expect(response.body).toMatchObject({
      drugId: HYDROMORPHONE,
      route: 'parenteral',
      amount: 1.5,
      unit: 'mg',
      source: AFP_2000,
      changedByName: 'Lin Park',
    });
    const event = await latestEvent();
    expect(event).toMatchObject({ action: 'equianalgesic-factor.update', entityType: 'equianalgesic-factor', actorName: 'Lin Park' });
    expect(event.summary).toMatchObject({
      drugId: HYDROMORPHONE,
      route: 'parenteral',
      amount: { from: 2, to: 1.5 },
      source: { from: NCI_PDQ_EQUIANALGESIC_SOURCE, to: AFP_2000 },
      signed: true,
    });
    expect(event.summary).not.toHaveProperty('unit');
    expect(JSON.stringify(event.summary)).not.toContain(DEMO_PASSWORD);

    await put(HYDROMORPHONE, 'parenteral', { amount: 1.5, unit: 'mg', source: AFP_2000, ...signed }).expect(200);
    expect((await latestEvent()).id).toBe(event.id);
    // A pharmacist may read the table's own audit events.
    const theirs = await request(t.http).get('/api/audit?entityType=equianalgesic-factor').set(as('pharmacist')).expect(200);
    expect((theirs.body as AuditPage).events.map((e) => e.id)).toContain(event.id);

    // Back to the shipped default, for the test below.
    await put(HYDROMORPHONE, 'parenteral', { amount: 2, unit: 'mg', source: NCI_PDQ_EQUIANALGESIC_SOURCE, ...signed }).expect(200);
  });

  it('computes a running PCA’s oral-morphine figure from its drug’s factor, and follows an edit', async () => {
    const orders = (await request(t.http).get('/api/orders').set(as('nurse')).expect(200)).body as OrderListEntry[];
    const running = orders.filter((order) => order.status === 'active' && order.drugId === HYDROMORPHONE);
    let usage: UsageResponse | undefined;
    let orderId = 0;
    for (const order of running) {
      const candidate = (await request(t.http).get(`/api/orders/${order.id}/usage?hours=24`).set(as('nurse')).expect(200))
        .body as UsageResponse;
      if (candidate.rolling24hDose > 0) [usage, orderId] = [candidate, order.id];
    }
    expect(usage, 'a demo hydromorphone PCA with use in the last 24 hours').toBeDefined();
    // NCI PDQ Cancer Pain, equianalgesic table: 1 mg parenteral hydromorphone ≈ 15 mg oral morphine.
    expect(usage!.oralMorphineEquivalent24hMg).toBeCloseTo(usage!.rolling24hDose * 15, 9);
    expect(usage!.oralMorphineFactors).toEqual({
      parenteralAmount: 2,
      parenteralUnit: 'mg',
      parenteralSource: NCI_PDQ_EQUIANALGESIC_SOURCE,
      oralMorphineMg: 30,
      oralSource: NCI_PDQ_EQUIANALGESIC_SOURCE,
    });

    // American Family Physician 2000;61(3):755: hydromorphone 1.5 mg ≈ morphine 10 mg, so 1 mg ≈ 20 mg oral.
    await put(HYDROMORPHONE, 'parenteral', { amount: 1.5, unit: 'mg', source: AFP_2000, ...signed }).expect(200);
    const after = (await request(t.http).get(`/api/orders/${orderId}/usage?hours=24`).set(as('nurse')).expect(200)).body as UsageResponse;
    expect(after.oralMorphineEquivalent24hMg).toBeCloseTo(after.rolling24hDose * 20, 9);
    expect(after.oralMorphineFactors).toMatchObject({ parenteralAmount: 1.5, parenteralSource: AFP_2000 });
  });

  it('shows no figure (never 0) for a drug with no factor, until a pharmacist sets one', async () => {
    const dataSource = t.app.get(DataSource);
    await dataSource.query(`DELETE FROM "equianalgesic_factors" WHERE "drugId" = ? AND "route" = 'parenteral'`, [FENTANYL]);
    const orders = (await request(t.http).get('/api/orders').set(as('nurse')).expect(200)).body as OrderListEntry[];
    const running = orders.find((order) => order.status === 'active' && order.drugId === FENTANYL);
    expect(running, 'a running demo fentanyl PCA').toBeDefined();
    const usage = (await request(t.http).get(`/api/orders/${running!.id}/usage?hours=24`).set(as('nurse')).expect(200))
      .body as UsageResponse;
    expect(usage.oralMorphineEquivalent24hMg).toBeNull();
    expect(usage.oralMorphineFactors).toBeNull();

    // NCI PDQ Cancer Pain, equianalgesic table: parenteral fentanyl 100 mcg ≈ parenteral morphine 10 mg.
    await put(FENTANYL, 'parenteral', { amount: 100, unit: 'mcg', source: NCI_PDQ_EQUIANALGESIC_SOURCE, ...signed }).expect(200);
    expect((await latestEvent()).summary).toMatchObject({ amount: { from: null, to: 100 }, unit: { from: null, to: 'mcg' } });
    const after = (await request(t.http).get(`/api/orders/${running!.id}/usage?hours=24`).set(as('nurse')).expect(200))
      .body as UsageResponse;
    // 100 mcg ≈ 30 mg oral morphine, so 0.3 mg oral morphine per mcg.
    expect(after.oralMorphineEquivalent24hMg).toBeCloseTo(after.rolling24hDose * 0.3, 9);
  });

  it('writes the shipped defaults when the table is created on a formulary that has the drugs, found by name once', async () => {
    const runner = t.app.get(DataSource).createQueryRunner();
    const migration = new EquianalgesicFactors1764780000000();
    await migration.down(runner);
    await migration.up(runner);
    await runner.release();
    const rows = await table();
    expect(rows.map(({ genericName, route, amount, unit, changedByName }) => [genericName, route, amount, unit, changedByName])).toEqual([
      ['fentanyl', 'parenteral', 100, 'mcg', null],
      ['hydromorphone', 'parenteral', 2, 'mg', null],
      ['morphine', 'parenteral', 10, 'mg', null],
      ['morphine', 'oral', 30, 'mg', null],
    ]);
    expect(rows.find((row) => row.genericName === 'hydromorphone')).toMatchObject({
      drugId: HYDROMORPHONE,
      source: NCI_PDQ_EQUIANALGESIC_SOURCE,
    });
  });
});
