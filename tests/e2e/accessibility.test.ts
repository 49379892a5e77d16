/**
 * axe-core on every main page, each in the state a person would meet it (search with results,
 * forms with their repeatable parts opened, facsimiles drawn), as the role that uses it:
 * no serious or critical violations. axe's label rules check that every form field has a label.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { screenshot, seriousAxeViolations, type DemoRole } from './support/browser';
import { actor, facsimileDrawn, launchBrowser, visible, type Actor } from './support/journey';
import { buildScene, type Scene } from './support/api';

let browser: Browser;
let scene: Scene;
const actors = new Map<DemoRole | 'anonymous', Actor>();

beforeAll(async () => {
  browser = await launchBrowser();
  scene = await buildScene('axe');
});
afterAll(async () => {
  for (const a of actors.values()) await a.context.close();
  await browser?.close();
});

async function pageAs(role: DemoRole | 'anonymous'): Promise<Page> {
  let a = actors.get(role);
  if (!a) {
    a = await actor(browser, role === 'anonymous' ? undefined : role);
    actors.set(role, a);
  }
  return a.page;
}

interface Check {
  name: string;
  role: DemoRole | 'anonymous';
  path: (s: Scene) => string;
  /** Brings the page to the state to check: loaded data, opened parts. */
  ready?: (page: Page, s: Scene) => Promise<void>;
}

const checks: Check[] = [
  { name: 'home', role: 'anonymous', path: () => '/', ready: (p) => visible(p.getByRole('heading', { level: 1 })).then(() => undefined) },
  { name: 'sign-in', role: 'anonymous', path: () => '/sign-in', ready: (p) => visible(p.getByRole('form', { name: 'Sign in' })).then(() => undefined) },
  {
    name: 'search with results',
    role: 'anonymous',
    path: (s) => `/search?q=${s.word}`,
    ready: async (p, s) => {
      await visible(p.getByRole('heading', { name: /^2 passages/ }));
      await visible(p.getByRole('link', { name: `${s.title}, fol. 4r` }));
    },
  },
  {
    name: 'source page (with its facsimile open)',
    role: 'anonymous',
    path: (s) => `/sources/${s.approvedSourceId}`,
    ready: async (p, s) => {
      await visible(p.getByRole('heading', { level: 1, name: s.title }));
      await p.getByRole('button', { name: /^View / }).first().click();
      await facsimileDrawn(p);
    },
  },
  {
    name: 'excerpt page (beside its facsimile, with the cite panel)',
    role: 'reader',
    path: (s) => `/excerpts/${s.approvedExcerptId}`,
    ready: async (p) => {
      await visible(p.getByRole('heading', { name: 'Cite', exact: true }));
      await facsimileDrawn(p);
      await p.getByRole('button', { name: 'Add to programme' }).click();
      await visible(p.getByLabel('Programme', { exact: true }));
    },
  },
  {
    name: 'contribute: source form',
    role: 'contributor',
    path: () => '/contribute',
    ready: async (p) => {
      const form = p.getByRole('form', { name: 'New source' });
      await visible(form);
      await form.getByRole('button', { name: 'Add a creator' }).click();
      await form.getByRole('button', { name: 'Old Style date helper' }).click();
      await form.getByLabel('Kind of source').selectOption('treatise');
      await visible(form.getByLabel(/^Publisher or printer/));
      // Submitting empty shows the error summary and inline messages, which must stay accessible too.
      await form.getByRole('button', { name: 'Save as draft' }).click();
      await visible(p.getByText('Please check these fields'));
    },
  },
  {
    name: 'contribute: excerpt editor beside the facsimile',
    role: 'contributor',
    path: (s) => `/sources/${s.draftSourceId}/excerpts/new`,
    ready: async (p) => {
      const form = p.getByRole('form', { name: 'New excerpt' });
      await visible(form);
      await form.getByRole('button', { name: 'Add an instrument mention' }).click();
      await form.getByLabel(/Describe the size relative to another/).fill('a fourth below the alto');
      await form.getByRole('button', { name: 'Propose a size' }).click();
      await visible(form.getByRole('button', { name: /^Use / }));
      await form.getByRole('button', { name: 'Add a pitch tag' }).click();
      await form.getByLabel('Tag 1: a′ in Hz').fill('415');
      await form.getByLabel(/Its own date/).check();
      await facsimileDrawn(p);
    },
  },
  {
    name: 'my submissions',
    role: 'contributor',
    path: () => '/submissions',
    ready: (p, s) => visible(p.getByRole('link', { name: `Awaiting review: ${s.title}` })).then(() => undefined),
  },
  {
    name: 'review queue',
    role: 'editor',
    path: () => '/review',
    ready: (p, s) => visible(p.getByRole('link', { name: `Awaiting review: ${s.title}` })).then(() => undefined),
  },
  {
    name: 'review page of a source',
    role: 'editor',
    path: (s) => `/review/source/${s.submittedSourceId}`,
    ready: async (p) => {
      await visible(p.getByRole('form', { name: 'Decision' }));
      await facsimileDrawn(p);
      await p.getByRole('button', { name: 'Comment on Title', exact: true }).click();
      await p.getByRole('radio', { name: /Return for changes/ }).check();
    },
  },
  {
    name: 'review page of an excerpt',
    role: 'editor',
    path: (s) => `/review/excerpt/${s.submittedExcerptId}`,
    ready: async (p) => {
      await visible(p.getByRole('form', { name: 'Decision' }));
      await facsimileDrawn(p);
    },
  },
  {
    name: 'programmes list',
    role: 'reader',
    path: () => '/programmes',
    ready: (p, s) => visible(p.getByRole('link', { name: `Programme: ${s.title}` })).then(() => undefined),
  },
  {
    name: 'programme editor (with its preview)',
    role: 'reader',
    path: (s) => `/programmes/${s.programmeId}`,
    ready: async (p) => {
      await visible(p.getByLabel('Programme notes'));
      await visible(p.getByRole('region', { name: 'Preview' }).getByRole('heading', { name: 'Bibliography' }));
      await p.getByRole('button', { name: 'Add a piece' }).click();
    },
  },
  {
    name: 'reckoner',
    role: 'anonymous',
    path: () => '/reckoner',
    ready: (p) => visible(p.getByRole('heading', { level: 1 })).then(() => undefined),
  },
  {
    name: 'concordance',
    role: 'anonymous',
    path: () => '/concordance',
    ready: (p) => visible(p.getByRole('heading', { level: 1 })).then(() => undefined),
  },
  {
    name: 'admin users',
    role: 'admin',
    path: () => '/admin/users',
    ready: (p) => visible(p.getByRole('combobox', { name: /^Role of / })).then(() => undefined),
  },
];

describe('accessibility (axe-core): no serious or critical violations', () => {
  it.each(checks)('$name', async (check) => {
    const page = await pageAs(check.role);
    await page.goto(check.path(scene));
    await page.waitForLoadState('networkidle');
    await check.ready?.(page, scene);
    await page.waitForLoadState('networkidle');
    await screenshot(page, `axe-${check.name.replace(/[^a-z0-9]+/gi, '-').replace(/-+$/, '').toLowerCase()}`);
    expect(await seriousAxeViolations(page), `${check.name} (${page.url()})`).toEqual([]);
  });
});
