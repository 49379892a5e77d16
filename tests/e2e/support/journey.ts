/** Small helpers the journeys share: the browser per file, polling, a signed-in page per role. */
import type { Browser, BrowserContext, Locator, Page } from 'playwright-core';
import { expect } from 'vitest';
import { launchBrowser, newContext, signIn, type DemoRole } from './browser';

export interface Actor {
  context: BrowserContext;
  page: Page;
}

/** A fresh browser context (own cookies) with one page, optionally signed in as a demo role. */
export async function actor(browser: Browser, role?: DemoRole): Promise<Actor> {
  const context = await newContext(browser);
  const page = await context.newPage();
  if (role) await signIn(page, role);
  return { context, page };
}

export { launchBrowser };

/** Waits until the locator is visible (Playwright's own auto-wait, with a readable failure). */
export async function visible(locator: Locator, timeout = 15_000): Promise<Locator> {
  await locator.first().waitFor({ state: 'visible', timeout });
  return locator;
}

/** Polls `check` until it returns true, for server-side effects (search index, mail). */
export async function eventually(check: () => Promise<boolean>, options: { timeout?: number; interval?: number; message: string }): Promise<void> {
  const deadline = Date.now() + (options.timeout ?? 15_000);
  for (;;) {
    if (await check().catch(() => false)) return;
    if (Date.now() > deadline) expect.fail(options.message);
    await new Promise((r) => setTimeout(r, options.interval ?? 250));
  }
}

/** The first http(s) link in a captured mail's text. */
export function linkIn(text: string): URL {
  const match = /https?:\/\/\S+/.exec(text);
  if (!match) expect.fail(`No link in the mail:\n${text}`);
  return new URL(match[0].replace(/[).,]+$/, ''));
}

/** Waits until every facsimile viewer on the page has opened its file and drawn its page. */
export async function facsimileDrawn(page: Page, timeout = 20_000): Promise<void> {
  await page.getByRole('toolbar', { name: 'Facsimile controls' }).first().waitFor({ timeout });
  const busy = page.getByText(/^(Opening the facsimile|Drawing page \d+)…$/);
  await eventually(async () => (await busy.count()) === 0, { timeout, message: 'the facsimile page was not drawn' });
}
