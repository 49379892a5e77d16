/**
 * Script payloads entered as data stay inert in the real pages (checked in chromium's
 * DOM, not only in JSON): ASVS 4.0.3 V5.3.3 (output encoding for the HTML context),
 * V5.2.1 (HTML from Markdown sanitised), V14.4.3 (the CSP is a second line).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { launchBrowser, newContext, screenshot, signIn } from './support/browser';

const marker = `Pwnquill${Date.now().toString(36)}`;
const PAYLOADS = [
  '<script>window.__pwned = 1</script>',
  '<img src=x onerror="window.__pwned = 2">',
  '<svg onload="window.__pwned = 3"></svg>',
  '<iframe src="javascript:window.__pwned = 4"></iframe>',
  '[click](javascript:window.__pwned=5)',
  '<a href="data:text/html,<script>alert(6)</script>">data link</a>',
  '"><img src=x onerror="window.__pwned = 7">',
  "' OR 1=1 --",
];
const joined = PAYLOADS.join(' ');

let browser: Browser;
let context: BrowserContext;
let page: Page;
const dialogs: string[] = [];
let ids: { source: string; excerpt: string };

beforeAll(async () => {
  browser = await launchBrowser();
  context = await newContext(browser);
  page = await context.newPage();
  page.on('dialog', (d) => {
    dialogs.push(d.message());
    void d.dismiss();
  });
  await signIn(page, 'contributor');
  // Created from the page itself, as the web client would: session cookie + CSRF token from /api/auth/me.
  ids = await page.evaluate(
    async ({ joined, payloads, marker }) => {
      const me = await (await fetch('/api/auth/me')).json();
      const post = async (url: string, body: object) => {
        const res = await fetch(url, { method: 'POST', headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': me.csrfToken }, body: JSON.stringify(body) });
        const json = await res.json();
        if (res.status !== 201) throw new Error(`${url}: ${res.status} ${JSON.stringify(json)}`);
        return json.data.id as string;
      };
      const source = await post('/api/sources', {
        title: `${marker} ${joined}`.slice(0, 500),
        sourceType: 'treatise',
        creators: [{ name: `Creator ${payloads[1]}`, role: 'author' }],
        dateEdtf: '1702',
        place: `Place ${payloads[2]}`,
        languages: ['en'],
        holdingInstitution: `Library ${payloads[0]}`,
        shelfmark: `Shelf ${payloads[6]}`,
        publication: { publisher: `Publisher ${payloads[3]}`, place: null, edition: null },
        rightsStatement: `Rights ${payloads[5]}`,
      });
      const excerpt = await post(`/api/sources/${source}/excerpts`, {
        locatorType: 'folio',
        locatorValue: '12v',
        diplomatic: `${marker} ${joined}`,
        normalised: `Normalised ${joined}`,
        translation: `Translation ${joined}`,
        translationLanguage: 'en',
        translator: `Translator ${payloads[1]}`,
        commentary: `Commentary ${marker}\n\n${payloads.join('\n\n')}`,
        topics: ['pitch'],
        mentions: [{ term: `Term ${payloads[2]}`.slice(0, 200), language: 'en', sizeSlug: 'alto', note: `Note ${payloads[0]}` }],
        pitchTags: [{ statement: `Statement ${payloads[1]}`, aHz: 415, note: `Pitch note ${payloads[3]}` }],
      });
      return { source, excerpt };
    },
    { joined, payloads: PAYLOADS, marker },
  );
});

afterAll(async () => {
  await context?.close();
  await browser?.close();
});

/** Everything in the DOM that only an injection could have put there. */
async function injected(p: Page): Promise<string[]> {
  return p.evaluate(() => {
    const found: string[] = [];
    for (const el of Array.from(document.querySelectorAll('*'))) {
      const tag = el.tagName.toLowerCase();
      if (tag === 'script' && !(el as HTMLScriptElement).src) found.push('inline <script>');
      if (['iframe', 'object', 'embed', 'frame'].includes(tag)) found.push(`<${tag}>`);
      if (tag === 'img' && (el.getAttribute('src') ?? '') === 'x') found.push('<img src=x>');
      for (const attr of el.getAttributeNames()) {
        const value = (el.getAttribute(attr) ?? '').replace(/\s/g, '').toLowerCase();
        if (attr.startsWith('on')) found.push(`<${tag} ${attr}>`);
        if (/^(javascript|vbscript|data:text)/.test(value)) found.push(`<${tag} ${attr}="${value.slice(0, 30)}">`);
      }
    }
    return found;
  });
}

async function openAndCheck(path: string, shot: string) {
  await page.goto(path);
  await page.getByText(marker, { exact: false }).first().waitFor({ timeout: 20_000 });
  await page.waitForLoadState('networkidle');
  await screenshot(page, shot);
  expect(await injected(page), path).toEqual([]);
  expect(await page.evaluate(() => (window as unknown as { __pwned?: unknown }).__pwned), path).toBeUndefined();
  expect(dialogs, path).toEqual([]);
}

describe('script payloads in a source and an excerpt, in the browser', () => {
  it('the source page shows them as text and runs none', async () => {
    await openAndCheck(`/sources/${ids.source}`, 'security-source');
    // The payload is visible as text: stored as data, encoded on output.
    expect(await page.locator('body').innerText()).toContain('<script>window.__pwned = 1</script>');
  });

  it('the excerpt page (transcription, translation, tags, rendered commentary) runs none', async () => {
    await openAndCheck(`/excerpts/${ids.excerpt}`, 'security-excerpt');
    const text = await page.locator('body').innerText();
    expect(text).toContain('<img src=x onerror="window.__pwned = 2">');
    // The commentary's Markdown link to javascript: is no link.
    expect(await page.locator('a[href^="javascript"]').count()).toBe(0);
  });

  it('the edit forms hold the payloads as field values and run none', async () => {
    await openAndCheck(`/sources/${ids.source}/edit`, 'security-source-edit');
    await openAndCheck(`/excerpts/${ids.excerpt}/edit`, 'security-excerpt-edit');
  });

  it('a search hit (snippet with highlights) runs none', async () => {
    // The outbox worker of the running app indexes the new draft within seconds; its owner finds it.
    await expect
      .poll(async () => {
        await page.goto(`/search?q=${marker}`);
        await page.waitForLoadState('networkidle');
        return page.locator(`a[href*="${ids.excerpt}"]`).count();
      }, { timeout: 30_000, interval: 1000 })
      .toBeGreaterThan(0);
    await page.waitForLoadState('networkidle');
    expect(await injected(page)).toEqual([]);
    expect(await page.evaluate(() => (window as unknown as { __pwned?: unknown }).__pwned)).toBeUndefined();
    expect(dialogs).toEqual([]);
  });
});
