import { afterAll, beforeAll, describe, it } from 'vitest';
import { openBrowser, signIn, signInHome, snapshot, type BrowserSession } from './support/browser.js';
import { startServer, type RunningServer } from './support/server.js';
import { readyDialog } from './support/dialog.js';

describe('admin user management', () => {
  let server: RunningServer;
  let browser: BrowserSession;

  beforeAll(async () => {
    server = await startServer();
    browser = await openBrowser(server.baseUrl);
    await signIn(browser.page, 'sam.rivera');
    await browser.page.getByRole('heading', { name: 'Users', level: 1 }).waitFor();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('shows the error beside the password, then creates the user who can sign in', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'New user' }).click();
    const dialog = await readyDialog(page);
    await dialog.getByLabel('Username').fill('noor.haddad');
    await dialog.getByLabel('Display name').fill('Noor Haddad');
    await dialog.getByRole('combobox', { name: 'Role' }).click();
    await page.getByRole('option', { name: 'Nurse', exact: true }).click();
    await dialog.getByLabel(/^Password/).fill('too-short');
    await dialog.getByRole('button', { name: /create/i }).click();
    await dialog.getByText('Password must be at least 12 characters').waitFor();
    await snapshot(page, 'admin-new-user-error');

    await dialog.getByLabel(/^Password/).fill('a-sufficiently-long-one');
    await dialog.getByRole('button', { name: /create/i }).click();
    await page.getByRole('cell', { name: 'noor.haddad' }).waitFor();

    await page.getByRole('button', { name: 'Sign out' }).click();
    await signInHome(page, 'noor.haddad', 'a-sufficiently-long-one');
  });
});
