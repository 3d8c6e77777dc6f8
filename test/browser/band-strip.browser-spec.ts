import { APP_URL, openBrowser, signIn, type BrowserSession } from '../support/browser';

describe('band library strip with a part (browser)', () => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(() => browser.close());

  it('draws under each band where a catalogue part is matched', async () => {
    const { page } = browser;
    await signIn(page, 'buyer@bandwright.test');
    await page.goto(`${APP_URL}/bands`);
    // Demo part 1004 (OX-TR-LTE8) is matched 791–960 and 1710–2200 MHz and misses the 700 MHz bands.
    await page.getByLabel('Compare a part').fill('OX-TR-LTE8');
    await page.getByRole('menuitem').first().click();
    await page.getByTestId('strip-part').waitFor();
    const lte = page.getByTestId('band-group-lte');
    await lte.getByRole('button', { name: 'Show strip' }).click();
    const covered = lte.getByTestId('covered-range');
    await covered.first().waitFor();
    const titles = await covered.evaluateAll((nodes) => nodes.map((n) => n.textContent ?? n.getAttribute('aria-label') ?? ''));
    expect(titles.length).toBeGreaterThan(5);
    expect(titles.every((t) => t.includes('OX-TR-LTE8'))).toBe(true);
  });
});
