import { readFileSync } from 'node:fs';
import { APP_URL, type BrowserSession, openBrowser, signIn } from '../support/browser';
import { waitForMail } from '../support/mailbox';
import { s1pWithGamma } from '../support/parts';

describe('catalogue in the browser', () => {
  let session: BrowserSession | null = null;
  afterEach(async () => {
    await session?.close();
    session = null;
  });

  it('procurement searches approved parts covering LTE B20 with total efficiency ≥ 40 % and exports them as CSV', async () => {
    session = await openBrowser();
    const { page } = session;
    await signIn(page, 'buyer@bandwright.test');
    await page.goto(`${APP_URL}/catalogue`);
    await page.getByTestId('result-count').waitFor();
    // B20 spans 791–862 MHz (3GPP TS 36.101 Table 5.5-1), taken from the band library; the search checks each of its ranges.
    await page.getByLabel('Add band').selectOption({ label: 'B20 (lte) 791–862 MHz' });
    await Promise.all([
      page.waitForResponse(
        (r) => r.url().includes('/api/parts?') && r.url().includes('791-821') && r.url().includes('832-862') && r.url().includes('minEfficiencyPct=40'),
      ),
      page.getByLabel('Efficiency at least').fill('40'),
    ]);
    await page.waitForTimeout(300);
    const countText = (await page.getByTestId('result-count').textContent()) ?? '';
    const total = Number(/of (\d+) parts/.exec(countText)?.[1] ?? 0);
    expect(total).toBeGreaterThan(3);
    const table = page.getByTestId('catalogue-table');
    const states = await table.locator('.bp6-tag').allTextContents();
    expect(states.filter((s) => ['draft', 'in-review', 'restricted', 'retired'].includes(s))).toEqual([]);
    // A demo part known to miss B20 below 824 MHz is not listed (catalog-seed/parts: TW-SM824).
    expect(await table.getByText('TW-SM824').count()).toBe(0);

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('export-csv').click()]);
    const csv = readFileSync((await download.path())!, 'utf8')
      .trim()
      .split(/\r\n/);
    const header = csv[0].split(',');
    expect(header).toEqual(expect.arrayContaining(['mpn', 'reviewState', 'specBands']));
    expect(csv).toHaveLength(total + 1);
    // Quoted titles may contain commas, so the state is matched as a whole cell on each line.
    for (const line of csv.slice(1)) expect(line).toMatch(/,approved,/);
  });

  it('an engineer drafts a part, checks and uploads a Touchstone file, submits it; an admin approves and the engineer is mailed', async () => {
    const mpn = `BR-${Date.now().toString(36)}${Math.random().toString(36).slice(2, 5)}`;
    session = await openBrowser();
    let page = session.page;
    await signIn(page, 'engineer@bandwright.test');
    await page.goto(`${APP_URL}/catalogue`);
    await page.getByRole('button', { name: 'New draft part' }).click();
    await page.getByLabel('Manufacturer', { exact: true }).fill('Browserbench Antennas');
    await page.getByLabel('Manufacturer part number').fill(mpn);
    await page.getByLabel('Title').fill('Browser test chip antenna');
    await page.getByRole('button', { name: 'Create draft' }).click();
    await page.getByRole('heading', { name: `Browserbench Antennas ${mpn}` }).waitFor();
    expect(await page.getByTestId('review-state').textContent()).toBe('draft');

    await page.getByRole('button', { name: 'Upload data' }).click();
    // A bad file first: the dialog names the offending line and stores nothing.
    await page
      .getByLabel('Measurement file')
      .setInputFiles({ name: 'bad.s1p', mimeType: 'text/plain', buffer: Buffer.from('# MHz S RI R 50\n800 0.2 0\n850 0.3 oops\n') });
    await page.getByRole('button', { name: 'Check file' }).click();
    await page.getByTestId('upload-error').getByText('line 3').first().waitFor();
    const good = s1pWithGamma([
      [700, 0.7],
      [800, 0.3],
      [850, 0.1],
      [900, 0.3],
      [1000, 0.7],
    ]);
    await page.getByLabel('Measurement file').setInputFiles({ name: 'good.s1p', mimeType: 'text/plain', buffer: Buffer.from(good) });
    await page.getByRole('button', { name: 'Check file' }).click();
    await page.getByTestId('upload-preview').getByText('5 points, 700–1000 MHz').waitFor();
    await page.getByRole('button', { name: 'Upload', exact: true }).click();
    await page.getByTestId('measurements').getByText('good.s1p').waitFor();

    await page.getByRole('button', { name: 'Submit for review' }).click();
    await page.getByTestId('review-state').getByText('in-review').waitFor();
    await session.close();

    session = await openBrowser();
    page = session.page;
    await signIn(page, 'admin@bandwright.test');
    await page.goto(`${APP_URL}/catalogue/review`);
    await page.getByTestId('review-queue').getByRole('link', { name: mpn }).click();
    await page.getByRole('heading', { name: `Browserbench Antennas ${mpn}` }).waitFor();
    await page.getByRole('button', { name: 'Approve' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Approve', exact: true }).click();
    await page.getByTestId('review-state').getByText('approved').waitFor();
    const mail = await waitForMail('engineer@bandwright.test', new RegExp(`approved: .*${mpn}`));
    expect(mail.text).toContain(`/catalogue/parts/`);
  });
});
