import { APP_URL, type BrowserSession, openBrowser, signIn } from '../support/browser';
import { testClientAddress } from '../support/client-address';

// Demo data (catalog-seed/assignments.json): the tracker's BLE radio has a low-efficiency 2.4 GHz chip chosen.
const TRACKER = 1;
const TRACKER_BLE = 13;
const LOW_EFFICIENCY_CHIP = 1029;
const GOOD_BLE_CHIP = 1025;

/** Puts the demo back as seeded, so the test tells the same story on every run against the same database. */
async function resetDemoChoice(): Promise<void> {
  const login = await fetch(`${APP_URL}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-Forwarded-For': testClientAddress() },
    body: JSON.stringify({ email: 'engineer@bandwright.test', password: process.env.DEMO_PASSWORD ?? 'bandwright-demo' }),
  });
  const { accessToken } = (await login.json()) as { accessToken: string };
  const headers = { 'Content-Type': 'application/json', Authorization: `Bearer ${accessToken}` };
  const choice = await fetch(`${APP_URL}/api/products/${TRACKER}/radios/${TRACKER_BLE}/choice`, {
    method: 'PUT',
    headers,
    body: JSON.stringify({ partId: LOW_EFFICIENCY_CHIP }),
  });
  if (!choice.ok) throw new Error(`could not reset the demo choice: ${choice.status}`);
  await fetch(`${APP_URL}/api/products/${TRACKER}/radios/${TRACKER_BLE}/shortlist/${GOOD_BLE_CHIP}`, { method: 'DELETE', headers });
}

describe('compatibility matrix in the browser', () => {
  let browser: BrowserSession;

  beforeAll(async () => {
    await resetDemoChoice();
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser.close();
    await resetDemoChoice();
  });

  it('an engineer sees the failing BLE cell of the demo tracker, reads why, chooses a passing candidate and the row turns to pass', async () => {
    const { page } = browser;
    await signIn(page, 'engineer@bandwright.test');
    await page.goto(`${APP_URL}/products`);
    await page
      .getByRole('link', { name: /Livestock tracker/ })
      .first()
      .click();
    await page.getByRole('heading', { name: 'Compatibility matrix' }).waitFor();

    const failing = page.locator(`[data-testid^="cell-${TRACKER_BLE}-"][data-testid$="-${LOW_EFFICIENCY_CHIP}"]`);
    await failing.waitFor();
    expect(await failing.getAttribute('data-status')).toBe('fail');
    // The cautions sit beside the result.
    await page.getByText('Screening estimate only.').first().waitFor();

    await failing.click();
    const detail = page.getByTestId('cell-detail');
    await detail.waitFor();
    await detail
      .getByText(
        /efficiency at the radio port falls to [\d.]+ % at [\d.]+ MHz \(antenna total efficiency [\d.]+ %, feed loss [\d.]+ dB\); the floor for ble is 30 %/,
      )
      .waitFor();

    await detail.getByRole('button', { name: 'Find candidates for Bluetooth LE' }).click();
    const candidate = page.getByTestId(`candidate-${GOOD_BLE_CHIP}`);
    await candidate.waitFor();
    expect(await candidate.getAttribute('data-status')).toBe('pass');
    await candidate.getByRole('button', { name: 'Choose' }).click();
    await page.getByTestId('candidates').waitFor({ state: 'detached' });

    const chosen = page.locator(`[data-testid^="cell-${TRACKER_BLE}-"][data-testid$="-${GOOD_BLE_CHIP}"]`);
    await chosen.waitFor();
    expect(await chosen.getAttribute('data-status')).toBe('pass');
    await page.locator(`[data-testid^="cell-${TRACKER_BLE}-"][data-testid$="-${GOOD_BLE_CHIP}"].bw-matrix__cell--assigned`).waitFor();
    // Every band of the BLE radio is a pass with the chosen part.
    const row = page.locator(`[data-testid^="cell-${TRACKER_BLE}-"][data-testid$="-${GOOD_BLE_CHIP}"]`);
    for (const status of await row.evaluateAll((cells) => cells.map((c) => c.getAttribute('data-status')))) expect(status).toBe('pass');
  });
});
