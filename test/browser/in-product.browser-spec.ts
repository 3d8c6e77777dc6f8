import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { demoAssemblyFile } from '../../src-server/products/in-product/demo-assembly';
import { APP_URL, type BrowserSession, openBrowser, signIn } from '../support/browser';
import { testClientAddress } from '../support/client-address';

const FILE_NAME = 'browser-housing.s4p';

async function apiToken(): Promise<string> {
  const login = await fetch(`${APP_URL}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-Forwarded-For': testClientAddress() },
    body: JSON.stringify({ email: 'engineer@bandwright.test', password: process.env.DEMO_PASSWORD ?? 'bandwright-demo' }),
  });
  return ((await login.json()) as { accessToken: string }).accessToken;
}

async function api<T>(token: string, path: string, body?: unknown): Promise<T> {
  const response = await fetch(`${APP_URL}/api${path}`, {
    method: body === undefined ? 'GET' : 'POST',
    headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!response.ok) throw new Error(`${path}: ${response.status} ${await response.text()}`);
  return (await response.json()) as T;
}

interface Radios {
  lte: { id: number; name: string };
  wifi: { id: number; name: string };
  lora: { id: number; name: string };
}

/**
 * A new product shaped like the demo gateway (its 4-port file is built from the same invented models): an LTE radio with a
 * main and a diversity antenna, a Wi-Fi and a LoRa radio, so this test changes no demo product another test reads.
 */
async function createGatewayLikeProduct(token: string, suffix: string): Promise<{ productId: number; radios: Radios }> {
  const bands = await api<{ id: number; designation: string }[]>(token, '/bands');
  const bandId = (designation: string) => {
    const band = bands.find((b) => b.designation === designation);
    if (!band) throw new Error(`no band ${designation} in the library`);
    return band.id;
  };
  const product = await api<{ id: number }>(token, '/products', {
    name: `Browser gateway ${suffix}`,
    code: `BG-${suffix}`,
    owner: 'Browser Test',
    groundPlaneLengthMm: 200,
    groundPlaneWidthMm: 120,
    targetRegions: ['EU'],
  });
  const radio = (name: string, technology: string, designations: string[], extra: Record<string, unknown> = {}) =>
    api<{ id: number; name: string }>(token, `/products/${product.id}/radios`, {
      name,
      technology,
      module: 'Browser module (invented)',
      transmitPowerDbm: 20,
      polarization: 'linear',
      connector: 'micro-coax',
      feedLossDb: 0.5,
      bands: designations.map((d) => ({ bandId: bandId(d), certifiedMaxGainDbi: 5 })),
      ...extra,
    });
  const lte = await radio('Cellular LTE (browser)', 'lte', ['B20', 'B3'], { antennaRoles: ['main', 'diversity'] });
  const wifi = await radio('Wi-Fi (browser)', 'wifi', ['Wi-Fi 2.4 GHz']);
  const lora = await radio('LoRa (browser)', 'ism', ['EU863-870']);
  return { productId: product.id, radios: { lte, wifi, lora } };
}

const numberIn = (text: string | null) => Number((text ?? '').replace(',', '').match(/-?\d+(\.\d+)?/)?.[0] ?? Number.NaN);

describe('measured in the product, in the browser', () => {
  let browser: BrowserSession;
  let files: string;

  beforeAll(async () => {
    browser = await openBrowser();
    files = mkdtempSync(join(tmpdir(), 'bandwright-in-product-'));
    // The demo gateway's invented 4-port file (resonator and coupling models), under another name.
    writeFileSync(join(files, FILE_NAME), demoAssemblyFile());
    // A 2-port file with a letter where a number belongs on line 4.
    writeFileSync(join(files, 'broken.s2p'), '! broken on purpose\n# MHz S RI R 50\n800 0.1 0 0.2 0 0.2 0 0.1 0\n900 0.1 x 0.2 0 0.2 0 0.1 0\n');
  });
  afterAll(async () => {
    await browser.close();
    rmSync(files, { recursive: true, force: true });
  });

  it('an engineer uploads an .s4p, maps its ports to radios and antennas, sees isolation and correlation, chooses a diversity part and deletes the file', async () => {
    const { page } = browser;
    const suffix = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 5)}`;
    const { productId, radios } = await createGatewayLikeProduct(await apiToken(), suffix);
    await signIn(page, 'engineer@bandwright.test');
    await page.goto(`${APP_URL}/products/${productId}`);
    const section = page.getByTestId('in-product');
    await section.getByText('No measurements in the product yet').waitFor();

    // A refused file: the dialog names the line and nothing is listed.
    await section.getByRole('button', { name: 'Upload .sNp file' }).click();
    await page.getByLabel('Touchstone file').setInputFiles(join(files, 'broken.s2p'));
    await page.getByRole('button', { name: 'Upload', exact: true }).click();
    const refusal = page.getByTestId('in-product-upload-error');
    await refusal.waitFor();
    expect(await refusal.getAttribute('data-line')).toBe('4');

    // The 4-port file: stored, then its port mapping opens at once.
    await page.getByLabel('Touchstone file').setInputFiles(join(files, FILE_NAME));
    await page.getByLabel('Note').fill('Browser test housing (invented)');
    await page.getByRole('button', { name: 'Upload', exact: true }).click();
    const mapping = page.getByTestId('port-mapping');
    await mapping.waitFor();
    expect(await mapping.locator('tbody tr').count()).toBe(4);
    await page.getByLabel('Radio of port 1').selectOption({ label: radios.lte.name });
    await page.getByLabel('Radio of port 2').selectOption({ label: radios.lte.name });
    // The second port of the LTE radio takes its next antenna, diversity.
    expect(await page.getByLabel('Antenna of port 2').inputValue()).toBe('diversity');
    await page.getByLabel('Radio of port 3').selectOption({ label: radios.wifi.name });
    await page.getByLabel('Radio of port 4').selectOption({ label: radios.lora.name });
    await page.getByRole('button', { name: 'Save mapping' }).click();
    await mapping.waitFor({ state: 'detached' });

    // The file row: 4 ports, 541 points, 600–6000 MHz (demo-assembly.ts DEMO_SWEEP), four mapped ports.
    const row = section.locator('[data-testid^="in-product-file-"]');
    await row.waitFor();
    const cells = await row.locator('td').allTextContents();
    expect(cells[0]).toContain(FILE_NAME);
    expect(numberIn(cells[1])).toBe(4);
    expect(numberIn(cells[2])).toBe(541);
    expect(cells[3].replace(/\s/g, '')).toBe('600–6000MHz');
    expect(await row.locator('td').nth(4).locator('li').count()).toBe(4);

    // Isolation: a 4 × 4 square with 12 figures off the diagonal, each a positive dB value.
    const matrix = section.locator('[data-testid^="isolation-matrix-"]');
    await matrix.waitFor();
    expect(await matrix.locator('tbody tr').count()).toBe(4);
    const figures = matrix.getByTestId('isolation-figure');
    expect(await figures.count()).toBe(12);
    for (const text of await figures.allTextContents()) {
      expect(text).toMatch(/dB/);
      // The coupling model keeps |Sij| ≤ 0.3·√((1−|Sii|²)(1−|Sjj|²)) < 1, so isolation is above 0 dB and well under 100 dB.
      const db = numberIn(text);
      expect(db).toBeGreaterThan(0);
      expect(db).toBeLessThan(100);
    }
    // A cell opens its band pairs: the LTE main and diversity antennas share B20 and B3.
    await figures.first().click();
    const pairs = page.getByTestId('isolation-band-pairs');
    await pairs.waitFor();
    const pairRows = pairs.locator('tbody tr');
    expect(await pairRows.count()).toBe(2);
    const first = numberIn(await pairRows.first().locator('td').last().textContent());
    expect(first).toBeCloseTo(numberIn(await figures.first().textContent()), 1);
    await page.keyboard.press('Escape');

    // Envelope correlation of the LTE radio's two antennas, one row per band, 0 ≤ ECC ≤ 1, with the limit and assumption.
    const ecc = section.getByTestId('correlation-row');
    expect(await ecc.count()).toBe(2);
    for (const text of await section.getByTestId('ecc').allTextContents()) {
      const value = numberIn(text);
      expect(value).toBeGreaterThanOrEqual(0);
      expect(value).toBeLessThanOrEqual(1);
    }
    expect((await section.getByTestId('correlation-assumption').textContent())?.length).toBeGreaterThan(40);
    expect(await section.textContent()).not.toMatch(/mimo-|radioId|worstEcc|\b[A-Z]+_[A-Z]/);

    // A part chosen for the diversity antenna: the verdict names the antenna and the file and port its S11 came from.
    await page.getByRole('button', { name: `Find candidates: ${radios.lte.name}` }).click();
    await page.getByLabel('Choose parts for the antenna').selectOption('diversity');
    await page.getByRole('button', { name: 'Choose as diversity' }).first().click();
    await page.getByTestId('candidates').waitFor({ state: 'detached' });
    const verdictRow = page.getByTestId(`radio-verdict-${radios.lte.id}`);
    const part = verdictRow.getByTestId('chosen-part');
    await part.getByText('diversity').waitFor();
    await verdictRow.getByTestId('s11-source').getByText(FILE_NAME).waitFor();
    expect(numberIn((await verdictRow.getByTestId('s11-source').textContent())?.split('port').pop() ?? null)).toBe(2);

    // Deleted after confirming: the list empties, the isolation leaves, and the verdict goes back to the evaluation board.
    await row.getByRole('button', { name: `Delete ${FILE_NAME}` }).click();
    await page.getByRole('button', { name: 'Delete file' }).click();
    await section.getByText('No measurements in the product yet').waitFor();
    expect(await section.locator('[data-testid^="isolation-matrix-"]').count()).toBe(0);
    await verdictRow.getByTestId('s11-source').getByText('evaluation board').waitFor();
  });
});
