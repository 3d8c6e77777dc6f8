import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { testClientAddress } from './client-address';

export const APP_URL = process.env.APP_URL ?? 'http://127.0.0.1:3100';

// Flags that keep Debian's Chromium quiet on a machine with no outside network.
const CHROMIUM_FLAGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-dev-shm-usage',
];

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  close: () => Promise<void>;
}

export async function openBrowser(): Promise<BrowserSession> {
  const profile = mkdtempSync(join(tmpdir(), 'bandwright-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: CHROMIUM_FLAGS,
    viewport: { width: 1440, height: 900 },
  });
  // Invitations, resets and hand-typed sign-ins of one test file share an address of their own (see signIn).
  await context.setExtraHTTPHeaders({ 'X-Forwarded-For': testClientAddress() });
  const page = context.pages()[0] ?? (await context.newPage());
  page.setDefaultTimeout(30000); // a loaded 2-core machine can take longer than 15 s to render a page with its data
  return {
    context,
    page,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function signIn(page: Page, email: string, password = process.env.DEMO_PASSWORD ?? 'bandwright-demo'): Promise<void> {
  // Each sign-in from an address of its own: the server's per-address sign-in allowance is shared by every test.
  await page.setExtraHTTPHeaders({ 'X-Forwarded-For': testClientAddress() });
  await page.goto(`${APP_URL}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByTestId('current-role').waitFor();
}
