import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { BolusRequest, CreateObservationRequest, CreateOrderRequest, CreateReleaseRequest } from '@lockstep/shared';

// The writes go through apiRequest; what each sends is what the server sees.
const apiRequest = vi.hoisted(() => vi.fn(async () => ({})));
vi.mock('@/lib/api-client', () => ({ apiRequest }));

const { giveBolus } = await import('./give-bolus');
const { createOrder } = await import('./create-order');
const { reviseOrder } = await import('./revise-order');
const { createRelease } = await import('./create-release');
const { startFirstCheck } = await import('./start-first-check');
const { recordObservation } = await import('./record-observation');
const { verifyOrder } = await import('./verify-order');
const { cancelOrder } = await import('./cancel-order');
const { acknowledgeFlag } = await import('./acknowledge-flag');

const KEY = '3f2b8c1e-9d4a-4e7b-8a6c-1f0e2d3c4b5a';

/** The options of the last apiRequest call: path, method, body and headers. */
function lastCall() {
  const [path, options] = apiRequest.mock.lastCall as unknown as [
    string,
    { method: string; body: unknown; headers?: Record<string, string> },
  ];
  return { path, ...options };
}

describe('create writes send their Idempotency-Key', () => {
  beforeEach(() => apiRequest.mockClear());

  it('a clinician bolus sends the key with the request body, signed', async () => {
    const request = { amount: 1, reason: 'breakthrough pain', witness: { username: 'nurse2', password: 'pw' } } as BolusRequest;
    await giveBolus(7, { request, idempotencyKey: KEY });
    const call = lastCall();
    expect(call.path).toBe('/orders/7/boluses');
    expect(call.method).toBe('POST');
    expect(call.body).toBe(request);
    expect(call.headers).toEqual({ 'Idempotency-Key': KEY });
  });

  it('a retry with the same key sends the same key (the server records one bolus)', async () => {
    const request = { amount: 1, reason: 'breakthrough pain', witness: { username: 'nurse2', password: 'pw' } } as BolusRequest;
    await giveBolus(7, { request, idempotencyKey: KEY });
    await giveBolus(7, { request, idempotencyKey: KEY });
    const sent = apiRequest.mock.calls.map((call) => (call as unknown as [string, { headers: Record<string, string> }])[1].headers);
    expect(sent).toEqual([{ 'Idempotency-Key': KEY }, { 'Idempotency-Key': KEY }]);
  });

  it('order create and revise, syringe release, first check and observation send it too', async () => {
    const order = { patientId: 1 } as CreateOrderRequest;
    await createOrder({ request: order, idempotencyKey: KEY });
    expect(lastCall()).toMatchObject({ path: '/orders', body: order, headers: { 'Idempotency-Key': KEY } });
    await reviseOrder({ orderId: 3, request: order, idempotencyKey: KEY });
    expect(lastCall()).toMatchObject({ path: '/orders/3/revise', headers: { 'Idempotency-Key': KEY } });
    await createRelease({ orderId: 3, request: {} as CreateReleaseRequest, idempotencyKey: KEY });
    expect(lastCall()).toMatchObject({ path: '/orders/3/releases', headers: { 'Idempotency-Key': KEY } });
    await startFirstCheck(3, { request: { releaseCode: 'R1' } as never, idempotencyKey: KEY });
    expect(lastCall()).toMatchObject({
      path: '/orders/3/bedside-checks',
      body: { releaseCode: 'R1' },
      headers: { 'Idempotency-Key': KEY },
    });
    await recordObservation({ orderId: 3, observation: {} as CreateObservationRequest, idempotencyKey: KEY });
    expect(lastCall()).toMatchObject({ path: '/orders/3/observations', headers: { 'Idempotency-Key': KEY } });
  });

  it('pharmacy verify, cancel and a flag acknowledgement send it, and the key is not in the body', async () => {
    await verifyOrder({ orderId: 3, password: 'pw', idempotencyKey: KEY });
    expect(lastCall()).toMatchObject({
      path: '/orders/3/verify',
      body: { signature: { password: 'pw' } },
      headers: { 'Idempotency-Key': KEY },
    });
    await cancelOrder({ orderId: 3, reason: 'patient moved to theatre', idempotencyKey: KEY });
    expect(lastCall()).toMatchObject({ path: '/orders/3/cancel', headers: { 'Idempotency-Key': KEY } });
    expect(lastCall().body).toEqual({ reason: 'patient moved to theatre' });
    await acknowledgeFlag({ orderId: 3, flagId: 5, note: 'reviewed by doctor', idempotencyKey: KEY });
    expect(lastCall()).toMatchObject({
      path: '/flags/5/acknowledge',
      body: { note: 'reviewed by doctor' },
      headers: { 'Idempotency-Key': KEY },
    });
  });
});
