import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PATIENTS } from '../src/database/seed/demo-data.js';
import { createTestApp, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

type Role = keyof typeof DEMO_USER_BY_ROLE;
const ROLES = Object.keys(DEMO_USER_BY_ROLE) as Role[];
const READ_ROUTES = ['/api/wards', '/api/patients', '/api/patients?wardId=1', '/api/patients/1', '/api/drugs', '/api/auth/me'];

describe('read routes', () => {
  let t: TestApp;
  const tokens = {} as Record<Role, string>;
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });

  beforeAll(async () => {
    t = await createTestApp();
    for (const role of ROLES) tokens[role] = await t.tokenFor(DEMO_USER_BY_ROLE[role]);
  });
  afterAll(() => t.close());

  it.each(READ_ROUTES)('%s answers 401 without a token', async (route) => {
    await request(t.http).get(route).expect(401);
  });

  it.each(ROLES.flatMap((role) => READ_ROUTES.map((route) => [role, route] as const)))('as %s, %s answers 200', async (role, route) => {
    await request(t.http).get(route).set(as(role)).expect(200);
  });

  it('lists the four demo wards', async () => {
    const response = await request(t.http).get('/api/wards').set(as('nurse')).expect(200);
    expect(response.body.map((ward: { name: string }) => ward.name)).toEqual(['Cedar', 'Harbour', 'Summit', 'Wren']);
    expect(response.body.find((ward: { name: string }) => ward.name === 'Wren').weightBasedDosing).toBe(true);
    // The population is the ward's own fact: Wren is the children's ward, the others adult.
    const populations = Object.fromEntries(response.body.map((ward: { name: string; population: string }) => [ward.name, ward.population]));
    expect(populations).toEqual({ Cedar: 'adult', Harbour: 'adult', Summit: 'adult', Wren: 'paediatric' });
  });

  it('lists patients, and filters them by ward', async () => {
    const all = await request(t.http).get('/api/patients').set(as('nurse')).expect(200);
    expect(all.body).toHaveLength(DEMO_PATIENTS.length);
    const harbour = await request(t.http).get('/api/patients?wardId=1').set(as('nurse')).expect(200);
    expect(harbour.body.length).toBeGreaterThan(0);
    expect(
      harbour.body.every((patient: { wardId: number; wardName: string }) => patient.wardId === 1 && patient.wardName === 'Harbour'),
    ).toBe(true);
  });

  it('answers a bad ward filter with 400 naming wardId', async () => {
    const response = await request(t.http).get('/api/patients?wardId=abc').set(as('nurse')).expect(400);
    expect(response.body.errors[0].field).toBe('wardId');
  });

  it('shows one patient with the fields the bedside needs, and 404 for an unknown one', async () => {
    const response = await request(t.http).get('/api/patients/1').set(as('prescriber')).expect(200);
    expect(response.body).toMatchObject({
      id: 1,
      mrn: expect.stringMatching(/^KB\d{6}$/),
      dateOfBirth: expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/),
      wardName: expect.any(String),
      bed: expect.any(String),
      opioidTolerant: expect.any(Boolean),
    });
    await request(t.http).get('/api/patients/9999').set(as('prescriber')).expect(404);
  });

  it('lists the drugs with their dosing units', async () => {
    const response = await request(t.http).get('/api/drugs').set(as('pharmacist')).expect(200);
    expect(response.body).toEqual([
      { id: expect.any(Number), genericName: 'fentanyl', doseUnit: 'mcg' },
      { id: expect.any(Number), genericName: 'hydromorphone', doseUnit: 'mg' },
      { id: expect.any(Number), genericName: 'morphine', doseUnit: 'mg' },
    ]);
  });

  it('answers 404 with our error shape for an unknown API path', async () => {
    const response = await request(t.http).get('/api/no-such-thing').set(as('nurse')).expect(404);
    expect(response.body.statusCode).toBe(404);
  });
});
