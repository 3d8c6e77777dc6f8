import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { APP_URL, openBrowser, signIn, type BrowserSession } from '../support/browser';

// Example A (invented 1-port data): VSWR 3.0 / 1.5 / 2.0 at 820 / 868 / 915 MHz, so with VSWR ≤ 2 the matched
// range runs from the interpolated crossing at 846.667 MHz up to the last point, 915 MHz.
const EXAMPLE_A = `! Example A - invented data
# MHz S RI R 50
820   0.5000   0.0000
868   0.2000   0.0000
915   0.0000  -0.3333
`;
// Line 4 lacks its imaginary part.
const BROKEN = EXAMPLE_A.replace('868   0.2000   0.0000', '868   0.2000');

describe('Tools page (browser)', () => {
  let browser: BrowserSession;
  let dir: string;

  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'bandwright-tools-'));
    writeFileSync(join(dir, 'example-a.s1p'), EXAMPLE_A);
    writeFileSync(join(dir, 'broken.s1p'), BROKEN);
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  beforeEach(async () => {
    browser = await openBrowser();
  });
  afterEach(() => browser.close());

  it('is on the rail for every role and shows the screening caution', async () => {
    const { page } = browser;
    await signIn(page, 'buyer@bandwright.test');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Tools' }).click();
    await page.waitForURL(`${APP_URL}/tools`);
    await page.getByText('Screening estimate only.').waitFor();
  });

  it('uploads a good file and shows the plot and the matched range', async () => {
    const { page } = browser;
    await signIn(page, 'engineer@bandwright.test');
    await page.goto(`${APP_URL}/tools`);
    await page.getByLabel('Touchstone file').setInputFiles(join(dir, 'example-a.s1p'));
    const ranges = page.getByRole('list', { name: 'Matched ranges' });
    await ranges.waitFor();
    await expect(ranges.getByRole('listitem').allTextContents()).resolves.toEqual([expect.stringContaining('846.667\u202fMHz – 915\u202fMHz')]);
    // The chart is drawn: uPlot puts a canvas inside the labelled plot.
    const plot = page.getByRole('img', { name: 'VSWR and return loss of port 1' });
    await plot.locator('canvas').waitFor();
    expect((await plot.boundingBox())!.width).toBeGreaterThan(300);
    await page.getByText('868\u202fMHz: VSWR 1.50').waitFor();

    // The −10 dB criterion is stricter (VSWR 1.925): 915 MHz (VSWR 2.0) drops out of the range.
    await page.getByRole('radio', { name: 'S11 ≤ −10 dB' }).click();
    await page.getByRole('heading', { name: /Matched ranges \(return loss ≥ 10 dB\)/ }).waitFor();
    const strict = await ranges.getByRole('listitem').allTextContents();
    expect(strict).toHaveLength(1);
    expect(strict[0]).not.toContain('915\u202fMHz');
  });

  it('uploads a broken file and shows its line number and the reason', async () => {
    const { page } = browser;
    await signIn(page, 'engineer@bandwright.test');
    await page.goto(`${APP_URL}/tools`);
    await page.getByLabel('Touchstone file').setInputFiles(join(dir, 'broken.s1p'));
    const alert = page.getByRole('alert').filter({ hasText: 'This file could not be read' });
    await alert.waitFor();
    await alert.getByText('Line 4', { exact: true }).waitFor();
    await alert.getByText('line 4: a 1-port data line needs 3 numbers, found 2').waitFor();
  });
});
