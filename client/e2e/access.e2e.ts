import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, signInHome, type BrowserSession } from './support/browser.js';
import { startServer, type RunningServer } from './support/server.js';

describe('roles are enforced by the API, not only by the screens', () => {
  let server: RunningServer;
  const statusWith = (token: string, path: string) => fetch(`${server.baseUrl}${path}`, { headers: { Authorization: `Bearer ${token}` } });
  let browser: BrowserSession;

  beforeAll(async () => {
    server = await startServer();
    browser = await openBrowser(server.baseUrl);
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  let kaiToken = '';

  it('a nurse calling an admin route with her own token gets 403', async () => {
    const { page } = browser;
    await signInHome(page, 'kai.mendes');
    kaiToken = await page.evaluate(
      () =>
        Object.keys(sessionStorage)
          .map((key) => sessionStorage.getItem(key) ?? '')
          .map((value) => value.match(/eyJ[\w-]+\.[\w-]+\.[\w-]+/)?.[0])
          .find(Boolean) ?? '',
    );
    expect((await statusWith(kaiToken, '/api/users')).status).toBe(403);
  });

  it('a nurse who types the admin address is not shown the users screen', async () => {
    const { page } = browser;
    await page.goto('/admin/users');
    await page.waitForLoadState('networkidle');
    expect(await page.getByRole('heading', { name: 'Users', level: 1 }).count()).toBe(0);
  });

  it('signed out, a protected address leads to sign-in', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.goto('/patients');
    await expect.poll(() => page.url()).toContain('/sign-in');
  });

  it('after "Sign out" the session’s token is refused by the server too', async () => {
    await expect.poll(async () => (await statusWith(kaiToken, '/api/auth/me')).status).toBe(401);
  });
});
