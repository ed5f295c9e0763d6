import Database from 'better-sqlite3';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AuditEvent, AuditPage } from '@lockstep/shared';
import { activeOrder, type PcaTokens } from './support/pca-steps.js';
import { changeWardPolicy } from './support/ward-policy-steps.js';
import { createTestApp, DEMO_PASSWORD, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

describe('audit trail', () => {
  let t: TestApp;
  let admin: string;
  let pharmacist: string;
  let nurse: string;
  let tokens: PcaTokens;
  const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
  const search = async (query: string, token = admin) =>
    (await request(t.http).get(`/api/audit${query}`).set(bearer(token)).expect(200)).body as AuditPage;
  const auditCount = async () => (await search('?limit=1')).total;

  beforeAll(async () => {
    t = await createTestApp();
    admin = await t.tokenFor(DEMO_USER_BY_ROLE.admin);
    pharmacist = await t.tokenFor(DEMO_USER_BY_ROLE.pharmacist);
    nurse = await t.tokenFor(DEMO_USER_BY_ROLE.nurse);
    tokens = { prescriber: await t.tokenFor(DEMO_USER_BY_ROLE.prescriber), pharmacist, nurse };
  });
  afterAll(() => t.close());

  it('starts from the demo data’s own story: library approvals and the demo orders, oldest first', async () => {
    const { total } = await search('?limit=1');
    const { events } = await search(`?limit=200&offset=${Math.max(0, total - 200)}`);
    const oldestFirst = [...events].reverse();
    expect(oldestFirst.slice(0, 4).map((event) => event.action)).toEqual(Array(4).fill('library-version.approve'));
    expect(oldestFirst.map((event) => event.at)).toEqual([...oldestFirst.map((event) => event.at)].sort());
    const verifiedDemo = (await request(t.http).get('/api/orders/2/audit').set(bearer(nurse)).expect(200)).body as AuditEvent[];
    expect(verifiedDemo.map((event) => event.action)).toEqual(['order.create', 'order.verify', 'order.release']);
  });

  it('records a ward policy change with who, when and each field’s old and new value; a no-op writes nothing', async () => {
    const approver = await t.tokenFor(DEMO_USER_BY_ROLE.charge_nurse);
    const change = await changeWardPolicy(t.http, { admin, approver }, 1, { respiratoryRateThreshold: 10, syringeLowThresholdHours: 2 });
    const { events } = await search('?entityType=ward&entityId=1&action=ward.policy-update');
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({
      action: 'ward.policy-update',
      actorName: 'Mei Tan',
      entityType: 'ward',
      entityId: '1',
      summary: { respiratoryRateThreshold: { from: 9, to: 10 }, change: change.id, proposedBy: 'Sam Rivera' },
    });
    expect(events[0].summary).not.toHaveProperty('syringeLowThresholdHours');
    expect(Date.now() - Date.parse(events[0].at)).toBeLessThan(60_000);
    const proposed = await search('?entityType=ward&entityId=1&action=ward.policy-change-propose');
    expect(proposed.events[0]).toMatchObject({
      actorName: 'Sam Rivera',
      summary: { change: change.id, respiratoryRateThreshold: { from: 9, to: 10 } },
    });

    const before = await auditCount();
    const email = { pharmacyEmail: 'pharmacy.harbour@kestrelbay.example' };
    await request(t.http).patch('/api/wards/1/policy').set(bearer(admin)).send(email).expect(200);
    const propose = (changes: object) =>
      request(t.http)
        .post('/api/wards/1/policy-changes')
        .set(bearer(admin))
        .send({ changes, reason: 'Nothing should change here', signature: { password: DEMO_PASSWORD } });
    await propose({ respiratoryRateThreshold: 10 }).expect(400);
    await propose({ respiratoryRateThreshold: -3 }).expect(400);
    expect(await auditCount()).toBe(before);
  });

  it('tells an order’s whole story to every role, oldest first, each event chained to the one before', async () => {
    const { id } = await activeOrder(t.http, tokens, await t.addPatient());
    await request(t.http)
      .post(`/api/orders/${id}/observations`)
      .set(bearer(nurse))
      .send({
        painScore: 4,
        sedationLevel: '1',
        respiratoryRate: 14,
        spo2: 97,
        oxygenLitresPerMinute: 0,
        // One dose: recorded moments after the start, when the lockout allows only one.
        attempts: 2,
        delivered: 1,
        volumeInfusedMl: 1,
        syringeRemainingMl: 49,
      })
      .expect(201);

    const story = (await request(t.http).get(`/api/orders/${id}/audit`).set(bearer(nurse)).expect(200)).body as AuditEvent[];
    expect(story.map((event) => [event.action, event.actorName])).toEqual([
      ['order.create', 'Dr Amara Osei'],
      ['order.verify', 'Lin Park'],
      ['order.release', 'Lin Park'],
      ['order.bedside-first-check', 'Kai Mendes'],
      ['order.bedside-second-check', 'Rosa Adeyemi'],
      ['order.observation', 'Kai Mendes'],
    ]);
    expect(story[1].summary).toMatchObject({ status: { from: 'awaiting_verification', to: 'verified' } });
    expect(story[4].summary).toMatchObject({ result: 'matched', status: { from: 'verified', to: 'active' } });
    expect(story[5].summary).toMatchObject({ painScore: 4, sedationLevel: '1', flagsRaised: [] });
    expect(JSON.stringify(story)).not.toContain(DEMO_PASSWORD);

    const all = (await search('?limit=200')).events.reverse();
    all.slice(1).forEach((event, index) => expect(event.prevHash).toBe(all[index].hash));

    await request(t.http).get(`/api/orders/${id}/audit`).expect(401);
    await request(t.http).get('/api/orders/99999/audit').set(bearer(nurse)).expect(404);
  });

  it('writes nothing when a change is refused', async () => {
    const before = await auditCount();
    // Demo order 2 is already verified: a second verify is a 409 and its transaction rolls back.
    await request(t.http)
      .post('/api/orders/2/verify')
      .set(bearer(pharmacist))
      .send({ signature: { password: DEMO_PASSWORD } })
      .expect(409);
    await request(t.http)
      .post('/api/users')
      .set(bearer(admin))
      .send({ username: 'kai.mendes', displayName: 'Copy', role: 'nurse', wardIds: [1], password: 'long-enough-password' })
      .expect(409);
    expect(await auditCount()).toBe(before);
  });

  it('records user changes without the password', async () => {
    const { body: user } = await request(t.http)
      .post('/api/users')
      .set(bearer(admin))
      .send({ username: 'ivo.lund', displayName: 'Ivo Lund', role: 'nurse', wardIds: [1], password: 'a-long-password-1' })
      .expect(201);
    await request(t.http)
      .patch(`/api/users/${user.id}`)
      .set(bearer(admin))
      .send({ role: 'charge_nurse', password: 'another-long-password' })
      .expect(200);
    const { events } = await search(`?entityType=user&entityId=${user.id}`);
    expect(events.map((event) => [event.action, event.summary])).toEqual([
      ['user.update', { role: { from: 'nurse', to: 'charge_nurse' }, passwordReset: true }],
      ['user.create', { username: 'ivo.lund', displayName: 'Ivo Lund', role: 'nurse', wardIds: [1] }],
    ]);
    expect(JSON.stringify(events)).not.toMatch(/long-password|\$2[aby]\$/);
  });

  it('filters by user, action and time, and pages newest first', async () => {
    const lin = (await search('?action=order.verify')).events[0].userId;
    const byLin = await search(`?userId=${lin}`);
    expect(byLin.total).toBeGreaterThan(0);
    expect(byLin.events.every((event) => event.userId === lin)).toBe(true);

    const page1 = await search('?limit=2');
    const page2 = await search('?limit=2&offset=2');
    expect(page1.events).toHaveLength(2);
    expect(page1.events[0].id).toBeGreaterThan(page1.events[1].id);
    expect(page2.events[0].id).toBeLessThan(page1.events[1].id);
    expect(page2.total).toBe(page1.total);

    expect((await search(`?from=${encodeURIComponent(new Date(Date.now() + 60_000).toISOString())}`)).total).toBe(0);
    expect((await search(`?to=${encodeURIComponent(new Date(Date.now() + 60_000).toISOString())}`)).total).toBe(page1.total);

    const bad = await request(t.http).get('/api/audit?limit=500&entityType=pump').set(bearer(admin)).expect(400);
    expect(bad.body.errors.map((error: { field: string }) => error.field).sort()).toEqual(['entityType', 'limit']);
  });

  it('lets pharmacists read order and library events only; other roles none; only admins verify', async () => {
    const mine = await search('', pharmacist);
    expect(mine.total).toBeGreaterThan(0);
    expect(new Set(mine.events.map((event) => event.entityType))).toEqual(new Set(['order', 'library-version']));
    await request(t.http).get('/api/audit?entityType=user').set(bearer(pharmacist)).expect(403);
    await request(t.http).get('/api/audit?entityType=order').set(bearer(pharmacist)).expect(200);
    await request(t.http).get('/api/audit').set(bearer(nurse)).expect(403);
    await request(t.http).get('/api/audit').expect(401);
    await request(t.http).get('/api/audit/verify').set(bearer(pharmacist)).expect(403);
  });

  it('refuses to update or delete audit rows in the database, and the verify endpoint names a row changed behind its back', async () => {
    const intact = (await request(t.http).get('/api/audit/verify').set(bearer(admin)).expect(200)).body;
    expect(intact).toEqual({ ok: true, checked: await auditCount(), firstBadId: null });

    const policyChange = (await search('?action=ward.policy-update')).events[0];
    const db = new Database(t.databasePath);
    try {
      expect(() => db.prepare('UPDATE audit_event SET summary = ? WHERE id = ?').run('{}', policyChange.id)).toThrow(/append-only/);
      expect(() => db.prepare('DELETE FROM audit_event WHERE id = ?').run(policyChange.id)).toThrow(/append-only/);
      // Someone with the database file drops the guard and edits history.
      db.exec('DROP TRIGGER audit_event_no_update');
      db.prepare(`UPDATE audit_event SET summary = json_set(summary, '$.respiratoryRateThreshold.to', 20) WHERE id = ?`).run(
        policyChange.id,
      );
    } finally {
      db.close();
    }
    const broken = (await request(t.http).get('/api/audit/verify').set(bearer(admin)).expect(200)).body;
    expect(broken).toEqual({ ok: false, checked: policyChange.id - 1, firstBadId: policyChange.id });
  });
});
