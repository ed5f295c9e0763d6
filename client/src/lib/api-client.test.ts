import { describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { createApiClient } from './api-client';
import { ApiRequestError, toApiRequestError } from './api-error';

function jsonResponse(status: number, body: unknown): Response {
  return new Response(body === undefined ? '' : JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json' },
  });
}

function setup(response: Response | Error, token: string | null = 'token-123') {
  const fetchFn = vi.fn<typeof fetch>(async () => {
    if (response instanceof Error) throw response;
    return response;
  });
  const onUnauthorized = vi.fn();
  const request = createApiClient({ baseUrl: '/api', getToken: () => token, onUnauthorized, fetchFn });
  return { request, fetchFn, onUnauthorized };
}

describe('api client', () => {
  it('sends the bearer token, JSON body and query string', async () => {
    const { request, fetchFn } = setup(jsonResponse(200, { ok: true }));
    await request('/patients', { method: 'POST', body: { a: 1 }, params: { wardId: 2, q: undefined } });
    const [url, init] = fetchFn.mock.calls[0];
    expect(url).toBe('/api/patients?wardId=2');
    expect(init?.method).toBe('POST');
    expect(init?.body).toBe('{"a":1}');
    expect(init?.headers).toMatchObject({ Authorization: 'Bearer token-123', 'Content-Type': 'application/json' });
  });

  it('sends no token for anonymous calls', async () => {
    const { request, fetchFn } = setup(jsonResponse(200, {}));
    await request('/auth/login', { method: 'POST', body: {}, anonymous: true });
    expect(fetchFn.mock.calls[0][1]?.headers).not.toHaveProperty('Authorization');
  });

  it('checks the answer against a schema and drops stray fields', async () => {
    const { request } = setup(jsonResponse(200, { id: 1, extra: 'x' }));
    await expect(request('/x', { schema: z.object({ id: z.number() }) })).resolves.toEqual({ id: 1 });
  });

  it('turns an unexpected answer shape into a readable error', async () => {
    vi.spyOn(console, 'error').mockImplementation(() => undefined);
    const { request } = setup(jsonResponse(200, { id: 'one' }));
    await expect(request('/x', { schema: z.object({ id: z.number() }) })).rejects.toMatchObject({
      status: 0,
      message: 'The server sent an answer Lockstep could not read.',
    });
  });

  it('throws a typed error with the field errors of a 400', async () => {
    const { request } = setup(
      jsonResponse(400, {
        statusCode: 400,
        message: 'Check the highlighted fields',
        errors: [{ field: 'username', message: 'Enter your username' }],
      }),
    );
    const error = await request('/users', { method: 'POST', body: {} }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiRequestError);
    expect(error).toMatchObject({
      status: 400,
      message: 'Check the highlighted fields',
      errors: [{ field: 'username', message: 'Enter your username' }],
    });
  });

  it('ends the session on a 401 from an ordinary call', async () => {
    const { request, onUnauthorized } = setup(jsonResponse(401, { statusCode: 401, message: 'Unauthorized' }));
    await expect(request('/patients')).rejects.toMatchObject({ status: 401 });
    expect(onUnauthorized).toHaveBeenCalledOnce();
  });

  it('does not end the session on a 401 from sign-in itself', async () => {
    const { request, onUnauthorized } = setup(jsonResponse(401, { statusCode: 401, message: 'Username or password is incorrect' }));
    await expect(request('/auth/login', { method: 'POST', anonymous: true })).rejects.toMatchObject({
      status: 401,
      message: 'Username or password is incorrect',
    });
    expect(onUnauthorized).not.toHaveBeenCalled();
  });

  it('keeps the session on a 401 for a wrong signature password, not for an expired token', async () => {
    const wrongPassword = {
      statusCode: 401,
      message: 'The password you signed with is not correct',
      errors: [{ field: 'signature.password', message: 'The password you signed with is not correct' }],
    };
    const signed = setup(jsonResponse(401, wrongPassword));
    await expect(signed.request('/library/versions/2/approve', { method: 'POST', body: {}, signed: true })).rejects.toMatchObject({
      status: 401,
      errors: [{ field: 'signature.password' }],
    });
    expect(signed.onUnauthorized).not.toHaveBeenCalled();

    // A colleague (second nurse, witness) signing on the same screen with a wrong password.
    for (const field of ['password', 'witness.password']) {
      const colleague = setup(
        jsonResponse(401, {
          statusCode: 401,
          message: 'The second person’s username or password is incorrect',
          errors: [{ field, message: 'Username or password is incorrect' }],
        }),
      );
      await expect(colleague.request('/orders/2/boluses', { method: 'POST', body: {}, signed: true })).rejects.toMatchObject({
        status: 401,
        errors: [{ field }],
      });
      expect(colleague.onUnauthorized).not.toHaveBeenCalled();
    }

    const expired = setup(jsonResponse(401, { statusCode: 401, message: 'Unauthorized' }));
    await expect(expired.request('/library/versions/2/approve', { method: 'POST', body: {}, signed: true })).rejects.toMatchObject({
      status: 401,
    });
    expect(expired.onUnauthorized).toHaveBeenCalledOnce();
  });

  it('reports a network failure as status 0 with a plain message', async () => {
    const { request } = setup(new TypeError('Failed to fetch'));
    await expect(request('/wards')).rejects.toMatchObject({ status: 0, message: expect.stringContaining('cannot reach the server') });
  });

  it('returns null for an empty success answer', async () => {
    const { request } = setup(new Response(null, { status: 204 }));
    await expect(request('/x', { method: 'DELETE' })).resolves.toBeNull();
  });
});

describe('toApiRequestError', () => {
  it('reads the API error shape', () => {
    const error = toApiRequestError(409, { statusCode: 409, message: 'Username is already taken' });
    expect(error).toMatchObject({ status: 409, message: 'Username is already taken', errors: [] });
  });

  it("joins Nest's list-of-messages form", () => {
    expect(toApiRequestError(400, { statusCode: 400, message: ['a is wrong', 'b is wrong'] }).message).toBe('a is wrong. b is wrong');
  });

  it('falls back to a plain message for bodies it cannot read', () => {
    expect(toApiRequestError(502, null).message).toMatch(/could not complete/);
    expect(toApiRequestError(403, '<html>').message).toBe('Your role may not do this.');
    expect(toApiRequestError(418, {}).message).toBe('The request failed (status 418).');
  });
});
