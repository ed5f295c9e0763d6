/**
 * Tells the server this session is over, so its token is refused from now on even if a copy of
 * it survives somewhere. Best effort: the tab forgets the session whatever the answer, and
 * `keepalive` lets the request finish while the page moves on.
 */
export function revokeToken(token: string, fetchFn: typeof fetch = fetch): void {
  void fetchFn('/api/auth/logout', { method: 'POST', headers: { Authorization: `Bearer ${token}` }, keepalive: true }).catch(
    () => undefined,
  );
}
