/**
 * Everything by keyboard (WCAG 2.1.1, 2.4.1, 2.4.7): the skip link moves focus to the main
 * content; a reader signs in and runs a search with Tab, typing and Enter only; every element
 * that takes focus on the way shows a visible focus indicator.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { demoAccount, screenshot } from './support/browser';
import { actor, launchBrowser, visible } from './support/journey';
import { buildScene, type Scene } from './support/api';

let browser: Browser;
let scene: Scene;
beforeAll(async () => {
  browser = await launchBrowser();
  scene = await buildScene('kbd');
});
afterAll(async () => {
  await browser?.close();
});

interface Focused {
  tag: string;
  id: string;
  type: string;
  name: string;
  inMain: boolean;
  /** An outline or a box-shadow ring is drawn, and the element is on screen. */
  ringVisible: boolean;
  onScreen: boolean;
}

/** What has focus now, read from the page (reading only: the keys do the work). */
function focused(page: Page): Promise<Focused> {
  return page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el || el === document.body) return { tag: 'body', id: '', type: '', name: '', inMain: false, ringVisible: false, onScreen: false };
    const style = getComputedStyle(el);
    const outline = style.outlineStyle !== 'none' && parseFloat(style.outlineWidth) > 0;
    const ring = !!style.boxShadow && style.boxShadow !== 'none';
    const box = el.getBoundingClientRect();
    const labels = (el as HTMLInputElement).labels;
    const name = (el.getAttribute('aria-label') || (labels && labels[0]?.innerText) || el.innerText || el.getAttribute('title') || '').trim().replace(/\s+/g, ' ').slice(0, 80);
    return {
      tag: el.tagName.toLowerCase(),
      id: el.id,
      type: el.getAttribute('type') ?? '',
      name,
      inMain: !!el.closest('main'),
      ringVisible: outline || ring,
      onScreen: box.width > 1 && box.height > 1,
    };
  });
}

const describeFocus = (f: Focused) => `<${f.tag}${f.type ? ` type=${f.type}` : ''}${f.id ? ` id=${f.id}` : ''}> “${f.name}”`;

/**
 * Presses Tab (or Shift+Tab) until `wanted` has focus; every stop on the way must show its focus
 * (<main>, focused by script after a navigation and never by Tab, is the one exception).
 */
async function tabTo(page: Page, wanted: (f: Focused) => boolean, what: string, unringed: string[], options: { max?: number; back?: boolean } = {}): Promise<Focused> {
  const max = options.max ?? 80;
  for (let i = 0; i < max; i += 1) {
    await page.keyboard.press(options.back ? 'Shift+Tab' : 'Tab');
    const f = await focused(page);
    if (f.tag !== 'body' && f.id !== 'main' && (!f.ringVisible || !f.onScreen)) unringed.push(`${new URL(page.url()).pathname} ${describeFocus(f)}`);
    if (wanted(f)) return f;
  }
  expect.fail(`${what} was not reached with ${max} presses of ${options.back ? 'Shift+Tab' : 'Tab'}`);
}

/** After a client-side navigation the layout moves focus to <main>; wait for it before pressing Tab again. */
async function focusMovedToMain(page: Page): Promise<void> {
  await page.waitForFunction(() => document.activeElement?.id === 'main', undefined, { timeout: 5000 });
}

describe('keyboard use', () => {
  it('skip link moves focus to the main content', async () => {
    const { context, page } = await actor(browser);
    await page.goto('/');
    await visible(page.getByRole('heading', { level: 1 }));
    // On a fresh page nothing has focus yet, so the first Tab lands on the skip link.
    expect.soft((await focused(page)).tag, 'focus on a freshly loaded page').toBe('body');
    await page.keyboard.press('Tab');
    let skip = await focused(page);
    expect.soft(skip.name, 'the first Tab on a fresh page reaches the skip link').toBe('Skip to content');
    // Whatever took the first Tab, the skip link must be reachable: go back to it.
    if (skip.name !== 'Skip to content') skip = await tabTo(page, (f) => f.name === 'Skip to content', 'The skip link', [], { back: true });
    expect(skip.name).toBe('Skip to content');
    expect(skip.onScreen, 'the skip link is shown when it has focus').toBe(true);
    expect(skip.ringVisible, 'the skip link shows its focus').toBe(true);
    await screenshot(page, 'kbd-01-skip-link');
    await page.keyboard.press('Enter');
    expect((await focused(page)).id).toBe('main');
    // The next Tab continues inside the main content, past the header and navigation.
    await page.keyboard.press('Tab');
    expect((await focused(page)).inMain).toBe(true);
    await context.close();
  });

  it('signs in and runs a search with Tab, typing and Enter only, with visible focus throughout', async () => {
    const { context, page } = await actor(browser);
    const account = demoAccount('reader');
    const unringed: string[] = [];
    await page.goto('/');
    await visible(page.getByRole('heading', { level: 1 }));

    // ---- Sign in
    await tabTo(page, (f) => f.tag === 'a' && f.name === 'Sign in', 'The “Sign in” link', unringed);
    await page.keyboard.press('Enter');
    await page.waitForURL('**/sign-in**');
    await focusMovedToMain(page);
    await tabTo(page, (f) => f.tag === 'input' && f.name.startsWith('E-mail address'), 'The e-mail field', unringed);
    await page.keyboard.type(account.email);
    await tabTo(page, (f) => f.tag === 'input' && f.type === 'password', 'The password field', unringed);
    await page.keyboard.type(account.password);
    await screenshot(page, 'kbd-02-sign-in-focus');
    await page.keyboard.press('Enter');
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
    await visible(page.getByRole('link', { name: 'Programmes' }));
    await focusMovedToMain(page);

    // ---- Search
    await tabTo(page, (f) => f.tag === 'a' && f.name === 'Search' && !f.inMain, 'The “Search” link of the main navigation', unringed);
    await page.keyboard.press('Enter');
    await page.waitForURL('**/search');
    await focusMovedToMain(page);
    await tabTo(page, (f) => f.tag === 'input' && f.type === 'search', 'The search field', unringed);
    await page.keyboard.type(scene.word);
    await page.keyboard.press('Enter');
    await visible(page.getByRole('heading', { name: /^2 passages/ }));
    expect(new URL(page.url()).searchParams.get('q')).toBe(scene.word);

    // A filter, by keyboard: Space ticks the size's box.
    await tabTo(page, (f) => f.type === 'checkbox' && f.name === 'Voice flute', 'The “Voice flute” filter', unringed);
    await page.keyboard.press('Space');
    await page.waitForURL(/size=voice-flute/);
    await visible(page.getByRole('heading', { name: /^1 passage$/ }));
    await screenshot(page, 'kbd-03-search-by-keyboard');

    // ---- Open the result
    await tabTo(page, (f) => f.tag === 'a' && f.name === `${scene.title}, fol. 4r`, 'The result link', unringed);
    await page.keyboard.press('Enter');
    await page.waitForURL(`**/excerpts/${scene.approvedExcerptId}`);
    await visible(page.getByRole('heading', { level: 1, name: `fol. 4r · ${scene.title}` }));
    // After a client-side navigation, focus starts at the new page's main content.
    await focusMovedToMain(page);
    await screenshot(page, 'kbd-04-result-opened');

    expect(unringed, 'elements that took focus without a visible focus indicator').toEqual([]);
    await context.close();
  });
});
