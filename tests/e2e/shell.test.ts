import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, newContext, screenshot, seriousAxeViolations, signIn } from './support/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('the app shell in a real browser', () => {
  it('shows the fictional-demo notice and signs each role in, with role-aware navigation', async () => {
    const context = await newContext(browser);
    const page = await context.newPage();
    await page.goto('/');
    await expect.poll(() => page.getByText(/fictional/i).first().isVisible()).toBe(true);
    await screenshot(page, 'home-anonymous');

    await signIn(page, 'editor');
    const nav = page.getByRole('navigation').first();
    await expect.poll(() => nav.getByRole('link', { name: 'Review' }).isVisible()).toBe(true);
    await screenshot(page, 'home-editor');
    await context.close();

    const readerContext = await newContext(browser);
    const readerPage = await readerContext.newPage();
    await signIn(readerPage, 'reader');
    expect(await readerPage.getByRole('navigation').first().getByRole('link', { name: 'Review' }).count()).toBe(0);
    await readerContext.close();
  });

  it('has no serious or critical accessibility violations on the home and sign-in pages (axe-core)', async () => {
    const context = await newContext(browser);
    const page = await context.newPage();
    for (const path of ['/', '/sign-in', '/register', '/reckoner']) {
      await page.goto(path);
      await page.waitForLoadState('networkidle');
      expect(await seriousAxeViolations(page), path).toEqual([]);
    }
    await context.close();
  });
});
