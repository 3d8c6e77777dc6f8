import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { APP_URL, type BrowserSession, openBrowser, signIn } from '../support/browser';
import { testClientAddress } from '../support/client-address';

// Demo data (catalog-seed/assignments.json): the tracker's Bluetooth LE radio has a low-efficiency 2.4 GHz chip chosen.
const TRACKER = 1;
const TRACKER_BLE = 13;
const LOW_EFFICIENCY_CHIP = 1029;

async function apiToken(): Promise<string> {
  const login = await fetch(`${APP_URL}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-Forwarded-For': testClientAddress() },
    body: JSON.stringify({ email: 'engineer@bandwright.test', password: process.env.DEMO_PASSWORD ?? 'bandwright-demo' }),
  });
  return ((await login.json()) as { accessToken: string }).accessToken;
}

/** Puts the demo's Bluetooth LE choice back as seeded (another browser test changes it). */
async function resetDemoChoice(): Promise<void> {
  const token = await apiToken();
  const choice = await fetch(`${APP_URL}/api/products/${TRACKER}/radios/${TRACKER_BLE}/choice`, {
    method: 'PUT',
    headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` },
    body: JSON.stringify({ partId: LOW_EFFICIENCY_CHIP }),
  });
  if (!choice.ok) throw new Error(`could not reset the demo choice: ${choice.status}`);
}

describe('product verdict and report in the browser', () => {
  let browser: BrowserSession;
  let downloads: string;

  beforeAll(async () => {
    await resetDemoChoice();
    browser = await openBrowser();
    downloads = mkdtempSync(join(tmpdir(), 'bandwright-report-'));
  });
  afterAll(async () => {
    await browser.close();
    rmSync(downloads, { recursive: true, force: true });
  });

  it('an engineer sees the product verdict and the failing radio with its reason, keeps the chosen-parts view over a reload, and downloads the report', async () => {
    const { page } = browser;
    await signIn(page, 'engineer@bandwright.test');
    await page.goto(`${APP_URL}/products/${TRACKER}`);

    const summary = page.getByTestId('product-verdict-summary');
    await summary.waitFor();
    expect(await summary.getAttribute('data-verdict')).toBe('fail');
    // The verdict in words, never a bare code.
    await summary.getByText('Product: Fail').waitFor();

    const ble = page.getByTestId(`radio-verdict-${TRACKER_BLE}`);
    await ble.waitFor();
    expect(await ble.getAttribute('data-verdict')).toBe('fail');
    await ble.getByText('Bluetooth LE').first().waitFor();
    await ble.getByText('Fail', { exact: true }).waitFor();
    // The deciding reason in words: the efficiency floor the chosen chip misses (rules/efficiency-floor.json).
    await ble.getByText(/efficiency at the radio port falls to [\d.]+\s%\sat [\d.]+\sMHz.*the floor for ble is 30\s%/i).waitFor();
    expect(await ble.textContent()).not.toMatch(/[A-Z]_[A-Z]/);

    // Chosen parts only: in the page URL, so it survives a reload.
    const chosenOnly = page.getByLabel('Chosen parts only');
    expect(await chosenOnly.isChecked()).toBe(false);
    await chosenOnly.click({ force: true });
    await page.waitForURL(/parts=chosen/);
    await page.reload();
    await page.getByTestId('matrix-table').waitFor();
    expect(await page.getByLabel('Chosen parts only').isChecked()).toBe(true);
    const chosenCell = page.locator(`[data-testid^="cell-${TRACKER_BLE}-"][data-testid$="-${LOW_EFFICIENCY_CHIP}"]`).first();
    await chosenCell.waitFor();
    expect(await chosenCell.getAttribute('data-status')).toBe('fail');

    // The report: a dated PDF from the server, checked with a PDF text extractor (Debian poppler-utils).
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Report (PDF)' }).click()]);
    const file = join(downloads, 'report.pdf');
    await download.saveAs(file);
    const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
    expect(text).toContain('Antenna compatibility report');
    expect(text).toContain(new Date().toISOString().slice(0, 10));
    const evaluation = (await (
      await fetch(`${APP_URL}/api/products/${TRACKER}/evaluation`, { headers: { Authorization: `Bearer ${await apiToken()}` } })
    ).json()) as { radios: { name: string }[] };
    expect(evaluation.radios.length).toBeGreaterThan(0);
    for (const radio of evaluation.radios) expect(text).toContain(radio.name);
    expect(text).toContain('accredited');
  });
});
