/**
 * Journey 1 (../shared/handbook/product.md): a contributor signs up, is given the contributor
 * role by an admin, catalogues a source, uploads a 40-page PDF facsimile, adds three excerpts
 * tagged by size, pitch and date, and submits — all in the browser.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { screenshot } from './support/browser';
import { actor, eventually, facsimileDrawn, launchBrowser, visible } from './support/journey';
import { runWord } from './support/api';
import { writeFacsimilePdf } from './support/pdf';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

interface ExcerptPlan {
  folio: string;
  page: number;
  diplomatic: string;
  translation: string;
  date: string;
  term: string;
  /** Either a size picked from the list, or a relative phrase the picker resolves. */
  size: { slug: string } | { phrase: string; expectSlug: string; expectName: RegExp };
  pitch: { statement: string; hz: string };
}

async function addExcerpt(page: Page, sourceId: string, plan: ExcerptPlan, shot?: string): Promise<string> {
  await page.goto(`/sources/${sourceId}`);
  await page.getByRole('link', { name: 'Add an excerpt' }).first().click();
  await page.waitForURL(`**/sources/${sourceId}/excerpts/new`);
  const form = page.getByRole('form', { name: 'New excerpt' });
  await visible(form);

  await form.getByLabel('Locator type').selectOption('folio');
  await form.getByLabel('Locator', { exact: true }).fill(plan.folio);
  await visible(form.getByText(`Cited as fol. ${plan.folio}`));
  await form.getByLabel(/^Facsimile page/).fill(String(plan.page));
  await form.getByLabel('Diplomatic transcription').fill(plan.diplomatic);
  await form.getByLabel(/^Translation/).fill(plan.translation);
  await form.getByLabel('Language of the translation').fill('en');

  await form.getByLabel(/Its own date/).check();
  await form.getByLabel('Date of the passage (EDTF)').fill(plan.date);
  await visible(form.getByText(/Reads as/));

  await form.getByRole('button', { name: 'Add an instrument mention' }).click();
  await form.getByLabel('Mention 1: term as written').fill(plan.term);
  await form.getByLabel('Mention 1: certainty').selectOption('certain');
  if ('slug' in plan.size) {
    await form.getByLabel('Mention 1: size').selectOption(plan.size.slug);
  } else {
    await form.getByLabel(/Describe the size relative to another/).fill(plan.size.phrase);
    await form.getByRole('button', { name: 'Propose a size' }).click();
    const use = form.getByRole('button', { name: plan.size.expectName });
    await visible(use);
    await use.click();
    expect(await form.getByLabel('Mention 1: size').inputValue()).toBe(plan.size.expectSlug);
  }

  await form.getByRole('button', { name: 'Add a pitch tag' }).click();
  await form.getByLabel('Tag 1: what the source says').fill(plan.pitch.statement);
  await form.getByLabel('Tag 1: a′ in Hz').fill(plan.pitch.hz);
  if (shot) {
    await facsimileDrawn(page);
    await screenshot(page, shot);
  }

  await form.getByRole('button', { name: 'Save excerpt' }).click();
  await page.waitForURL(/\/excerpts\/E[0-9A-Z]{7}$/);
  await visible(page.getByText('The excerpt was saved as a draft.'));
  return new URL(page.url()).pathname.split('/').pop()!;
}

