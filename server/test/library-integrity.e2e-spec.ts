import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { LibraryAffectedOrders, LibraryVersionDetail } from '@lockstep/shared';
import { createTestApp, DEMO_PASSWORD, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

// Demo ward ids: Harbour 1, Cedar 2, Wren 3, Summit 4 (seed order); Harbour has a version awaiting
// approval, the others only an active one. The limits below are invented test values.
const CEDAR = 2;
const WREN = 3;
const SUMMIT = 4;
const HEADER = 'drug,concentration_per_ml,dose_unit,per_kg,parameter,hard_min,soft_min,soft_max,hard_max';
const GOOD_CSV = [HEADER, 'morphine,1,mg,no,demand_dose,0.2,0.5,1.8,3', 'morphine,1,mg,no,lockout_minutes,5,6,15,30'].join('\n');

type Rule = Pick<LibraryVersionDetail['rules'][number], 'drugId' | 'concentrationPerMl' | 'doseUnit' | 'perKg' | 'limits'>;
const inputs = (version: LibraryVersionDetail): Rule[] =>
  version.rules.map(({ drugId, concentrationPerMl, doseUnit, perKg, limits }) => ({ drugId, concentrationPerMl, doseUnit, perKg, limits }));

describe('library integrity', () => {
  let t: TestApp;
  let lin: string;
  let tomas: string;
  let nia: string;
  let nurse: string;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });
  const signed = (submittedAt: string) => ({ signature: { password: DEMO_PASSWORD }, submittedAt });
  const csvFile = (csv: string, name = 'limits.csv') => [Buffer.from(csv), { filename: name, contentType: 'text/csv' }] as const;

  beforeAll(async () => {
    t = await createTestApp();
    lin = await t.tokenFor(DEMO_USER_BY_ROLE.pharmacist);
    tomas = await t.tokenFor('tomas.ortiz');
    nurse = await t.tokenFor(DEMO_USER_BY_ROLE.nurse);
    const admin = await t.tokenFor(DEMO_USER_BY_ROLE.admin);
    await request(t.http)
      .post('/api/users')
      .set(as(admin))
      .send({ username: 'nia.hart', displayName: 'Nia Hart', role: 'pharmacist', wardIds: [1, 2, 3, 4], password: DEMO_PASSWORD })
      .expect(201);
    nia = await t.tokenFor('nia.hart');
  });
  afterAll(() => t.close());

  it('records who created, edited and submitted a version; none of them may approve it (403), a third pharmacist can', async () => {
    const draft = await request(t.http).post('/api/library/versions').set(as(lin)).send({ wardId: SUMMIT, note: 'Review' }).expect(201);
    const id: number = draft.body.id;
    await request(t.http)
      .put(`/api/library/versions/${id}/rules`)
      .set(as(tomas))
      .send({ rules: inputs(draft.body) })
      .expect(200);
    const submitted = await request(t.http).post(`/api/library/versions/${id}/submit`).set(as(lin)).send({}).expect(200);
    expect(submitted.body.contributors.map((c: { userName: string; action: string }) => [c.userName, c.action])).toEqual([
      ['Lin Park', 'created'],
      ['Tomas Ortiz', 'edited'],
      ['Lin Park', 'submitted'],
    ]);

    const editor = await request(t.http)
      .post(`/api/library/versions/${id}/approve`)
      .set(as(tomas))
      .send(signed(submitted.body.submittedAt))
      .expect(403);
    expect(editor.body.message).toBe('A second pharmacist must approve: you edited this version');
    const author = await request(t.http)
      .post(`/api/library/versions/${id}/approve`)
      .set(as(lin))
      .send(signed(submitted.body.submittedAt))
      .expect(403);
    expect(author.body.message).toBe('A second pharmacist must approve: you created and submitted this version');

    const approved = await request(t.http)
      .post(`/api/library/versions/${id}/approve`)
      .set(as(nia))
      .send(signed(submitted.body.submittedAt))
      .expect(200);
    expect(approved.body).toMatchObject({ status: 'active', approverName: 'Nia Hart' });
  });

  it('bars whoever imported or submitted; the reviewer sends it back with a signed comment, shown on the version and audited', async () => {
    const imported = await request(t.http)
      .post('/api/library/import')
      .set(as(nia))
      .field('wardId', String(WREN))
      .attach('file', ...csvFile(GOOD_CSV))
      .expect(201);
    const id: number = imported.body.id;
    const submitted = await request(t.http).post(`/api/library/versions/${id}/submit`).set(as(tomas)).send({}).expect(200);
    for (const [token, did] of [
      [nia, 'imported'],
      [tomas, 'submitted'],
    ]) {
      const refused = await request(t.http)
        .post(`/api/library/versions/${id}/approve`)
        .set(as(token))
        .send(signed(submitted.body.submittedAt))
        .expect(403);
      expect(refused.body.message).toBe(`A second pharmacist must approve: you ${did} this version`);
    }

    // Sending back: signed, a comment of substance, by someone who did not write it.
    const url = `/api/library/versions/${id}/send-back`;
    const comment = 'Demand dose hard maximum 3 mg is above our ward policy: please check';
    const noComment = await request(t.http)
      .post(url)
      .set(as(lin))
      .send({ signature: { password: DEMO_PASSWORD } })
      .expect(400);
    expect(noComment.body.errors).toEqual([{ field: 'comment', message: 'Say what needs changing' }]);
    const wrongPassword = await request(t.http)
      .post(url)
      .set(as(lin))
      .send({ signature: { password: 'not-it' }, comment })
      .expect(401);
    expect(wrongPassword.body.errors[0].field).toBe('signature.password');
    const own = await request(t.http)
      .post(url)
      .set(as(nia))
      .send({ signature: { password: DEMO_PASSWORD }, comment })
      .expect(403);
    expect(own.body.message).toContain('withdraw it to draft instead');
    await request(t.http)
      .post(url)
      .set(as(nurse))
      .send({ signature: { password: DEMO_PASSWORD }, comment })
      .expect(403);

    const sentBack = await request(t.http)
      .post(url)
      .set({ ...as(lin), 'Idempotency-Key': 'c2f5a7e0-send-back-1' })
      .send({ signature: { password: DEMO_PASSWORD }, comment: `  ${comment} ` })
      .expect(200);
    expect(sentBack.body).toMatchObject({ status: 'draft', submittedAt: null, sentBack: { byName: 'Lin Park', comment } });
    await request(t.http)
      .post(url)
      .set(as(lin))
      .send({ signature: { password: DEMO_PASSWORD }, comment })
      .expect(409);
    const audit = await request(t.http).get(`/api/audit?entityType=library-version&entityId=${id}&limit=1`).set(as(lin)).expect(200);
    expect(audit.body.events[0]).toMatchObject({ action: 'library-version.send-back' });

    // The comment stays on the version; the author resubmits and the reviewer approves.
    const again = await request(t.http).post(`/api/library/versions/${id}/submit`).set(as(tomas)).send({}).expect(200);
    expect(again.body.sentBack.comment).toBe(comment);
    await request(t.http).post(`/api/library/versions/${id}/approve`).set(as(lin)).send(signed(again.body.submittedAt)).expect(200);
  });

  it('refuses a CSV limit too long to be a number (never stored as no limit): 400 naming row and column', async () => {
    const csv = [HEADER, 'morphine,1,mg,no,demand_dose,0.2,0.5,1.8,3', `morphine,1,mg,no,four_hour_limit,,,30,${'9'.repeat(400)}`].join(
      '\n',
    );
    const response = await request(t.http)
      .post('/api/library/import')
      .set(as(lin))
      .field('wardId', String(CEDAR))
      .attach('file', ...csvFile(csv))
      .expect(400);
    expect(response.body.errors).toEqual([
      { field: 'file', row: 3, column: 'hard_max', message: 'Row 3, hard_max: 400 digits is too long to be a limit' },
    ]);
    const outOfRange = [HEADER, 'morphine,1,mg,no,lockout_minutes,5,6,15,100000'].join('\n');
    const range = await request(t.http)
      .post('/api/library/import')
      .set(as(lin))
      .field('wardId', String(CEDAR))
      .attach('file', ...csvFile(outOfRange))
      .expect(400);
    expect(range.body.errors[0]).toMatchObject({ row: 2, column: 'hard_max' });
    expect(range.body.errors[0].message).toContain('at most 1440 minutes');
  });

  it('refuses a JSON limit that is infinite or out of range, naming the rule index and field path', async () => {
    const draft = await request(t.http).post('/api/library/versions').set(as(lin)).send({ wardId: CEDAR }).expect(201);
    const id: number = draft.body.id;
    const rule = { drugId: 1, concentrationPerMl: 1, doseUnit: 'mg', perKg: false };
    const infinite = await request(t.http)
      .put(`/api/library/versions/${id}/rules`)
      .set({ ...as(lin), 'Content-Type': 'application/json' })
      // 1e400 is valid JSON and reads as Infinity.
      .send(`{"rules":[${JSON.stringify({ ...rule, limits: {} }).replace('"limits":{}', '"limits":{"demandDose":{"hardMax":1e400}}')}]}`)
      .expect(400);
    expect(infinite.body.errors).toEqual([{ field: 'rules.0.limits.demandDose.hardMax', message: 'hardMax must be a number' }]);
    const tooLong = await request(t.http)
      .put(`/api/library/versions/${id}/rules`)
      .set(as(lin))
      .send({ rules: [{ ...rule, limits: { lockoutMinutes: { hardMin: 5, hardMax: 100000 } } }] })
      .expect(400);
    expect(tooLong.body.errors).toEqual([
      { field: 'rules.0.limits.lockoutMinutes.hardMax', message: 'Lockout: a limit is at most 1440 minutes; this is 100000' },
    ]);
    await request(t.http).delete(`/api/library/versions/${id}`).set(as(lin)).expect(204);
  });

  it('holds CSV imports to 500 rules: 999 rules is a clear 400 naming the cap, 500 rules import (never a 500)', async () => {
    const rows = (count: number) => Array.from({ length: count }, (_, i) => `morphine,${i + 1},mg,no,demand_dose,,0.5,2,4`);
    const tooMany = await request(t.http)
      .post('/api/library/import')
      .set(as(lin))
      .field('wardId', String(CEDAR))
      .attach('file', ...csvFile([HEADER, ...rows(999)].join('\n')))
      .expect(400);
    expect(tooMany.body.errors).toEqual([
      {
        field: 'file',
        row: 502,
        column: 'drug',
        message: 'Row 502, drug: A library version holds at most 500 rules (one per drug and concentration); this row starts rule 501',
      },
    ]);
    const most = await request(t.http)
      .post('/api/library/import')
      .set(as(lin))
      .field('wardId', String(CEDAR))
      .attach('file', ...csvFile([HEADER, ...rows(500)].join('\n')))
      .expect(201);
    expect(most.body.ruleCount).toBe(500);
    // The same rules as JSON are written in one statement without reading them back row by row.
    await request(t.http)
      .put(`/api/library/versions/${most.body.id}/rules`)
      .set(as(lin))
      .send({ rules: inputs(most.body) })
      .expect(200);
    await request(t.http).delete(`/api/library/versions/${most.body.id}`).set(as(lin)).expect(204);
  });

  it('exports tiny and large limits as plain decimals that import back to the same rules', async () => {
    const draft = await request(t.http).post('/api/library/versions').set(as(lin)).send({ wardId: CEDAR }).expect(201);
    const id: number = draft.body.id;
    const rules = [
      {
        drugId: 1,
        concentrationPerMl: 0.0000001,
        doseUnit: 'mg',
        perKg: false,
        limits: { demandDose: { hardMin: 0.0000001, softMax: 0.30000000000000004, hardMax: 10000 }, lockoutMinutes: { hardMax: 1440 } },
      },
    ];
    const saved = await request(t.http).put(`/api/library/versions/${id}/rules`).set(as(lin)).send({ rules }).expect(200);
    const exported = await request(t.http).get(`/api/library/versions/${id}/export`).set(as(lin)).expect(200);
    expect(exported.text).toContain('morphine,0.0000001,mg,no,');
    expect(exported.text).toContain('0.0000001,,0.30000000000000004,10000');
    expect(exported.text).not.toMatch(/\de[-+]?\d/i);
    const preview = await request(t.http)
      .post('/api/library/import')
      .set(as(lin))
      .field('wardId', String(CEDAR))
      .field('dryRun', 'true')
      .attach('file', ...csvFile(exported.text))
      .expect(200);
    expect(
      preview.body.rules.map(({ drugId, concentrationPerMl, doseUnit, perKg, limits }: Rule) => ({
        drugId,
        concentrationPerMl,
        doseUnit,
        perKg,
        limits,
      })),
    ).toEqual(inputs(saved.body));
    await request(t.http).delete(`/api/library/versions/${id}`).set(as(lin)).expect(204);
  });

  it('lists the open orders a version would put outside its limits, checked by the shared order check', async () => {
    const active = await request(t.http).get(`/api/wards/${CEDAR}/library`).set(as(lin)).expect(200);
    const draft = await request(t.http).post('/api/library/versions').set(as(lin)).send({ wardId: CEDAR }).expect(201);
    const id: number = draft.body.id;
    // Morphine demand doses capped at 0.1 mg: every running morphine order on Cedar is over it.
    const tightened = inputs(active.body).map((rule) =>
      rule.drugId === 1 ? { ...rule, limits: { ...rule.limits, demandDose: { hardMax: 0.1 } } } : rule,
    );
    await request(t.http).put(`/api/library/versions/${id}/rules`).set(as(lin)).send({ rules: tightened }).expect(200);

    await request(t.http).get(`/api/library/versions/${id}/affected-orders`).set(as(nurse)).expect(403);
    const answer = await request(t.http).get(`/api/library/versions/${id}/affected-orders`).set(as(tomas)).expect(200);
    const body = answer.body as LibraryAffectedOrders;
    expect(body).toMatchObject({ versionId: id, wardId: CEDAR });
    const morphine = body.orders.filter((order) => order.drugName === 'morphine');
    expect(morphine.length).toBeGreaterThan(0);
    for (const order of morphine) {
      expect(['verified', 'active']).toContain(order.status);
      expect(order.bed).toMatch(/^C/);
      expect(order.findings).toContainEqual(expect.objectContaining({ field: 'demandDose', severity: 'hard' }));
    }
    for (const order of body.orders) expect(order.findings.every((f) => f.severity === 'hard' || f.severity === 'soft')).toBe(true);
    await request(t.http).get('/api/library/versions/9999/affected-orders').set(as(tomas)).expect(404);
    await request(t.http).delete(`/api/library/versions/${id}`).set(as(lin)).expect(204);
  });
});
