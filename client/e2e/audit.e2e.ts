import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, openBrowser, signIn, signInHome, snapshot, type BrowserSession } from './support/browser.js';
import { apiToken, callApi } from './support/api.js';
import { startServer, type RunningServer } from './support/server.js';

// The demo's Harbour ward (id 1) keeps SpO2 below 92 % as its shipped threshold (NEWS2's floor); the demo order
// for NOAH ACHTERBERG (H02) waits for verification. Besides the demo's own back-story, the API
// makes these events here: Lin Park verifies that order, Sam Rivera proposes raising Harbour's SpO2 threshold and
// Mei Tan (charge nurse) signs it off, which changes the policy.
const HARBOUR = 1;

type OrderSummary = { id: number; status: string };

async function openAudit(page: Page): Promise<void> {
  await page.getByRole('navigation').getByRole('link', { name: 'Audit', exact: true }).click();
  await page.getByRole('heading', { name: 'Audit trail', level: 1 }).waitFor();
}

async function choose(page: Page, field: string, option: string): Promise<void> {
  await page.getByRole('combobox', { name: field }).click();
  await page.getByRole('option', { name: option, exact: true }).click();
}

const auditRows = (page: Page) => page.getByRole('table', { name: 'Audit events' }).locator('tbody tr');

describe('audit trail', () => {
  let server: RunningServer;
  let browser: BrowserSession;
  let verifiedId = 0;

  beforeAll(async () => {
    server = await startServer();
    browser = await openBrowser(server.baseUrl);
    const lin = await apiToken(server.baseUrl, 'lin.park');
    const waiting = await callApi<OrderSummary[]>(server.baseUrl, lin, 'GET', '/orders?status=awaiting_verification');
    const order = waiting[0];
    if (!order) throw new Error('The demo has no order awaiting verification');
    verifiedId = order.id;
    await callApi(server.baseUrl, lin, 'POST', `/orders/${verifiedId}/verify`, { signature: { password: DEMO_PASSWORD } });
    // A clinical setting changes by a signed proposal that a charge nurse signs off (then it is audited as changed).
    const sam = await apiToken(server.baseUrl, 'sam.rivera');
    const proposed = await callApi<{ id: number }>(server.baseUrl, sam, 'POST', `/wards/${HARBOUR}/policy-changes`, {
      changes: { spo2Threshold: 93 },
      reason: 'Flag SpO2 of 92 % as urgent on Harbour',
      signature: { password: DEMO_PASSWORD },
    });
    const mei = await apiToken(server.baseUrl, 'mei.tan');
    await callApi(server.baseUrl, mei, 'POST', `/wards/policy-changes/${proposed.id}/sign-off`, { signature: { password: DEMO_PASSWORD } });
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it("the admin finds Harbour's policy change and the verification, reads an event's hashes and verifies the chain", async () => {
    const { page } = browser;
    await signIn(page, 'sam.rivera');
    await page.getByRole('heading', { name: 'Users', level: 1 }).waitFor();
    await openAudit(page);
    await expect.poll(() => auditRows(page).count()).toBeGreaterThanOrEqual(2);

    await choose(page, 'Record type', 'Ward');
    await choose(page, 'Action', 'Ward policy changed');
    await page.getByRole('button', { name: 'Search' }).click();
    await expect.poll(() => new URL(page.url()).searchParams.get('action')).toBe('ward.policy-update');
    await expect.poll(() => auditRows(page).count()).toBe(1);
    const policyRow = auditRows(page).first();
    const policyText = await policyRow.innerText();
    // The change applies at the sign-off: the charge nurse who signed it off changed the policy; the proposer is named.
    expect(policyText).toContain('Mei Tan');
    expect(policyText).toContain('Ward Harbour');
    expect(policyText).toContain('Proposed by: Sam Rivera');
    await snapshot(page, 'audit-ward-policy');

    await policyRow.click();
    const drawer = page.getByRole('dialog', { name: /^Event #\d+: Ward policy changed$/ });
    await drawer.waitFor();
    const hashes = await drawer.locator('code[title]').allInnerTexts();
    expect(hashes).toHaveLength(2);
    for (const hash of hashes) expect(hash).toMatch(/^[0-9a-f]{12}$/);
    await drawer.getByText('SpO₂ threshold').waitFor();
    expect(await drawer.innerText()).toContain('92 → 93');
    await snapshot(page, 'audit-event-details');
    await page.keyboard.press('Escape');
    await drawer.waitFor({ state: 'detached' });

    await page.getByRole('button', { name: 'Clear filters' }).click();
    await choose(page, 'Record type', 'Order');
    await page.getByLabel('Record number').fill(String(verifiedId));
    await page.getByRole('button', { name: 'Search' }).click();
    await expect.poll(() => new URL(page.url()).searchParams.get('entityId')).toBe(String(verifiedId));
    // The previous page stays on screen until the filtered one arrives: wait for only this order's rows.
    await expect.poll(async () => (await auditRows(page).allInnerTexts()).every((text) => text.includes(`Order ${verifiedId}`))).toBe(true);
    const verifyRow = auditRows(page).filter({ hasText: 'Order verified by pharmacy' });
    await verifyRow.waitFor();
    expect(await verifyRow.innerText()).toContain('Lin Park');

    const sam = await apiToken(server.baseUrl, 'sam.rivera');
    const { total } = await callApi<{ total: number }>(server.baseUrl, sam, 'GET', '/audit?limit=1');
    await page.getByRole('button', { name: 'Verify chain' }).click();
    await page.getByText(`All ${total} events verified`).waitFor();
    await snapshot(page, 'audit-chain-verified');
    await page.getByRole('button', { name: 'Sign out' }).click();
  });

  it('a pharmacist may search orders, library versions, equianalgesic factors and patient records only, and opens an order from its event', async () => {
    const { page } = browser;
    await signInHome(page, 'lin.park');
    await openAudit(page);
    await page.getByRole('combobox', { name: 'Record type' }).click();
    await expect
      .poll(() => page.getByRole('option').allInnerTexts())
      .toEqual(['Order', 'Library version', 'Equianalgesic factor', 'Patient']);
    await page.keyboard.press('Escape');
    expect(await page.getByRole('combobox', { name: 'Person' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Verify chain' }).count()).toBe(0);

    await expect.poll(() => auditRows(page).count()).toBeGreaterThanOrEqual(1);
    for (const text of await auditRows(page).allInnerTexts()) expect(text).not.toContain('Ward Harbour');
    await snapshot(page, 'audit-pharmacist');

    await auditRows(page)
      .filter({ hasText: 'Order verified by pharmacy' })
      .getByRole('link', { name: `Order ${verifiedId}` })
      .click();
    await page.getByRole('heading', { name: `PCA order ${verifiedId}`, level: 1 }).waitFor();
    await page.getByRole('button', { name: 'Sign out' }).click();
  });

  it("a nurse reads the order's story on its page: who verified it and when", async () => {
    const { page } = browser;
    await signInHome(page, 'kai.mendes');
    await page.goto(`/orders/${verifiedId}`);
    await page.getByRole('heading', { name: `PCA order ${verifiedId}`, level: 1 }).waitFor();
    const story = page.getByRole('region', { name: 'Order story' });
    const verified = story.getByTestId('order-story-event').filter({ hasText: 'Order verified by pharmacy' });
    await verified.waitFor();
    const text = await verified.innerText();
    expect(text).toContain('Lin Park');
    expect(text).toMatch(/\d{1,2} [A-Z][a-z]{2} \d{4}, \d{2}:\d{2}/);
    expect(text).toContain('Awaiting verification → Verified');
    // The story replaces the status history: the page holds one history, not two.
    expect(await page.getByRole('heading', { name: 'Status history' }).count()).toBe(0);
    await page.evaluate(() => window.scrollTo(0, 0));
    await snapshot(page, 'order-story');
  });
});