describe('journey 1: a contributor catalogues a source and submits it', () => {
  it('signs up, is promoted, catalogues, uploads a 40-page PDF, adds three tagged excerpts and submits', async () => {
    const word = runWord('quaintance');
    const title = `Inventory of the consort chest, ${word}`;
    const name = `Agathe Voorhelm ${word}`;
    const email = `${word}@example.test`;
    const pdfPath = await writeFacsimilePdf(`${word}.pdf`, { title, pages: 40, marker: word });

    // ---- Sign up (a reader at first)
    const contributor = await actor(browser);
    const page = contributor.page;
    await page.goto('/register');
    await page.getByLabel('Name').fill(name);
    await page.getByLabel('E-mail address').fill(email);
    await page.getByLabel('Password', { exact: true }).fill(`recorder chest ${word} in the attic`);
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL('**/account');
    await screenshot(page, 'j1-01-registered');

    // ---- The admin gives the new account the contributor role in the Users table
    const admin = await actor(browser, 'admin');
    await admin.page.goto('/admin/users');
    await admin.page.getByLabel('Name or e-mail').fill(email);
    await admin.page.getByRole('button', { name: 'Apply' }).click();
    const roleSelect = admin.page.getByLabel(`Role of ${name}`);
    await visible(roleSelect);
    expect(await roleSelect.inputValue()).toBe('reader');
    await roleSelect.selectOption('contributor');
    await visible(admin.page.getByText(`${name} is now contributor.`));
    await screenshot(admin.page, 'j1-02-admin-promoted');
    await admin.context.close();

    // ---- The new contributor sees Contribute
    await page.goto('/');
    const nav = page.getByRole('navigation', { name: 'Main' });
    await visible(nav.getByRole('link', { name: 'Contribute' }));
    await nav.getByRole('link', { name: 'Contribute' }).click();
    await page.waitForURL('**/contribute');

    // ---- The source form
    const form = page.getByRole('form', { name: 'New source' });
    await visible(form);
    await form.getByLabel('Title').fill(title);
    await form.getByLabel('Kind of source').selectOption('inventory');
    await form.getByRole('button', { name: 'Add a creator' }).click();
    await form.getByLabel('Creator 1: name').fill('Hieronymus Quaintance');
    await form.getByLabel('Creator 1: role').selectOption('scribe');
    await form.getByLabel('Date (EDTF)').fill('1712-03');
    await visible(form.getByText(/Reads as/));
    await form.getByLabel('Place').fill('Leiden');
    await form.getByLabel('Languages', { exact: true }).fill('nl');
    await form.getByLabel('Languages', { exact: true }).press('Enter');
    await visible(form.getByRole('list', { name: 'Languages chosen' }).getByText('Dutch'));
    await form.getByLabel('Holding institution').fill('Fictional Regional Archive of Windway');
    await form.getByLabel('Shelfmark').fill(`Inv. ${word} 12`);
    await form.getByLabel('Rights statement').fill('Fictional document made for testing; reproduced freely.');
    await form.getByLabel('Who may see the facsimile').selectOption('public');
    await screenshot(page, 'j1-03-source-form');
    await form.getByRole('button', { name: 'Save as draft' }).click();
    await page.waitForURL(/\/sources\/S[0-9A-Z]{7}$/);
    const sourceId = new URL(page.url()).pathname.split('/').pop()!;
    await visible(page.getByText('The source was saved as a draft.'));
    await visible(page.getByRole('heading', { level: 1, name: title }));
    await visible(page.getByText('Draft', { exact: true }));

    // ---- Upload the 40-page facsimile, with the rights confirmation; watch the progress bar
    const upload = page.getByRole('form', { name: 'Upload a facsimile' });
    await upload.getByLabel('Facsimile file').setInputFiles(pdfPath);
    await upload.getByRole('button', { name: 'Upload' }).click();
    // Without the confirmation, the upload is refused in the form.
    await visible(upload.getByText('Confirm that you may share this facsimile'));
    await upload.getByLabel(/I confirm I may share this facsimile/).check();
    // Slow the upload down, so the progress bar is seen moving.
    const cdp = await contributor.context.newCDPSession(page);
    await cdp.send('Network.enable');
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 20, downloadThroughput: -1, uploadThroughput: 20 * 1024 });
    await upload.getByRole('button', { name: 'Upload' }).click();
    const progress = upload.getByRole('progressbar', { name: /^Uploading / });
    await visible(progress);
    // Part-way: the bar says how far it is, and its fill shows as much.
    await eventually(async () => Number((await progress.getAttribute('aria-valuenow')) ?? 0) >= 20, { timeout: 20_000, message: 'the upload progress never passed 20 %' });
    await page.waitForTimeout(350); // the fill's width transition
    const fill = await progress.evaluate((bar) => {
      const inner = bar.firstElementChild as HTMLElement;
      return { value: Number(bar.getAttribute('aria-valuenow')), track: bar.getBoundingClientRect().width, filled: inner.getBoundingClientRect().width };
    });
    await screenshot(page, 'j1-04-upload-progress');
    expect(fill.value).toBeLessThan(100);
    expect(fill.filled / fill.track, `a bar at ${fill.value} % is drawn that full`).toBeGreaterThan(0.1);
    await progress.waitFor({ state: 'detached', timeout: 60_000 });
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
    await visible(upload.getByText(`${word}.pdf was uploaded.`));
    // Text extraction runs in the background; the list polls it to the end.
    await visible(page.getByText('Text extracted from 40 pages.'), 60_000);
    await visible(page.getByText(/PDF · .* · 40 pages/));
    await page.getByRole('button', { name: `View ${word}.pdf` }).click();
    await visible(page.getByRole('toolbar', { name: 'Facsimile controls' }));
    await visible(page.getByText('of 40', { exact: true }));
    await facsimileDrawn(page);
    await visible(page.getByRole('img', { name: new RegExp(`^${word}\\.pdf, page 1 of 40$`) }));
    await screenshot(page, 'j1-05-facsimile-extracted');

    // ---- Three excerpts, tagged by size, pitch and date, with folio locators
    const plans: ExcerptPlan[] = [
      {
        folio: '3r',
        page: 5,
        diplomatic: `Item een stemfluyt, een kleyne terts onder de gemeene fluyt, ${word}`,
        translation: `Item, a voice flute, a minor third below the common flute (${word}).`,
        date: '1712-03-14',
        term: 'stemfluyt',
        size: { phrase: 'a minor third below the alto', expectSlug: 'voice-flute', expectName: /^Use Voice flute/ },
        pitch: { statement: 'op de lage kamertoon', hz: '415' },
      },
      {
        folio: '4v',
        page: 8,
        diplomatic: `Item twee handfluyten in f, in een foedraal, ${word}`,
        translation: `Item, two hand flutes in F, in a case (${word}).`,
        date: '1712-03',
        term: 'handfluyten in f',
        size: { slug: 'alto' },
        pitch: { statement: 'gestemt op de kamertoon', hz: '410' },
      },
      {
        folio: '7r',
        page: 13,
        diplomatic: `Item een basfluyt met een koperen sleutel, ${word}`,
        translation: `Item, a bass flute with a brass key (${word}).`,
        date: '1712~',
        term: 'basfluyt',
        size: { slug: 'bass' },
        pitch: { statement: 'met de anderen gelijk', hz: '415' },
      },
    ];
    const excerptIds: string[] = [];
    for (const [i, plan] of plans.entries()) excerptIds.push(await addExcerpt(page, sourceId, plan, i === 0 ? 'j1-06-excerpt-form' : undefined));
    await screenshot(page, 'j1-07-excerpt-saved');

    // The first excerpt's page shows its tags: the size from the phrase, the pitch and the date.
    await page.goto(`/excerpts/${excerptIds[0]}`);
    const tags = page.getByRole('region', { name: 'Tags' });
    await visible(tags.getByText(/Voice flute/));
    await visible(tags.getByText(/415/));

    // ---- Submit the source with its excerpts
    await page.goto(`/sources/${sourceId}`);
    const excerptsList = page.getByRole('region', { name: 'Excerpts' });
    for (const folio of ['3r', '4v', '7r']) await visible(excerptsList.getByRole('link', { name: `fol. ${folio}` }));
    await page.getByRole('button', { name: 'Submit for review' }).click();
    await visible(page.getByText(/Submitted for review with 3 excerpts\. Editors have been told\./));
    await visible(page.getByText('Awaiting review', { exact: true }).first());
    await page.reload();
    await visible(page.getByRole('heading', { level: 1, name: title }));
    await visible(page.getByText('Awaiting review', { exact: true }).first());
    expect(await page.getByRole('button', { name: 'Submit for review' }).count()).toBe(0);
    await screenshot(page, 'j1-08-awaiting-review');

    // My submissions lists the source as awaiting review.
    await page.goto('/submissions');
    const item = page.getByRole('listitem').filter({ has: page.getByRole('link', { name: title }) });
    await visible(item.getByText('Awaiting review'));
    await screenshot(page, 'j1-09-my-submissions');
    await contributor.context.close();
  });
});
