import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

type Role = keyof typeof DEMO_USER_BY_ROLE;
const NON_ADMIN_ROLES: Role[] = ['prescriber', 'pharmacist', 'nurse', 'charge_nurse'];

describe('user management (admin only)', () => {
  let t: TestApp;
  const tokens = {} as Record<Role, string>;
  const asAdmin = () => ({ Authorization: `Bearer ${tokens.admin}` });

  beforeAll(async () => {
    t = await createTestApp();
    for (const [role, username] of Object.entries(DEMO_USER_BY_ROLE)) tokens[role as Role] = await t.tokenFor(username);
  });
  afterAll(() => t.close());

  describe.each(NON_ADMIN_ROLES)('as %s', (role) => {
    it('gets 403 on every user route', async () => {
      const auth = { Authorization: `Bearer ${tokens[role]}` };
      await request(t.http).get('/api/users').set(auth).expect(403);
      await request(t.http)
        .post('/api/users')
        .set(auth)
        .send({ username: 'sneaky', displayName: 'Sneaky', role: 'admin', wardIds: [], password: 'a-long-enough-password' })
        .expect(403);
      await request(t.http).patch('/api/users/1').set(auth).send({ role: 'admin' }).expect(403);
    });
  });

  it('gets 401 on every user route without a token', async () => {
    await request(t.http).get('/api/users').expect(401);
    await request(t.http).post('/api/users').send({}).expect(401);
    await request(t.http).patch('/api/users/1').send({}).expect(401);
  });

  it('lists users without any password hash', async () => {
    const response = await request(t.http).get('/api/users').set(asAdmin()).expect(200);
    expect(response.body).toHaveLength(7);
    expect(Object.keys(response.body[0]).sort()).toEqual(['active', 'createdAt', 'displayName', 'id', 'role', 'username', 'wardIds']);
    expect(JSON.stringify(response.body)).not.toMatch(/\$2[aby]\$|passwordHash/);
  });

  it('creates a user who can then sign in', async () => {
    const wards = await request(t.http).get('/api/wards').set(asAdmin()).expect(200);
    const created = await request(t.http)
      .post('/api/users')
      .set(asAdmin())
      .send({
        username: 'ari.nakamura',
        displayName: 'Ari Nakamura',
        role: 'nurse',
        wardIds: [wards.body[0].id],
        password: 'correct-horse-battery',
      })
      .expect(201);
    expect(created.body).toMatchObject({ username: 'ari.nakamura', role: 'nurse', active: true, wardIds: [wards.body[0].id] });
    expect(created.body).not.toHaveProperty('passwordHash');
    await t.tokenFor('ari.nakamura', 'correct-horse-battery');
  });

  it('refuses a short password, a bad role and a missing name with 400 naming each field, and writes nothing', async () => {
    const before = await request(t.http).get('/api/users').set(asAdmin());
    const response = await request(t.http)
      .post('/api/users')
      .set(asAdmin())
      .send({ username: 'short.pw', role: 'surgeon', wardIds: [], password: 'short' })
      .expect(400);
    const fields = response.body.errors.map((error: { field: string }) => error.field).sort();
    expect(fields).toEqual(['displayName', 'password', 'role']);
    expect(response.body.errors.find((e: { field: string }) => e.field === 'password').message).toBe(
      'Password must be at least 12 characters',
    );
    const after = await request(t.http).get('/api/users').set(asAdmin());
    expect(after.body).toHaveLength(before.body.length);
  });

  it('answers a taken username with 409 naming the field', async () => {
    const response = await request(t.http)
      .post('/api/users')
      .set(asAdmin())
      .send({ username: 'kai.mendes', displayName: 'Another Kai', role: 'nurse', wardIds: [], password: 'another-long-password' })
      .expect(409);
    expect(response.body.errors).toEqual([{ field: 'username', message: 'This username is already taken' }]);
  });

  it('refuses an unknown ward with 400 and writes nothing', async () => {
    const response = await request(t.http)
      .post('/api/users')
      .set(asAdmin())
      .send({ username: 'ghost.ward', displayName: 'Ghost', role: 'nurse', wardIds: [9999], password: 'a-long-enough-password' })
      .expect(400);
    expect(response.body.errors[0].field).toBe('wardIds');
    const users = await request(t.http).get('/api/users').set(asAdmin());
    expect(users.body.map((user: { username: string }) => user.username)).not.toContain('ghost.ward');
  });

  it('changes role and wards, and resets a password', async () => {
    const users = await request(t.http).get('/api/users').set(asAdmin());
    const rosa = users.body.find((user: { username: string }) => user.username === 'rosa.adeyemi');
    const updated = await request(t.http)
      .patch(`/api/users/${rosa.id}`)
      .set(asAdmin())
      .send({ role: 'charge_nurse', wardIds: [1, 2, 3], password: 'a-brand-new-password' })
      .expect(200);
    expect(updated.body).toMatchObject({ role: 'charge_nurse', wardIds: [1, 2, 3] });
    const login = await request(t.http)
      .post('/api/auth/login')
      .send({ username: 'rosa.adeyemi', password: 'a-brand-new-password' })
      .expect(200);
    expect(login.body.user.role).toBe('charge_nurse');
  });

  it('refuses a null role or an unknown field instead of blanking the user', async () => {
    const response = await request(t.http).patch('/api/users/4').set(asAdmin()).send({ role: null, username: 'renamed' }).expect(400);
    const fields = response.body.errors.map((error: { field: string }) => error.field).sort();
    expect(fields).toEqual(['role', 'username']);
  });

  it('answers 404 for an unknown user and 400 for a malformed id', async () => {
    await request(t.http).patch('/api/users/99999').set(asAdmin()).send({ active: false }).expect(404);
    const bad = await request(t.http).patch('/api/users/abc').set(asAdmin()).send({ active: false }).expect(400);
    expect(bad.body.errors).toEqual([{ field: 'id', message: 'id must be a positive whole number' }]);
  });
});
