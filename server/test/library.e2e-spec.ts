import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, DEMO_PASSWORD, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

type Role = keyof typeof DEMO_USER_BY_ROLE;
const ROLES = Object.keys(DEMO_USER_BY_ROLE) as Role[];
const CEDAR = 2; // demo ward ids: Harbour 1, Cedar 2, Wren 3, Summit 4 (seed order)

const HEADER = 'drug,concentration_per_ml,dose_unit,per_kg,parameter,hard_min,soft_min,soft_max,hard_max';
const GOOD_CSV = [
  HEADER,
  'morphine,1,mg,no,demand_dose,0.2,0.5,1.8,3',
  'morphine,1,mg,no,lockout_minutes,5,6,15,30',
  'fentanyl,10,mcg,no,demand_dose,2,5,20,30',
].join('\n');
const BAD_ROW_CSV = [HEADER, 'morphine,1,mg,no,demand_dose,0.2,0.5,1.8,3', 'morfine,1,mg,no,demand_dose,0.2,0.5,2,3'].join('\n');

describe('dose-limit library', () => {
  let t: TestApp;
  const tokens = {} as Record<Role, string>;
  let tomas: string;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });

  beforeAll(async () => {
    t = await createTestApp();
    for (const role of ROLES) tokens[role] = await t.tokenFor(DEMO_USER_BY_ROLE[role]);
    tomas = await t.tokenFor('tomas.ortiz');
  });
  afterAll(() => t.close());

  it.each(ROLES)('as %s, reads the active library of a ward', async (role) => {
    const response = await request(t.http).get(`/api/wards/${CEDAR}/library`).set(as(tokens[role])).expect(200);
    expect(response.body).toMatchObject({ wardId: CEDAR, status: 'active', number: 1 });
    expect(response.body.rules.map((rule: { drugName: string }) => rule.drugName)).toEqual(['fentanyl', 'hydromorphone', 'morphine']);
  });

  it('answers 401 without a token and 404 for a ward that does not exist', async () => {
    await request(t.http).get(`/api/wards/${CEDAR}/library`).expect(401);
    await request(t.http).get('/api/wards/999/library').set(as(tokens.nurse)).expect(404);
  });

  it.each(['prescriber', 'nurse', 'charge_nurse', 'admin'] as Role[])('as %s, may not write the library (403)', async (role) => {
    const auth = as(tokens[role]);
    await request(t.http).post('/api/library/versions').set(auth).send({ wardId: CEDAR }).expect(403);
    await request(t.http).put('/api/library/versions/1/rules').set(auth).send({ rules: [] }).expect(403);
    await request(t.http).post('/api/library/versions/1/submit').set(auth).send({}).expect(403);
    await request(t.http)
      .post('/api/library/versions/5/approve')
      .set(auth)
      .send({ signature: { password: DEMO_PASSWORD } })
      .expect(403);
    await request(t.http).delete('/api/library/versions/1').set(auth).expect(403);
    await request(t.http)
      .post('/api/library/import')
      .set(auth)
      .field('wardId', CEDAR)
      .attach('file', Buffer.from(GOOD_CSV), 'limits.csv')
      .expect(403);
  });

  it('lists versions with their status and rule counts', async () => {
    const response = await request(t.http).get('/api/library/versions?wardId=1').set(as(tokens.nurse)).expect(200);
    expect(response.body.map((v: { number: number; status: string; ruleCount: number }) => [v.number, v.status, v.ruleCount])).toEqual([
      [2, 'pending_approval', 3],
      [1, 'active', 3],
    ]);
  });

  it('diffs the pending Harbour draft against the active version', async () => {
    const versions = await request(t.http).get('/api/library/versions?wardId=1').set(as(tokens.pharmacist));
    const pending = versions.body[0];
    const diff = await request(t.http).get(`/api/library/versions/${pending.id}/diff`).set(as(tokens.pharmacist)).expect(200);
    expect(diff.body.added).toEqual([]);
    expect(diff.body.removed).toEqual([]);
    expect(diff.body.changed).toEqual([
      {
        drugName: 'morphine',
        concentrationPerMl: 1,
        doseUnit: 'mg',
        changes: [{ field: 'demandDose', limit: 'softMax', from: 2, to: 1.5 }],
      },
    ]);
  });

  it('refuses an import with a bad row: 400 naming the row and column, and nothing written', async () => {
    const before = await request(t.http).get('/api/library/versions').set(as(tokens.pharmacist));
    const response = await request(t.http)
      .post('/api/library/import')
      .set(as(tokens.pharmacist))
      .field('wardId', String(CEDAR))
      .attach('file', Buffer.from(BAD_ROW_CSV), { filename: 'cedar.csv', contentType: 'text/csv' })
      .expect(400);
    expect(response.body.errors).toEqual([
      { field: 'file', row: 3, column: 'drug', message: 'Row 3, drug: Unknown drug morfine; known: morphine, hydromorphone, fentanyl' },
    ]);
    const after = await request(t.http).get('/api/library/versions').set(as(tokens.pharmacist));
    expect(after.body).toHaveLength(before.body.length);
  });

  it.each([
    ['an empty file', Buffer.alloc(0), 'empty.csv', 'The file is empty'],
    ['a binary file', Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x00, 0x01]), 'limits.csv', 'The file is not text'],
    ['a file that is not CSV', Buffer.from(GOOD_CSV), 'limits.xlsx', 'Only CSV files'],
    ['a file with the wrong columns', Buffer.from('drug,dose\nmorphine,1'), 'limits.csv', 'The file has'],
    ['a file over 1 MB', Buffer.alloc(1024 * 1024 + 10, 'a'), 'big.csv', 'over 1 MB'],
    // Which hard_max would count is a guess about a limit: refused, not picked.
    [
      'a file with a column twice',
      Buffer.from(`${HEADER},hard_max\nmorphine,1,mg,no,demand_dose,0.2,0.5,1.8,3,30`),
      'limits.csv',
      'The file has 1 problem',
    ],
  ])('refuses %s with a clear 400', async (_label, content, filename, message) => {
    const response = await request(t.http)
      .post('/api/library/import')
      .set(as(tokens.pharmacist))
      .field('wardId', String(CEDAR))
      .attach('file', content, { filename, contentType: filename.endsWith('.csv') ? 'text/csv' : 'application/octet-stream' })
      .expect(400);
    expect(response.body.message).toContain(message);
  });

  it('lists at most 200 row problems, and refuses a dry run for a ward that does not exist', async () => {
    const badRows = Array.from({ length: 300 }, () => 'morfine,1,mg,no,demand_dose,0.2,0.5,1.8,3');
    const many = await request(t.http)
      .post('/api/library/import')
      .set(as(tokens.pharmacist))
      .field('wardId', String(CEDAR))
      .attach('file', Buffer.from([HEADER, ...badRows].join('\n')), { filename: 'cedar.csv', contentType: 'text/csv' })
      .expect(400);
    expect(many.body.message).toBe('The file has 300 problems in 300 rows; nothing was imported (the first 200 are listed)');
    expect(many.body.errors).toHaveLength(200);

    const nowhere = await request(t.http)
      .post('/api/library/import')
      .set(as(tokens.pharmacist))
      .field('wardId', '9999')
      .field('dryRun', 'true')
      .attach('file', Buffer.from(GOOD_CSV), { filename: 'cedar.csv', contentType: 'text/csv' })
      .expect(400);
    expect(nowhere.body.errors).toEqual([{ field: 'wardId', message: 'No ward with id 9999' }]);
  });

  it('previews an import without writing (dryRun)', async () => {
    const response = await request(t.http)
      .post('/api/library/import')
      .set(as(tokens.pharmacist))
      .field('wardId', String(CEDAR))
      .field('dryRun', 'true')
      .attach('file', Buffer.from(GOOD_CSV), { filename: 'cedar.csv', contentType: 'text/csv' })
      .expect(200);
    expect(response.body.rules).toHaveLength(2);
    expect(response.body.diff.removed.map((rule: { drugName: string }) => rule.drugName)).toEqual(['hydromorphone']);
    const versions = await request(t.http).get(`/api/library/versions?wardId=${CEDAR}`).set(as(tokens.pharmacist));
    expect(versions.body).toHaveLength(1);
  });

  it('imports → draft → submit → the author cannot approve → a second pharmacist does → the old version retires', async () => {
    const imported = await request(t.http)
      .post('/api/library/import')
      .set(as(tokens.pharmacist))
      .field('wardId', String(CEDAR))
      .field('note', 'Tighter morphine demand limits')
      .attach('file', Buffer.from(GOOD_CSV), { filename: 'cedar.csv', contentType: 'text/csv' })
      .expect(201);
    expect(imported.body).toMatchObject({ status: 'draft', number: 2, ruleCount: 2, authorName: 'Lin Park' });
    const id = imported.body.id;

    // A second open version for the same ward is a conflict.
    await request(t.http).post('/api/library/versions').set(as(tomas)).send({ wardId: CEDAR }).expect(409);

    const signed = (submittedAt: string, password = DEMO_PASSWORD) => ({ signature: { password }, submittedAt });
    await request(t.http).post(`/api/library/versions/${id}/approve`).set(as(tomas)).send(signed(new Date().toISOString())).expect(409);
    const submitted = await request(t.http).post(`/api/library/versions/${id}/submit`).set(as(tokens.pharmacist)).send({}).expect(200);
    const { submittedAt } = submitted.body;
    await request(t.http).put(`/api/library/versions/${id}/rules`).set(as(tokens.pharmacist)).send({ rules: [] }).expect(409);

    const self = await request(t.http)
      .post(`/api/library/versions/${id}/approve`)
      .set(as(tokens.pharmacist))
      .send(signed(submittedAt))
      .expect(403);
    expect(self.body.message).toContain('second pharmacist');
    const wrongPassword = await request(t.http)
      .post(`/api/library/versions/${id}/approve`)
      .set(as(tomas))
      .send(signed(submittedAt, 'not-it'))
      .expect(401);
    expect(wrongPassword.body.errors[0].field).toBe('signature.password');
    await request(t.http).post(`/api/library/versions/${id}/approve`).set(as(tomas)).send({}).expect(400);
    const unnamed = await request(t.http)
      .post(`/api/library/versions/${id}/approve`)
      .set(as(tomas))
      .send({ signature: { password: DEMO_PASSWORD } })
      .expect(400);
    expect(unnamed.body.errors).toEqual([{ field: 'submittedAt', message: 'submittedAt is required: the submission you reviewed' }]);

    const approved = await request(t.http).post(`/api/library/versions/${id}/approve`).set(as(tomas)).send(signed(submittedAt)).expect(200);
    expect(approved.body).toMatchObject({ status: 'active', approverName: 'Tomas Ortiz' });
    await request(t.http).post(`/api/library/versions/${id}/approve`).set(as(tomas)).send(signed(submittedAt)).expect(409);

    const versions = await request(t.http).get(`/api/library/versions?wardId=${CEDAR}`).set(as(tokens.nurse));
    expect(versions.body.map((v: { number: number; status: string }) => [v.number, v.status])).toEqual([
      [2, 'active'],
      [1, 'retired'],
    ]);
    const active = await request(t.http).get(`/api/wards/${CEDAR}/library`).set(as(tokens.nurse)).expect(200);
    expect(active.body.id).toBe(id);
    expect(active.body.rules.find((rule: { drugName: string }) => rule.drugName === 'morphine').limits.demandDose.softMax).toBe(1.8);
  });

  it('refuses an approval of a version withdrawn, edited and submitted again after the approver opened it', async () => {
    const draft = await request(t.http)
      .post('/api/library/versions')
      .set(as(tokens.pharmacist))
      .send({ wardId: CEDAR, note: 'Second look' })
      .expect(201);
    const id = draft.body.id;
    const reviewed = await request(t.http).post(`/api/library/versions/${id}/submit`).set(as(tokens.pharmacist)).send({}).expect(200);

    // The author takes it back, drops a rule and submits again while Tomas has it open.
    await request(t.http).post(`/api/library/versions/${id}/withdraw`).set(as(tokens.pharmacist)).expect(200);
    const rules = draft.body.rules.map(({ drugId, concentrationPerMl, doseUnit, perKg, limits }: Record<string, unknown>) => ({
      drugId,
      concentrationPerMl,
      doseUnit,
      perKg,
      limits,
    }));
    expect(rules.length).toBeGreaterThan(1);
    await request(t.http)
      .put(`/api/library/versions/${id}/rules`)
      .set(as(tokens.pharmacist))
      .send({ rules: rules.slice(1) })
      .expect(200);
    const resubmitted = await request(t.http).post(`/api/library/versions/${id}/submit`).set(as(tokens.pharmacist)).send({}).expect(200);
    expect(resubmitted.body.submittedAt).not.toBe(reviewed.body.submittedAt);

    const stale = await request(t.http)
      .post(`/api/library/versions/${id}/approve`)
      .set(as(tomas))
      .send({ signature: { password: DEMO_PASSWORD }, submittedAt: reviewed.body.submittedAt })
      .expect(409);
    expect(stale.body.message).toMatch(/withdrawn and submitted again after you opened it: review its changes again/);
    const unchanged = await request(t.http).get(`/api/library/versions/${id}`).set(as(tomas)).expect(200);
    expect(unchanged.body).toMatchObject({ status: 'pending_approval', approverId: null });

    await request(t.http)
      .post(`/api/library/versions/${id}/approve`)
      .set(as(tomas))
      .send({ signature: { password: DEMO_PASSWORD }, submittedAt: resubmitted.body.submittedAt })
      .expect(200);
  });

  it('exports a version as CSV that imports back to the same rules', async () => {
    const active = await request(t.http).get('/api/wards/3/library').set(as(tokens.pharmacist));
    const exported = await request(t.http).get(`/api/library/versions/${active.body.id}/export`).set(as(tokens.pharmacist)).expect(200);
    expect(exported.headers['content-type']).toContain('text/csv');
    expect(exported.headers['content-disposition']).toContain('dose-limits-wren-v1.csv');
    const preview = await request(t.http)
      .post('/api/library/import')
      .set(as(tokens.pharmacist))
      .field('wardId', '3')
      .field('dryRun', 'true')
      .attach('file', Buffer.from(exported.text), { filename: 'wren.csv', contentType: 'text/csv' })
      .expect(200);
    expect(preview.body.diff).toEqual({ added: [], removed: [], changed: [] });
  });

  it('edits a draft: limits out of order and a duplicate rule are refused with the path of each', async () => {
    const draft = await request(t.http)
      .post('/api/library/versions')
      .set(as(tokens.pharmacist))
      .send({ wardId: 4, note: 'Edit test' })
      .expect(201);
    const rule = { drugId: 1, concentrationPerMl: 1, doseUnit: 'mg', perKg: false, limits: { demandDose: { softMax: 2, hardMax: 1 } } };
    const response = await request(t.http)
      .put(`/api/library/versions/${draft.body.id}/rules`)
      .set(as(tokens.pharmacist))
      .send({ rules: [rule, rule] })
      .expect(400);
    expect(response.body.errors.map((e: { field: string }) => e.field).sort()).toEqual([
      'rules.0.limits.demandDose.hardMax',
      'rules.1.concentrationPerMl',
      'rules.1.limits.demandDose.hardMax',
    ]);
    const badTypes = await request(t.http)
      .put(`/api/library/versions/${draft.body.id}/rules`)
      .set(as(tokens.pharmacist))
      .send({ rules: [{ ...rule, concentrationPerMl: -1, limits: { demandDose: { softMax: 'two' }, madeUp: {} } }] })
      .expect(400);
    expect(badTypes.body.errors.map((e: { field: string }) => e.field).sort()).toEqual([
      'rules.0.concentrationPerMl',
      'rules.0.limits.demandDose.softMax',
      'rules.0.limits.madeUp',
    ]);
    const unchanged = await request(t.http).get(`/api/library/versions/${draft.body.id}`).set(as(tokens.pharmacist));
    expect(unchanged.body.ruleCount).toBe(3);
    await request(t.http).delete(`/api/library/versions/${draft.body.id}`).set(as(tokens.pharmacist)).expect(204);
    await request(t.http).get(`/api/library/versions/${draft.body.id}`).set(as(tokens.pharmacist)).expect(404);
  });
});
