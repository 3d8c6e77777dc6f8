import type { Locator } from 'playwright-core';
import { APP_URL, type BrowserSession, openBrowser, signIn } from '../support/browser';

describe('products in the browser', () => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(() => browser.close());

  it('an engineer creates a product, adds a cellular radio from a band set and a GNSS radio, and sees the strip', async () => {
    const { page } = browser;
    const suffix = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 5)}`;
    const name = `Browser tracker ${suffix}`;
    await signIn(page, 'engineer@bandwright.test');

    await page.goto(`${APP_URL}/products`);
    await page.getByRole('button', { name: 'New product' }).click();
    await page.getByLabel('Product name').fill(name);
    await page.getByLabel('Code').fill(`BT-${suffix}`);
    await page.getByLabel('Owner').fill('Browser Test');
    await page.getByLabel('Ground plane length').fill('-5');
    await page.getByLabel('Ground plane width').fill('30');
    await page.getByRole('button', { name: 'Create product' }).click();
    // The server's 400 names the field, and the form shows it under that field.
    await page.getByText('must not be less than 1').waitFor();
    await page.getByLabel('Ground plane length').fill('55');
    await page.getByRole('button', { name: 'Create product' }).click();
    await page.getByRole('heading', { name }).waitFor();

    // Cellular radio: bands taken from the seeded LTE-M Europe set (B3, B8, B20).
    await page.getByRole('button', { name: 'Add radio' }).click();
    await page.getByLabel('Radio name').fill('Cellular LTE-M');
    await page.getByLabel('Module').fill('Browser modem (invented)');
    await page.getByLabel('Transmit power').fill('23');
    await page.getByLabel('Band set').selectOption({ label: 'LTE-M Europe (example)' });
    await page.getByRole('button', { name: 'Add bands from set' }).click();
    const bandRows = page.getByTestId('radio-bands').locator('tr');
    await waitForCount(bandRows, 3);
    expect(await page.getByTestId('radio-bands').innerText()).toMatch(/B3[\s\S]*B8[\s\S]*B20/);
    await page.getByLabel('Certified max gain for B20').fill('4.5');
    await page.getByRole('button', { name: 'Save radio' }).click();
    await page.getByTestId('radio-row').first().waitFor();

    // GNSS radio: receive only, so the transmit power is not asked for.
    await page.getByRole('button', { name: 'Add radio' }).click();
    await page.getByLabel('Radio name').fill('GNSS L1');
    await page.getByLabel('Technology').selectOption('gnss');
    await page.getByLabel('Module').fill('Browser GNSS (invented)');
    expect(await page.getByLabel('Transmit power').isDisabled()).toBe(true);
    await page.getByLabel('Band', { exact: true }).selectOption('501');
    await page.getByRole('button', { name: 'Add band', exact: true }).click();
    await page.getByRole('button', { name: 'Save radio' }).click();
    await waitForCount(page.getByTestId('radio-row'), 2);

    // The strip draws one row per radio, with the set's bands and the GNSS signal.
    const strip = page.getByTestId('frequency-strip');
    await strip.waitFor();
    await waitForCount(strip.getByTestId('strip-row'), 2);
    const titles = await strip.locator('[data-role] > title').allTextContents();
    // 3GPP TS 36.101 Table 5.5-1: B20 UL 832–862 MHz; IS-GPS-200: L1 1575.42 ± 10.23 MHz.
    expect(titles).toContain('Cellular LTE-M: B20 uplink (device transmits), 832 MHz – 862 MHz');
    expect(titles.some((t) => t.startsWith('GNSS L1: GPS L1 receive only'))).toBe(true);
    expect(await strip.locator('[data-role="uplink"]').count()).toBe(3);
    expect(await strip.locator('[data-role="receive"]').count()).toBe(1);
    expect(await page.getByTestId('radios-table').innerText()).toContain('B20 · 4.5 dBi');
  });
});

/** playwright-core has no test-runner assertions: poll a locator until it has n elements, then assert. */
async function waitForCount(locator: Locator, n: number, timeoutMs = 10000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  let count = await locator.count();
  while (count !== n && Date.now() < deadline) {
    await new Promise((r) => setTimeout(r, 100));
    count = await locator.count();
  }
  expect(count).toBe(n);
}
