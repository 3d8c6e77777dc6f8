import { APP_URL, type BrowserSession, openBrowser, signIn } from '../support/browser';
import { testClientAddress } from '../support/client-address';
import { waitForMail } from '../support/mailbox';

/** The API as a demo user, to set up what the screens then show. */
async function api(email: string) {
  const login = await fetch(`${APP_URL}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-Forwarded-For': testClientAddress() },
    body: JSON.stringify({ email, password: process.env.DEMO_PASSWORD ?? 'bandwright-demo' }),
  });
  const { accessToken } = (await login.json()) as { accessToken: string };
  return async <T>(method: string, path: string, body?: unknown): Promise<T> => {
    const res = await fetch(`${APP_URL}/api${path}`, {
      method,
      headers: { Authorization: `Bearer ${accessToken}`, 'Content-Type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
    return (res.status === 204 ? undefined : await res.json()) as T;
  };
}

const uniqueMpn = (prefix: string) => `${prefix}-${Date.now().toString(36)}${Math.random().toString(36).slice(2, 5)}`;

describe('review and sourcing in the browser', () => {
  let session: BrowserSession | null = null;
  afterEach(async () => {
    await session?.close();
    session = null;
  });

  it('an admin sees the implied directivity in the queue, approves with a comment, and the comment reaches the engineer by e-mail', async () => {
    const engineer = await api('engineer@bandwright.test');
    const mpn = uniqueMpn('RV');
    // A chip claiming 3 dBi peak gain at 20 % radiation efficiency: D = 3 + 6.99 = 9.99 dBi (issue example), above 5 dBi.
    const part = await engineer<{ id: number }>('POST', '/parts', {
      manufacturer: 'Browserbench Antennas',
      mpn,
      title: 'Review aid test chip',
      formFactor: 'chip',
      connector: 'solder-pad',
      polarization: 'linear',
      specBands: [{ fromMhz: 824, toMhz: 960, peakGainDbi: 3, gainBasis: 'peak', efficiencyPct: 20, efficiencyBasis: 'radiation' }],
    });
    await engineer('POST', `/parts/${part.id}/submission`, { version: 1 });

    session = await openBrowser();
    const { page } = session;
    await signIn(page, 'admin@bandwright.test');
    await page.goto(`${APP_URL}/catalogue/review`);
    const count = Number(
      await page
        .getByTestId('review-queue-count')
        .innerText()
        .then((t) => t.replace(/\D/g, '')),
    );
    expect(count).toBeGreaterThanOrEqual(1);
    const card = page.getByRole('region', { name: `Browserbench Antennas ${mpn}` });
    await card.getByTestId('implied-directivity').waitFor();
    expect(await card.getByTestId('implied-directivity').getAttribute('data-verdict')).toBe('above-form-factor');
    expect(await card.getByTestId('implied-directivity').innerText()).toContain('10 dBi');
    // The card's actions are on screen without scrolling.
    const approve = card.getByRole('button', { name: `Approve ${mpn}` });
    const box = (await approve.boundingBox())!;
    expect(box.x + box.width).toBeLessThanOrEqual(1440);

    const comment = `Directivity checked with the maker, ${mpn}`;
    await approve.click();
    await page.getByRole('dialog').getByLabel('Comment (optional)').fill(comment);
    await page.getByRole('dialog').getByRole('button', { name: 'Approve', exact: true }).click();
    await card.waitFor({ state: 'detached' });
    expect(Number((await page.getByTestId('review-queue-count').innerText()).replace(/\D/g, ''))).toBe(count - 1);
    const mail = await waitForMail('engineer@bandwright.test', new RegExp(`approved: .*${mpn}`));
    expect(mail.text).toContain(comment);

    await page.goto(`${APP_URL}/catalogue/parts/${part.id}`);
    await page.getByTestId('part-review-aid').getByTestId('implied-directivity').waitFor();
    await page.getByRole('tab', { name: 'History' }).click();
    await page.getByTestId('history').getByText(`Comment: ${comment}`).waitFor();
  });

  it('procurement edits an offer with three price breaks, removes it and undoes the removal after a reload', async () => {
    const engineer = await api('engineer@bandwright.test');
    const part = await engineer<{ id: number }>('POST', '/parts', {
      manufacturer: 'Browserbench Antennas',
      mpn: uniqueMpn('OF'),
      title: 'Offer test chip',
      formFactor: 'chip',
      connector: 'solder-pad',
      polarization: 'linear',
    });
    const buyer = await api('buyer@bandwright.test');
    await buyer('POST', `/parts/${part.id}/offers`, {
      supplier: 'Northgate Parts Exchange',
      currency: 'USD',
      priceBreaks: [
        { quantity: 1, unitPrice: '0.95' },
        { quantity: 100, unitPrice: '0.60' },
        { quantity: 1000, unitPrice: '0.38' },
      ],
      moq: 1,
      stock: 5000,
      leadTimeDays: 28,
    });

    session = await openBrowser();
    const { page } = session;
    await signIn(page, 'buyer@bandwright.test');
    await page.goto(`${APP_URL}/catalogue/parts/${part.id}`);
    await page.getByRole('tab', { name: /Sourcing/ }).click();
    await page.getByRole('button', { name: 'Edit offer from Northgate Parts Exchange' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Break 2 quantity (pieces)').fill('250');
    await dialog.getByLabel('Break 2 unit price (USD)').fill('0.55');
    await dialog.getByLabel('Break 3 unit price (USD)').fill('0.35');
    await dialog.getByLabel('Stock (pieces)').fill('800');
    await dialog.getByLabel('Lead time (days)').fill('42');
    await dialog.getByRole('button', { name: 'Save offer' }).click();
    await dialog.waitFor({ state: 'detached' });
    const breaks = page.getByTestId('offer-breaks');
    await breaks.getByText('250+ pcs: 0.55 USD').waitFor();
    expect((await breaks.locator('div').allInnerTexts()).map((t) => t.trim())).toEqual(['1+ pcs: 0.95 USD', '250+ pcs: 0.55 USD', '1,000+ pcs: 0.35 USD']);
    await page.getByTestId('offer-row').getByText('800 pcs').waitFor();

    await page.getByRole('tab', { name: 'History' }).click();
    await page.getByTestId('history').getByText('Lead time (days): 28 → 42').waitFor();
    await page.getByTestId('history').getByText('Stock (pieces): 5000 → 800').waitFor();

    await page.getByRole('tab', { name: /Sourcing/ }).click();
    await page.getByRole('button', { name: 'Remove offer from Northgate Parts Exchange' }).click();
    await page.getByRole('button', { name: 'Remove offer', exact: true }).click();
    await page.getByTestId('offer-removal').waitFor();
    expect(await page.getByTestId('offer-row').count()).toBe(0);
    await page.reload();
    await page.getByRole('tab', { name: /Sourcing/ }).click();
    await page.getByTestId('offer-removal').getByRole('button', { name: 'Undo' }).click();
    await page.getByTestId('offer-row').getByText('800 pcs').waitFor();
    expect(await page.getByTestId('offer-removal').count()).toBe(0);
  });
});
