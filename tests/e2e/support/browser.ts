import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { mkdirSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { resolve } from 'node:path';

const require = createRequire(import.meta.url);
const axeSource = readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

export const baseUrl = () => {
  const url = process.env.E2E_BASE_URL;
  if (!url) throw new Error('End-to-end tests need the app that `npm test` starts (E2E_BASE_URL is unset).');
  return url;
};

export const screenshotDir = resolve(import.meta.dirname, '../../.artifacts/screenshots');

export type DemoRole = 'reader' | 'contributor' | 'editor' | 'admin';
export const demoAccount = (role: DemoRole) => ({
  email: `${role}@demo.windway.invalid`,
  password: process.env[`E2E_PASSWORD_${role.toUpperCase()}`] ?? '',
});

/** Debian's chromium, headless, with the flags this closed network needs (no background networking). */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-dev-shm-usage'],
  });
}

export async function newContext(browser: Browser): Promise<BrowserContext> {
  return browser.newContext({ baseURL: baseUrl(), viewport: { width: 1360, height: 900 }, acceptDownloads: true });
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(screenshotDir, { recursive: true });
  await page.screenshot({ path: resolve(screenshotDir, `${name}.png`), fullPage: true });
}

export async function signIn(page: Page, role: DemoRole): Promise<void> {
  const account = demoAccount(role);
  await page.goto('/sign-in');
  const form = page.getByRole('form', { name: 'Sign in' });
  await form.getByLabel('E-mail address').fill(account.email);
  // exact: the form also has a "Show password" switch.
  await form.getByLabel('Password', { exact: true }).fill(account.password);
  await form.getByRole('button', { name: /sign in/i }).click();
  await page.waitForFunction(() => !location.pathname.startsWith('/sign-in'));
}

export interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[] }[];
}

/** Runs axe-core in the page (evaluated over the DevTools protocol, so the CSP stays on) and returns serious and critical violations. */
export async function seriousAxeViolations(page: Page): Promise<AxeViolation[]> {
  await page.evaluate(axeSource);
  const violations = await page.evaluate(async () => {
    const result = await (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: AxeViolation[] }> } }).axe.run(document, {
      resultTypes: ['violations'],
    });
    return result.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.map((n) => ({ target: n.target })) }));
  });
  return violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
}
