import type { OpenAPIObject, OperationObject, ResponseObject } from '@nestjs/swagger';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '@lockstep/shared';
import { answerChecker, bodySchema } from './support/answer-checker.js';
import { createTestApp, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

// Every answer in the API document has a schema (written from the shared zod schemas), and what
// the running app answers on each read route fits it.

/** Answers that are not JSON, or are documented by their own module: a 204 has no body. */
const NOT_JSON = new Set(['GET /api/library/versions/{id}/export', 'GET /api/wards/{wardId}/handover/stream']);

/** A URL that answers 200 on the demo data for each read route (path parameters filled in). */
const SAMPLE_URLS: Record<string, string> = {
  '/api/wards/{wardId}/policy': '/api/wards/1/policy',
  '/api/patients/{id}': '/api/patients/1',
  '/api/library/versions/{id}': '/api/library/versions/5',
  '/api/library/versions/{id}/diff': '/api/library/versions/5/diff',
  '/api/library/versions/{id}/affected-orders': '/api/library/versions/5/affected-orders',
  '/api/wards/{wardId}/library': '/api/wards/3/library',
  '/api/orders/{id}': '/api/orders/4',
  '/api/orders/{orderId}/observations': '/api/orders/4/observations',
  '/api/orders/{orderId}/usage': '/api/orders/4/usage?hours=24',
  '/api/orders/{orderId}/pause': '/api/orders/4/pause',
  '/api/wards/{wardId}/handover': '/api/wards/1/handover',
  '/api/wards/{wardId}/handover/signoffs': '/api/wards/1/handover/signoffs',
  '/api/orders/{id}/audit': '/api/orders/4/audit',
  '/api/fhir/MedicationRequest/{orderId}': '/api/fhir/MedicationRequest/4',
  '/api/fhir/Patient/{id}/pca-pca-bundle': '/api/fhir/Patient/2/pca-bundle',
  '/api/fhir/Patient/{id}/pca-bundle': '/api/fhir/Patient/2/pca-bundle',
  '/api/library/versions': '/api/library/versions?wardId=1',
};

type Operation = { key: string; path: string; operation: OperationObject & { 'x-roles'?: Role[]; 'x-public'?: boolean } };

describe('the answers the API document describes', () => {
  let t: TestApp;
  let document: OpenAPIObject;
  let operations: Operation[];
  const tokens = new Map<Role, string>();

  beforeAll(async () => {
    t = await createTestApp();
    document = (await request(t.http).get('/api/docs-json').expect(200)).body as OpenAPIObject;
    operations = Object.entries(document.paths).flatMap(([path, item]) =>
      (['get', 'post', 'put', 'patch', 'delete'] as const)
        .filter((method) => item[method] && !path.startsWith('/api/docs'))
        .map((method) => ({ key: `${method.toUpperCase()} ${path}`, path, operation: item[method] as Operation['operation'] })),
    );
    for (const role of Object.keys(DEMO_USER_BY_ROLE) as Role[]) tokens.set(role, await t.tokenFor(DEMO_USER_BY_ROLE[role]));
  });
  afterAll(() => t.close());

  const successes = (operation: OperationObject) =>
    Object.entries(operation.responses).filter(([status]) => status.startsWith('2') && status !== '204') as [string, ResponseObject][];

  it('gives every success answer with a body a schema', () => {
    const missing = operations.flatMap(({ key, operation }) =>
      NOT_JSON.has(key)
        ? []
        : successes(operation)
            .filter(([, response]) => !bodySchema(response))
            .map(([status]) => `${key} ${status}`),
    );
    expect(missing, 'success answers without a schema').toEqual([]);
  });

  it('answers every read route with JSON that fits its documented schema', async () => {
    const { check } = await answerChecker(t.http);
    const reads = operations.filter(({ key }) => key.startsWith('GET ') && !NOT_JSON.has(key));
    let checked = 0;
    for (const { key, path, operation } of reads) {
      const url = SAMPLE_URLS[path] ?? path;
      expect(url, `${key}: no sample URL for a path with parameters`).not.toMatch(/\{/);
      const role = operation['x-public']
        ? null
        : ((operation['x-roles']?.includes('admin') ? 'admin' : operation['x-roles']?.[0]) ?? 'admin');
      const call = request(t.http).get(url);
      const response = await (role ? call.set({ Authorization: `Bearer ${tokens.get(role)}` }) : call);
      expect(response.status, `${key} as ${role}: ${JSON.stringify(response.body).slice(0, 200)}`).toBe(200);
      expect(check('get', path, 200, response.body)).toBeNull();
      checked++;
    }
    console.log(`Validated the live answers of ${checked} read routes against the API document`);
    expect(checked).toBeGreaterThanOrEqual(25);
  });
});
