import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, signIn, snapshot, type BrowserSession } from './support/browser.js';
import { startServer, type RunningServer } from './support/server.js';

// Each demo account, the heading of the home screen it lands on, and the nav links it must (not) see.
const ROLE_HOMES = [
  {
    username: 'amara.osei',
    displayName: 'Dr Amara Osei',
    role: 'Prescriber',
    home: 'My orders',
    path: '/orders/mine',
    wards: 'Your wards: Cedar, Harbour, Summit, Wren4 wards',
  },
  {
    username: 'lin.park',
    displayName: 'Lin Park',
    role: 'Pharmacist',
    home: 'Verification',
    path: '/verification',
    wards: 'Your wards: Cedar, Harbour, Summit, Wren4 wards',
  },
  {
    username: 'kai.mendes',
    displayName: 'Kai Mendes',
    role: 'Nurse',
    home: 'PCA orders',
    path: '/bedside',
    wards: 'Your wards: Harbour, SummitHarbour · Summit',
  },
  {
    username: 'mei.tan',
    displayName: 'Mei Tan',
    role: 'Charge nurse',
    home: 'Handover',
    path: '/handover',
    wards: 'Your wards: HarbourHarbour',
  },
  { username: 'sam.rivera', displayName: 'Sam Rivera', role: 'Admin', home: 'Users', path: '/admin/users', wards: null },
];

describe('sign-in and each role’s home', () => {
  let server: RunningServer;
  let browser: BrowserSession;

  beforeAll(async () => {
    server = await startServer();
    browser = await openBrowser(server.baseUrl);
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('lists the demo accounts on the sign-in page', async () => {
    const { page } = browser;
    await page.goto('/');
    await expect.poll(() => page.url()).toContain('/sign-in');
    await page.getByText('amara.osei').first().waitFor();
    await page.getByText('lockstep-demo').first().waitFor();
    await snapshot(page, 'sign-in');
  });

  it('shows a clear message on a wrong password and stays signed out', async () => {
    const { page } = browser;
    await signIn(page, 'kai.mendes', 'not-the-password');
    await page.getByText('Username or password is incorrect').waitFor();
    expect(page.url()).toContain('/sign-in');
  });

  it('shows an error beside an empty field without calling the server', async () => {
    const { page } = browser;
    await page.goto('/sign-in');
    await page.getByLabel('Username').fill('kai.mendes');
    await page.getByLabel('Password').fill('');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('Enter your password').waitFor();
  });

  for (const account of ROLE_HOMES) {
    it(`signs in ${account.username} (${account.role}) to the ${account.home} screen`, async () => {
      const { page } = browser;
      await signIn(page, account.username);
      await page.getByRole('heading', { name: account.home, level: 1 }).waitFor();
      expect(new URL(page.url()).pathname).toBe(account.path);
      const banner = page.getByRole('banner');
      await banner.getByText(account.displayName).waitFor();
      await banner.getByText(account.role, { exact: true }).waitFor();
      // The top bar names the person's wards (read in full by a screen reader); an admin has none.
      const wards = banner.getByTestId('current-user-wards');
      if (account.wards) expect(await wards.textContent()).toBe(account.wards);
      else expect(await wards.count()).toBe(0);

      const nav = page.getByRole('navigation');
      const otherHome = account.home === 'Users' ? 'Patients' : 'Users';
      expect(await nav.getByRole('link', { name: account.home }).count()).toBe(1);
      expect(await nav.getByRole('link', { name: otherHome }).count()).toBe(0);
      await snapshot(page, `home-${account.username}`);

      await page.getByRole('button', { name: 'Sign out' }).click();
      await expect.poll(() => page.url()).toContain('/sign-in');
    });
  }
});
