import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { appRoutes, routeKey } from './support/app-routes.js';
import { type HttpClient, listen } from './support/http-client.js';
import { createTestApp, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

type Role = keyof typeof DEMO_USER_BY_ROLE;
type Caller = Role | 'anonymous';
const ROLES = Object.keys(DEMO_USER_BY_ROLE) as Role[];
const CALLERS: Caller[] = [...ROLES, 'anonymous'];

/**
 * Who may call a route: `public` (no token needed), `signed-in` (any role), or the roles listed.
 * `ok` is what an allowed caller gets; everyone else gets 403, and anonymous callers 401.
 */
type Access = 'public' | 'signed-in' | Role[];
type MatrixRow = {
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** The route as its controller declares it; parameter names do not matter. */
  path: string;
  /** A real request: demo ids (see database/seed) so that an allowed reader gets 200. */
  url: string;
  access: Access;
  ok: number;
  /** Write routes send this, invalid for the route's DTO, so an allowed caller gets 400 and nothing is written. */
  body?: object;
  /** Server-sent events: check the status and headers, then hang up. */
  stream?: true;
  /** Ends the caller's session: sent with a fresh sign-in of their own, so the shared tokens live on. */
  endsSession?: true;
};

// Demo data: wards 1–4 (Harbour, Cedar, Wren, Summit), patients 1–12, drugs 1–3; library versions
// 1–4 active (one per ward) and 5 awaiting approval (Harbour); orders 1 awaiting verification,
// 2 verified, 3 returned. No write below changes anything: the guards pass an allowed caller to
// the validation pipe, which refuses the body; the body-less writes hit a version in the wrong
// state (409) or an unlock with nothing to unlock (404). `{}` is a valid body where every field is
// optional, so those routes get an unknown field instead.
const EMPTY = {};
const UNKNOWN_FIELD = { notAField: true };
const NURSES: Role[] = ['nurse', 'charge_nurse'];
const CLINICAL: Role[] = ['nurse', 'charge_nurse', 'prescriber', 'pharmacist'];

export const ACCESS_MATRIX: MatrixRow[] = [
  { method: 'GET', path: '/api/health', url: '/api/health', access: 'public', ok: 200 },
  { method: 'POST', path: '/api/auth/login', url: '/api/auth/login', access: 'public', ok: 400, body: EMPTY },
  { method: 'GET', path: '/api/auth/me', url: '/api/auth/me', access: 'signed-in', ok: 200 },
  { method: 'POST', path: '/api/auth/logout', url: '/api/auth/logout', access: 'signed-in', ok: 204, endsSession: true },
  { method: 'GET', path: '/api/auth/demo-accounts', url: '/api/auth/demo-accounts', access: 'public', ok: 200 },
  { method: 'GET', path: '/api/auth/lockouts', url: '/api/auth/lockouts', access: ['admin'], ok: 200 },
  // Nothing is locked in a fresh app, so an admin's unlock finds nothing (404) and changes nothing.
  {
    method: 'DELETE',
    path: '/api/auth/lockouts/usernames/:username',
    url: '/api/auth/lockouts/usernames/kai.mendes',
    access: ['admin'],
    ok: 404,
  },
  {
    method: 'DELETE',
    path: '/api/auth/lockouts/addresses/:address',
    url: '/api/auth/lockouts/addresses/192.0.2.1',
    access: ['admin'],
    ok: 404,
  },

  { method: 'GET', path: '/api/users', url: '/api/users', access: ['admin'], ok: 200 },
  { method: 'POST', path: '/api/users', url: '/api/users', access: ['admin'], ok: 400, body: EMPTY },
  { method: 'PATCH', path: '/api/users/:id', url: '/api/users/4', access: ['admin'], ok: 400, body: UNKNOWN_FIELD },
  { method: 'GET', path: '/api/dev/mailbox', url: '/api/dev/mailbox', access: ['admin'], ok: 200 },

  { method: 'GET', path: '/api/wards', url: '/api/wards', access: 'signed-in', ok: 200 },
  { method: 'GET', path: '/api/wards/:wardId/policy', url: '/api/wards/1/policy', access: 'signed-in', ok: 200 },
  { method: 'PATCH', path: '/api/wards/:wardId/policy', url: '/api/wards/1/policy', access: ['admin'], ok: 400, body: UNKNOWN_FIELD },
  // No change exists in the demo: the readers get an empty list; the writes are refused at the body.
  {
    method: 'GET',
    path: '/api/wards/policy-changes',
    url: '/api/wards/policy-changes?status=pending',
    access: ['admin', 'charge_nurse', 'pharmacist'],
    ok: 200,
  },
  {
    method: 'POST',
    path: '/api/wards/:wardId/policy-changes',
    url: '/api/wards/1/policy-changes',
    access: ['admin'],
    ok: 400,
    body: EMPTY,
  },
  {
    method: 'POST',
    path: '/api/wards/policy-changes/:changeId/sign-off',
    url: '/api/wards/policy-changes/1/sign-off',
    access: ['charge_nurse', 'pharmacist'],
    ok: 400,
    body: EMPTY,
  },
  {
    method: 'POST',
    path: '/api/wards/policy-changes/:changeId/decline',
    url: '/api/wards/policy-changes/1/decline',
    access: ['charge_nurse', 'pharmacist'],
    ok: 400,
    body: EMPTY,
  },
  { method: 'GET', path: '/api/patients', url: '/api/patients?wardId=1', access: 'signed-in', ok: 200 },
  { method: 'GET', path: '/api/patients/:id', url: '/api/patients/1', access: 'signed-in', ok: 200 },
  // Patient 2 (VALDIVIA) has a recorded allergy, so "no known allergies" is refused (409); no patient has allergy entry 999.
  {
    method: 'POST',
    path: '/api/patients/:id/allergies',
    url: '/api/patients/1/allergies',
    access: ['prescriber', 'pharmacist'],
    ok: 400,
    body: UNKNOWN_FIELD,
  },
  {
    method: 'DELETE',
    path: '/api/patients/:id/allergies/:allergyId',
    url: '/api/patients/1/allergies/999',
    access: ['prescriber', 'pharmacist'],
    ok: 404,
  },
  {
    method: 'POST',
    path: '/api/patients/:id/no-known-allergies',
    url: '/api/patients/2/no-known-allergies',
    access: ['prescriber', 'pharmacist'],
    ok: 409,
  },
  {
    method: 'PUT',
    path: '/api/patients/:id/opioid-tolerance',
    url: '/api/patients/1/opioid-tolerance',
    access: ['prescriber', 'pharmacist'],
    ok: 400,
    body: UNKNOWN_FIELD,
  },
  {
    method: 'PUT',
    path: '/api/patients/:id/spo2-scale',
    url: '/api/patients/1/spo2-scale',
    access: ['prescriber'],
    ok: 400,
    body: UNKNOWN_FIELD,
  },
  {
    method: 'POST',
    path: '/api/patients/:id/weights',
    url: '/api/patients/1/weights',
    access: [...NURSES, 'prescriber'],
    ok: 400,
    body: UNKNOWN_FIELD,
  },
  { method: 'GET', path: '/api/drugs', url: '/api/drugs', access: 'signed-in', ok: 200 },
  { method: 'GET', path: '/api/equianalgesic-factors', url: '/api/equianalgesic-factors', access: 'signed-in', ok: 200 },
  {
    method: 'PUT',
    path: '/api/equianalgesic-factors/:drugId/:route',
    url: '/api/equianalgesic-factors/2/parenteral',
    access: ['pharmacist'],
    ok: 400,
    body: EMPTY,
  },

  { method: 'GET', path: '/api/wards/:wardId/library', url: '/api/wards/2/library', access: 'signed-in', ok: 200 },
  { method: 'GET', path: '/api/library/versions', url: '/api/library/versions?wardId=1', access: 'signed-in', ok: 200 },
  { method: 'GET', path: '/api/library/versions/:id', url: '/api/library/versions/1', access: 'signed-in', ok: 200 },
  { method: 'GET', path: '/api/library/versions/:id/diff', url: '/api/library/versions/5/diff', access: 'signed-in', ok: 200 },
  { method: 'GET', path: '/api/library/versions/:id/export', url: '/api/library/versions/1/export', access: 'signed-in', ok: 200 },
  { method: 'POST', path: '/api/library/versions', url: '/api/library/versions', access: ['pharmacist'], ok: 400, body: EMPTY },
  {
    method: 'PUT',
    path: '/api/library/versions/:id/rules',
    url: '/api/library/versions/5/rules',
    access: ['pharmacist'],
    ok: 400,
    body: EMPTY,
  },
  {
    method: 'POST',
    path: '/api/library/versions/:id/submit',
    url: '/api/library/versions/1/submit',
    access: ['pharmacist'],
    ok: 400,
    body: UNKNOWN_FIELD,
  },
  { method: 'POST', path: '/api/library/versions/:id/withdraw', url: '/api/library/versions/1/withdraw', access: ['pharmacist'], ok: 409 },
  {
    method: 'POST',
    path: '/api/library/versions/:id/approve',
    url: '/api/library/versions/5/approve',
    access: ['pharmacist'],
    ok: 400,
    body: EMPTY,
  },
  {
    method: 'POST',
    path: '/api/library/versions/:id/send-back',
    url: '/api/library/versions/5/send-back',
    access: ['pharmacist'],
    ok: 400,
    body: EMPTY,
  },
  {
    method: 'GET',
    path: '/api/library/versions/:id/affected-orders',
    url: '/api/library/versions/5/affected-orders',
    access: ['pharmacist'],
    ok: 200,
  },
  { method: 'DELETE', path: '/api/library/versions/:id', url: '/api/library/versions/1', access: ['pharmacist'], ok: 409 },
  { method: 'POST', path: '/api/library/import', url: '/api/library/import', access: ['pharmacist'], ok: 400, body: EMPTY },

  { method: 'POST', path: '/api/orders/preview', url: '/api/orders/preview', access: 'signed-in', ok: 400, body: EMPTY },
  { method: 'POST', path: '/api/orders', url: '/api/orders', access: ['prescriber'], ok: 400, body: EMPTY },
  { method: 'GET', path: '/api/orders', url: '/api/orders', access: 'signed-in', ok: 200 },
  { method: 'GET', path: '/api/orders/:id', url: '/api/orders/1', access: 'signed-in', ok: 200 },
  { method: 'POST', path: '/api/orders/:id/revise', url: '/api/orders/3/revise', access: ['prescriber'], ok: 400, body: EMPTY },
  { method: 'POST', path: '/api/orders/:id/cancel', url: '/api/orders/1/cancel', access: ['prescriber'], ok: 400, body: EMPTY },
  { method: 'POST', path: '/api/orders/:id/verify', url: '/api/orders/1/verify', access: ['pharmacist'], ok: 400, body: EMPTY },
  { method: 'POST', path: '/api/orders/:id/return', url: '/api/orders/1/return', access: ['pharmacist'], ok: 400, body: EMPTY },
  { method: 'POST', path: '/api/orders/:id/reject', url: '/api/orders/1/reject', access: ['pharmacist'], ok: 400, body: EMPTY },
  { method: 'GET', path: '/api/orders/:id/audit', url: '/api/orders/1/audit', access: 'signed-in', ok: 200 },
  { method: 'POST', path: '/api/orders/:orderId/releases', url: '/api/orders/2/releases', access: ['pharmacist'], ok: 400, body: EMPTY },

  {
    method: 'POST',
    path: '/api/orders/:orderId/bedside-checks',
    url: '/api/orders/2/bedside-checks',
    access: NURSES,
    ok: 400,
    body: EMPTY,
  },
  {
    method: 'POST',
    path: '/api/orders/:orderId/bedside-checks/:checkId/second',
    url: '/api/orders/2/bedside-checks/1/second',
    access: NURSES,
    ok: 400,
    body: EMPTY,
  },
  { method: 'POST', path: '/api/orders/:orderId/boluses', url: '/api/orders/2/boluses', access: NURSES, ok: 400, body: EMPTY },
  {
    method: 'POST',
    path: '/api/orders/:orderId/syringe-changes',
    url: '/api/orders/2/syringe-changes',
    access: NURSES,
    ok: 400,
    body: EMPTY,
  },
  { method: 'POST', path: '/api/orders/:orderId/discontinue', url: '/api/orders/2/discontinue', access: NURSES, ok: 400, body: EMPTY },
  { method: 'POST', path: '/api/orders/:orderId/naloxone', url: '/api/orders/2/naloxone', access: NURSES, ok: 400, body: EMPTY },
  { method: 'POST', path: '/api/orders/:orderId/pause', url: '/api/orders/2/pause', access: NURSES, ok: 400, body: EMPTY },
  { method: 'POST', path: '/api/orders/:orderId/resume', url: '/api/orders/2/resume', access: NURSES, ok: 400, body: EMPTY },
  { method: 'GET', path: '/api/orders/:orderId/pause', url: '/api/orders/2/pause', access: 'signed-in', ok: 200 },
  { method: 'POST', path: '/api/orders/:orderId/observations', url: '/api/orders/2/observations', access: NURSES, ok: 400, body: EMPTY },
  { method: 'GET', path: '/api/orders/:orderId/observations', url: '/api/orders/2/observations', access: 'signed-in', ok: 200 },
  { method: 'GET', path: '/api/orders/:orderId/usage', url: '/api/orders/2/usage?hours=8', access: 'signed-in', ok: 200 },
  { method: 'POST', path: '/api/flags/:id/acknowledge', url: '/api/flags/1/acknowledge', access: CLINICAL, ok: 400, body: EMPTY },

  { method: 'GET', path: '/api/wards/:wardId/handover', url: '/api/wards/1/handover', access: CLINICAL, ok: 200 },
  {
    method: 'GET',
    path: '/api/wards/:wardId/handover/stream',
    url: '/api/wards/1/handover/stream',
    access: CLINICAL,
    ok: 200,
    stream: true,
  },
  { method: 'GET', path: '/api/wards/:wardId/handover/signoffs', url: '/api/wards/1/handover/signoffs', access: CLINICAL, ok: 200 },
  {
    method: 'POST',
    path: '/api/wards/:wardId/handover/signoffs',
    url: '/api/wards/1/handover/signoffs',
    access: NURSES,
    ok: 400,
    body: EMPTY,
  },

  { method: 'GET', path: '/api/audit', url: '/api/audit', access: ['admin', 'pharmacist'], ok: 200 },
  { method: 'GET', path: '/api/audit/verify', url: '/api/audit/verify', access: ['admin'], ok: 200 },

  {
    method: 'GET',
    path: '/api/fhir/MedicationRequest/:orderId',
    url: '/api/fhir/MedicationRequest/1',
    access: [...CLINICAL, 'admin'],
    ok: 200,
  },
  {
    method: 'GET',
    path: '/api/fhir/Patient/:id/pca-bundle',
    url: '/api/fhir/Patient/1/pca-bundle',
    access: [...CLINICAL, 'admin'],
    ok: 200,
  },

  // The OpenAPI documentation: SwaggerModule's own routes, public (docs/security.md). It registers
  // the UI page under several names, its start script twice, and refuses its LICENSE file (404).
  { method: 'GET', path: '/api/docs', url: '/api/docs', access: 'public', ok: 200 },
  { method: 'GET', path: '/api/docs/', url: '/api/docs/', access: 'public', ok: 200 },
  { method: 'GET', path: '/api/docs/index.html', url: '/api/docs/index.html', access: 'public', ok: 200 },
  { method: 'GET', path: '/api/docs/swagger-ui-init.js', url: '/api/docs/swagger-ui-init.js', access: 'public', ok: 200 },
  { method: 'GET', path: '/api/docs/docs/swagger-ui-init.js', url: '/api/docs/docs/swagger-ui-init.js', access: 'public', ok: 200 },
  { method: 'GET', path: '/api/docs/LICENSE', url: '/api/docs/LICENSE', access: 'public', ok: 404 },
  { method: 'GET', path: '/api/docs-json', url: '/api/docs-json', access: 'public', ok: 200 },
];

function expectedStatus(row: MatrixRow, caller: Caller): number {
  if (row.access === 'public') return row.ok;
  if (caller === 'anonymous') return 401;
  if (row.access === 'signed-in' || row.access.includes(caller)) return row.ok;
  return 403;
}

describe('access matrix: every route × every role and anonymous', () => {
  let t: TestApp;
  let api: HttpClient;
  const tokens = {} as Record<Role, string>;
  let checks = 0;

  beforeAll(async () => {
    t = await createTestApp();
    api = await listen(t);
    // One sign-in per role, reused: sign-in may be rate-limited.
    for (const role of ROLES) tokens[role] = await t.tokenFor(DEMO_USER_BY_ROLE[role]);
  });
  afterAll(async () => {
    console.log(`Access matrix: ${ACCESS_MATRIX.length} routes × ${CALLERS.length} callers = ${checks} checks`);
    await t.close();
  });

  // Only /api: the built client's index.html fallback (when client/dist exists) is not an API route.
  const apiRoutes = () => appRoutes(t.app).filter((key) => key.split(' ')[1].startsWith('/api/'));
  const tableKeys = () => ACCESS_MATRIX.map((row) => routeKey(row.method, row.path));

  it('lists every route the app serves', () => {
    const listed = new Set(tableKeys());
    expect(
      apiRoutes().filter((key) => !listed.has(key)),
      'routes missing from ACCESS_MATRIX',
    ).toEqual([]);
  });

  it('lists no route that the app no longer serves, and each route once', () => {
    const served = new Set(apiRoutes());
    expect(
      tableKeys().filter((key) => !served.has(key)),
      'ACCESS_MATRIX rows for routes that do not exist',
    ).toEqual([]);
    expect(new Set(tableKeys()).size).toBe(ACCESS_MATRIX.length);
  });

  const call = async (row: MatrixRow, caller: Caller): Promise<number> => {
    const token = caller === 'anonymous' ? undefined : row.endsSession ? await t.tokenFor(DEMO_USER_BY_ROLE[caller]) : tokens[caller];
    if (!row.stream) return (await api.call(row.method, row.url, { token, body: row.body })).status;
    const abort = new AbortController();
    const response = await fetch(`${api.baseUrl}${row.url}`, {
      headers: token ? { Authorization: `Bearer ${token}` } : {},
      signal: abort.signal,
    });
    if (response.status === 200) expect(response.headers.get('content-type')).toContain('text/event-stream');
    abort.abort();
    return response.status;
  };

  it.each(ACCESS_MATRIX.map((row) => [`${row.method} ${row.url}`, row] as const))('%s', async (_name, row) => {
    const expected: Record<string, number> = {};
    const actual: Record<string, number> = {};
    for (const caller of CALLERS) {
      expected[caller] = expectedStatus(row, caller);
      actual[caller] = await call(row, caller);
      checks += 1;
    }
    expect(actual).toEqual(expected);
  });

  it('checked every route as every caller', () => {
    expect(checks).toBe(ACCESS_MATRIX.length * CALLERS.length);
  });
});
