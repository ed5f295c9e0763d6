import { afterAll, beforeAll, describe, it } from 'vitest';
import { DEMO_PASSWORD, openBrowser, openPatients, signInHome, snapshot, type BrowserSession } from './support/browser.js';
import { readyDialog } from './support/dialog.js';
import { startServer, type RunningServer } from './support/server.js';

// The patient record's allergies on screen: a prescriber records a morphine intolerance for
// LISOWSKI, Bogdan (KB100971, Harbour bed H01, a demo patient with no PCA and "no known
// allergies"), then orders morphine for him: the order form shows the allergy finding and asks a
// reason for it before signing.
const MRN = 'KB100971';
const PATIENT = 'LISOWSKI, Bogdan';
const FINDING = 'Recorded morphine (intolerance; reaction: itch)';
const STEP_TIMEOUT_MS = 150_000;

describe('allergies: recorded on the patient page, found by the order check', () => {
  let server: RunningServer;
  let browser: BrowserSession;

  beforeAll(async () => {
    server = await startServer();
    browser = await openBrowser(server.baseUrl);
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  }, STEP_TIMEOUT_MS);

  it(
    'a prescriber records a morphine intolerance on the patient page',
    async () => {
      const { page } = browser;
      await signInHome(page, 'amara.osei');
      await openPatients(page);
      await page.getByText(MRN).click();
      await page.getByRole('heading', { name: PATIENT, level: 1 }).waitFor();
      const allergies = page.getByRole('region', { name: 'Allergies' });
      await allergies.getByText('No known allergies').waitFor();

      const form = page.getByRole('form', { name: 'Record an allergy' });
      await form.getByRole('button', { name: 'Record allergy' }).click();
      await form.getByText('Enter the reaction (or "not known")').waitFor();

      await form.getByRole('combobox', { name: 'Substance', exact: true }).click();
      await page.getByRole('option', { name: 'morphine', exact: true }).click();
      await form.getByRole('textbox', { name: 'Reaction' }).fill('itch');
      await form.getByRole('combobox', { name: 'Severity' }).click();
      await page.getByRole('option', { name: 'Intolerance', exact: true }).click();
      await form.getByRole('button', { name: 'Record allergy' }).click();
      await allergies.locator('[data-severity="intolerance"]').getByText('morphine').waitFor();
      await allergies.getByText('recorded by Dr Amara Osei').waitFor();
      await snapshot(page, 'patient-allergy-recorded');
    },
    STEP_TIMEOUT_MS,
  );

  it(
    'the order form shows the allergy finding and needs a reason to sign',
    async () => {
      const { page } = browser;
      await page.getByRole('link', { name: 'New PCA order' }).click();
      await page.getByRole('heading', { name: 'New PCA order', level: 1 }).waitFor();
      await page.getByRole('region', { name: 'Patient' }).getByText('Intolerance').waitFor();

      await page.getByRole('button', { name: /^Adult morphine, morphine 1 mg\/mL/ }).click();
      const reasons = page.getByRole('region', { name: 'Reasons needed' });
      await reasons.getByText(FINDING).waitFor();
      await page.getByRole('button', { name: 'Sign order' }).click();
      await reasons.getByText('Give a reason of at least 10 characters').waitFor();
      await snapshot(page, 'order-allergy-reason');

      await reasons.getByLabel('Reason to order this drug for this patient').fill('Itch only; antihistamine charted');
      await page.getByRole('button', { name: 'Sign order' }).click();
      const dialog = await readyDialog(page);
      await dialog.getByText('Drug (recorded allergy or intolerance): Itch only; antihistamine charted').waitFor();
      await dialog.getByLabel('Your password').fill(DEMO_PASSWORD);
      await dialog.getByRole('button', { name: 'Sign and send to pharmacy' }).click();
      await page.getByRole('heading', { name: /^PCA order \d+$/, level: 1 }).waitFor();
      await page.getByText('Reason given: Itch only; antihistamine charted').waitFor();
    },
    STEP_TIMEOUT_MS,
  );
});
