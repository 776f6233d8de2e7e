import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type BrowserContextOptions, type Page } from 'playwright-core';
import { readCaughtMail, type CaughtMail } from '../../backend/src/mail/catcher.js';
import type { Role } from '../../shared/src/roles.js';
import { DEMO_PASSWORD, DEMO_SIGN_INS } from '../../backend/src/seed/demo-scenario.js';

/** Where the server under test answers, e.g. http://localhost:3310. */
export const BASE_URL = process.env.E2E_BASE_URL ?? 'http://localhost:3310';

export type ViewportName = 'phone' | 'desktop';

const VIEWPORTS: Record<ViewportName, BrowserContextOptions> = {
  phone: { viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true },
  desktop: { viewport: { width: 1366, height: 900 }, deviceScaleFactor: 1 },
};

const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** One headless Chromium for a test file; every page gets a context of its own, so its own cookies. */
export interface TestBrowser {
  browser: Browser;
  newPage(options?: { viewport?: ViewportName }): Promise<Page>;
  close(): Promise<void>;
}

export async function launchBrowser(): Promise<TestBrowser> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: CHROMIUM_ARGS,
  });
  const contexts: BrowserContext[] = [];
  return {
    browser,
    async newPage({ viewport = 'desktop' } = {}) {
      const context = await browser.newContext({ ...VIEWPORTS[viewport], baseURL: BASE_URL, locale: 'en-GB', timezoneId: 'Europe/London' });
      context.setDefaultTimeout(10_000);
      contexts.push(context);
      return context.newPage();
    },
    async close() {
      await Promise.allSettled(contexts.map((c) => c.close()));
      await browser.close();
    },
  };
}

/** Fills and sends the sign-in form already on the page; does not wait for the outcome. */
export async function submitSignIn(page: Page, email: string, password: string = DEMO_PASSWORD): Promise<void> {
  const form = page.getByRole('form', { name: 'Sign in' });
  await form.getByLabel('E-mail', { exact: true }).fill(email);
  await form.getByLabel('Password', { exact: true }).fill(password);
  await form.getByRole('button', { name: 'Sign in', exact: true }).click();
}

/** Opens the sign-in page, signs in through its form and waits until the app has left the sign-in page. */
export async function signIn(page: Page, email: string, password: string = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  await submitSignIn(page, email, password);
  await page.waitForURL((url) => url.pathname !== '/sign-in');
  await page.getByRole('form', { name: 'Sign in' }).waitFor({ state: 'detached' });
}

/**
 * A PNG in E2E_SCREENSHOTS, when that is set; returns its path. The whole page by default; with
 * `fullPage: false`, only the screen a person sees, with fixed bars where they really sit.
 */
export async function screenshot(page: Page, name: string, { fullPage = true }: { fullPage?: boolean } = {}): Promise<string | null> {
  const dir = process.env.E2E_SCREENSHOTS;
  if (!dir) return null;
  mkdirSync(dir, { recursive: true });
  const path = join(dir, `${name}.png`);
  // The bundled typeface has loaded before the picture is taken.
  await page.evaluate('document.fonts.ready');
  await page.screenshot({ path, fullPage, animations: 'disabled' });
  return path;
}

/** A unique address on the demo company's invented domain. */
export function uniqueEmail(prefix: string): string {
  return `${prefix}.${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}@kestrel-ridge.example`;
}

export interface ReadMailOptions {
  /** Only messages whose subject matches. */
  subject?: RegExp;
  /** Only messages received at or after this moment. */
  since?: Date;
  timeoutMs?: number;
}

/** Waits for the newest message to `to` in the mail catcher's folder (E2E_MAIL_DIR) and returns it. */
export async function readMail(to: string, options: ReadMailOptions = {}): Promise<CaughtMail> {
  const dir = process.env.E2E_MAIL_DIR;
  if (!dir) throw new Error('E2E_MAIL_DIR is not set: the mail catcher folder is unknown');
  const address = to.toLowerCase();
  const since = options.since?.toISOString();
  const deadline = Date.now() + (options.timeoutMs ?? 10_000);
  for (;;) {
    const found = readCaughtMail(dir).find(
      (mail) =>
        mail.to.toLowerCase().includes(address) &&
        (!options.subject || options.subject.test(mail.subject)) &&
        (!since || mail.receivedAt >= since),
    );
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`No e-mail to ${to} arrived in ${dir}`);
    await new Promise((resolve) => setTimeout(resolve, 150));
  }
}

/** The first link in a message's text that carries a token, e.g. an invitation or a reset link. */
export function tokenLink(mail: CaughtMail): string {
  const link = /https?:\/\/\S+[?&]token=[^\s&]+/.exec(mail.text)?.[0];
  if (!link) throw new Error(`The e-mail "${mail.subject}" has no link with a token`);
  return link;
}

/** A person of the demo as the users API lists them. */
export interface ListedUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  status: string;
  accessExpiresOn: string | null;
}

/**
 * Active people of the demo other than its five sign-ins, with no access end date, by name:
 * tests that change someone's password or preferences use them and leave the sign-ins alone.
 */
export async function demoColleagues(browser: TestBrowser, role: Role): Promise<ListedUser[]> {
  const page = await browser.newPage();
  await signIn(page, DEMO_SIGN_INS.find((s) => s.role === 'administrator')!.email);
  const response = await page.request.get('/api/users', { params: { role, status: 'active', pageSize: 200, sort: 'name' } });
  if (!response.ok()) throw new Error(`Listing users answered ${response.status()}`);
  const { data } = (await response.json()) as { data: ListedUser[] };
  await page.context().close();
  const signIns = new Set(DEMO_SIGN_INS.map((s) => s.email));
  return data.filter((u) => !signIns.has(u.email) && u.accessExpiresOn === null);
}

/** A code no other run has used, in capitals and digits: `E2E-AIR` → `E2E-AIR-K3F9Q2`. */
export function uniqueCode(prefix: string): string {
  const tail = `${Date.now().toString(36).slice(-4)}${Math.random().toString(36).slice(2, 4)}`.toUpperCase();
  return `${prefix}-${tail}`;
}

/** A GET to the API with the page's own session; the body as JSON, or an error naming the status. */
export async function getJson<T>(page: Page, path: string, params?: Record<string, string | number | boolean>): Promise<T> {
  const response = await page.request.get(path, params ? { params } : undefined);
  if (!response.ok()) throw new Error(`GET ${path} answered ${response.status()}: ${await response.text()}`);
  return (await response.json()) as T;
}
