import { JwtService } from '@nestjs/jwt';
import { APP_URL, openBrowser, signIn, type BrowserSession } from '../support/browser';
import { linkIn, waitForMail } from '../support/mailbox';

const unique = (prefix: string) => `${prefix}-${Date.now().toString(36)}`;

describe('signing in (browser)', () => {
  let browser: BrowserSession;

  beforeEach(async () => {
    browser = await openBrowser();
  });
  afterEach(() => browser.close());

  it.each([
    { email: 'admin@bandwright.test', role: 'Admin', sees: ['Users', 'Audit log'], hidden: [] as string[] },
    { email: 'engineer@bandwright.test', role: 'Engineer', sees: [] as string[], hidden: ['Users', 'Audit log'] },
    { email: 'buyer@bandwright.test', role: 'Procurement', sees: [] as string[], hidden: ['Users', 'Audit log'] },
  ])('$email signs in and sees the navigation of the $role role', async ({ email, role, sees, hidden }) => {
    const { page } = browser;
    await signIn(page, email);
    await expect(page.getByTestId('current-role').textContent()).resolves.toBe(role);
    const rail = page.getByRole('navigation', { name: 'Main' });
    for (const label of sees) await rail.getByRole('link', { name: label }).waitFor();
    for (const label of hidden) expect(await rail.getByRole('link', { name: label }).count()).toBe(0);
  });

  it('shows one message for wrong credentials', async () => {
    const { page } = browser;
    await page.goto(`${APP_URL}/sign-in`);
    await page.getByLabel('E-mail').fill('admin@bandwright.test');
    await page.getByLabel('Password').fill('wrong-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('alert').getByText('E-mail or password is not correct.').waitFor();
  });

  it('returns to sign-in with a message when the stored token is no longer valid', async () => {
    const { page } = browser;
    await signIn(page, 'engineer@bandwright.test');
    await page.evaluate(() => localStorage.setItem('bandwright.token', 'eyJhbGciOiJIUzI1NiJ9.eyJzdWIiOjJ9.invalid'));
    await page.goto(`${APP_URL}/admin/users`);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await page.getByText('Your session is no longer valid. Sign in again.').waitFor();
  });

  it('returns to sign-in saying the session expired when the token is past its expiry, and signing in again works', async () => {
    const { page } = browser;
    await signIn(page, 'engineer@bandwright.test');
    const token = await page.evaluate(() => localStorage.getItem('bandwright.token'));
    // The same claims re-signed with the server's secret, expired ten seconds ago.
    const jwt = new JwtService({ secret: process.env.JWT_SECRET ?? 'test-secret-not-for-production-0123456789' });
    const { exp: _exp, iat: _iat, ...claims } = jwt.decode(token!) as Record<string, unknown>;
    const expired = jwt.sign({ ...claims, exp: Math.floor(Date.now() / 1000) - 10 });
    await page.evaluate((value) => localStorage.setItem('bandwright.token', value), expired);
    await page.goto(`${APP_URL}/`);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await page.getByText('Your session expired. Sign in again.').waitFor();
    await signIn(page, 'engineer@bandwright.test');
  });

  it('an admin invites a user; the invitee follows the e-mailed link, sets a password and signs in', async () => {
    const { page } = browser;
    const email = `${unique('newcomer')}@bandwright.test`;
    await signIn(page, 'admin@bandwright.test');
    await page.getByRole('link', { name: 'Users' }).click();
    await page.getByRole('button', { name: 'Invite user' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('E-mail').fill(email);
    await dialog.getByLabel('Name').fill('Nia Newcomer');
    await dialog.getByLabel('Role').selectOption('engineer');
    await dialog.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText(`Invitation sent to ${email}`).waitFor();
    await page.getByTestId('users-table').getByText(email).waitFor();
    await page.getByRole('button', { name: 'Sign out' }).click();

    const mail = await waitForMail(email, /invited/i);
    // The link points at the app's configured URL; follow its path and token on the server under test.
    const link = new URL(linkIn(mail, '/accept-invitation'));
    await page.goto(`${APP_URL}${link.pathname}${link.search}`);
    await page.getByLabel('New password').fill('newcomer-password-1');
    await page.getByLabel('Repeat the password').fill('newcomer-password-1');
    await page.getByRole('button', { name: 'Set password and sign in' }).click();
    await page.getByTestId('current-role').waitFor();
    expect(await page.getByTestId('current-role').textContent()).toBe('Engineer');

    await page.getByRole('button', { name: 'Sign out' }).click();
    await signIn(page, email, 'newcomer-password-1');
  });
});
