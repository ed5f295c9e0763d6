import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { CreateSignoffRequest, CreateUserRequest } from '@lockstep/shared';

// The writes go through apiRequest; what each sends is what the server sees.
const apiRequest = vi.hoisted(() => vi.fn(async () => ({})));
vi.mock('@/lib/api-client', () => ({ apiRequest }));

const { approveVersion } = await import('./approve-version');
const { createDraft } = await import('./create-draft');
const { discardVersion } = await import('./discard-version');
const { createUser } = await import('@/api/users/create-user');
const { signOff } = await import('@/features/handover/api/sign-off');

const KEY = '0b7e6d5c-4a3b-4c2d-9e1f-a0b1c2d3e4f5';

function lastCall() {
  const [path, options] = apiRequest.mock.lastCall as unknown as [
    string,
    { method: string; body: unknown; headers?: Record<string, string> },
  ];
  return { path, ...options };
}

describe('library, user and handover writes send their Idempotency-Key', () => {
  beforeEach(() => apiRequest.mockClear());

  it('library approve, new draft and discard send it', async () => {
    await approveVersion({ versionId: 4, submittedAt: '2026-01-01T00:00:00.000Z', password: 'pw', idempotencyKey: KEY });
    expect(lastCall()).toMatchObject({ path: '/library/versions/4/approve', method: 'POST', headers: { 'Idempotency-Key': KEY } });
    await createDraft({ request: { wardId: 2 }, idempotencyKey: KEY });
    expect(lastCall()).toMatchObject({ path: '/library/versions', body: { wardId: 2 }, headers: { 'Idempotency-Key': KEY } });
    await discardVersion({ version: { id: 4, wardId: 2 }, idempotencyKey: KEY });
    expect(lastCall()).toMatchObject({ path: '/library/versions/4', method: 'DELETE', headers: { 'Idempotency-Key': KEY } });
  });

  it('a new user sends it beside the request body', async () => {
    const input = { username: 'new.nurse' } as CreateUserRequest;
    await createUser({ input, idempotencyKey: KEY });
    expect(lastCall()).toMatchObject({ path: '/users', body: input, headers: { 'Idempotency-Key': KEY } });
  });

  it('a handover sign-off sends the key as a header, not in the body', async () => {
    const request = { orderId: 9, role: 'outgoing' } as CreateSignoffRequest;
    await signOff(1, { ...request, idempotencyKey: KEY });
    const call = lastCall();
    expect(call).toMatchObject({ path: '/wards/1/handover/signoffs', headers: { 'Idempotency-Key': KEY } });
    expect(call.body).toEqual(request);
  });
});
