import { describe, expect, it, vi } from 'vitest';
import { revokeToken } from './revoke-token';

describe('revokeToken', () => {
  it('asks the server to end the session, and lets the request outlive the page', () => {
    const fetchFn = vi.fn<typeof fetch>().mockResolvedValue(new Response(null, { status: 204 }));
    revokeToken('token-1', fetchFn);
    expect(fetchFn).toHaveBeenCalledWith('/api/auth/logout', {
      method: 'POST',
      headers: { Authorization: 'Bearer token-1' },
      keepalive: true,
    });
  });

  it('never throws when the server cannot be reached: the tab signs out regardless', async () => {
    const fetchFn = vi.fn<typeof fetch>().mockRejectedValue(new TypeError('offline'));
    expect(() => revokeToken('token-1', fetchFn)).not.toThrow();
    await Promise.resolve();
  });
});
