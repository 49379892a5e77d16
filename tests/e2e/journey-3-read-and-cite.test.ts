/**
 * Journey 3 (../shared/handbook/product.md): a reader searches for passages about a D-size
 * recorder (the voice flute) at low pitch before 1730, reads one beside its facsimile page,
 * exports a citation with a folio locator as BibTeX, adds it to a programme, writes notes
 * that cite it, and exports the programme with footnotes and a bibliography.
 */
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Download, Locator, Page } from 'playwright-core';
import { screenshot } from './support/browser';
import { actor, eventually, facsimileDrawn, launchBrowser, visible } from './support/journey';
import { ApiSession, approveSource, catalogueAndSubmit, runWord, waitForExtraction } from './support/api';
import { writeFacsimilePdf } from './support/pdf';
import { zipText } from './support/zip';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function download(page: Page, link: Locator): Promise<{ name: string; text: string; bytes: Buffer }> {
  const [file] = await Promise.all([page.waitForEvent('download') as Promise<Download>, link.click()]);
  const path = await file.path();
  const bytes = readFileSync(path);
  return { name: file.suggestedFilename(), text: bytes.toString('utf8'), bytes };
}

/**
 * A card by its heading. Card's doc says its title labels the section, but the <section> has no
 * aria-labelledby, so it is not a named region (reported); the heading finds it either way.
 */
function card(page: Page, heading: string): Locator {
  return page.locator('section').filter({ has: page.getByRole('heading', { name: heading, exact: true }) }).last();
}

describe('journey 3: a reader finds, reads, cites and builds a programme', () => {
  it('searches voice flute ≤ 420 Hz before 1730, reads beside the facsimile, exports BibTeX, and exports a programme with footnotes', async () => {
    const word = runWord('brandscombe');
    const title = `Household book of the music room, ${word}`;

    // ---- The scene: an approved source with passages that do and do not match the reader's question.
    const contributorApi = await ApiSession.signIn('contributor');
    const editorApi = await ApiSession.signIn('editor');
    const pdfPath = await writeFacsimilePdf(`${word}.pdf`, { title, pages: 40, marker: word });
    const { sourceId, excerptIds } = await catalogueAndSubmit(contributorApi, {
      title,
      dateEdtf: '1715/1750',
      pdfPath,
      excerpts: [
        // The one the reader is after: voice flute, a′ = 410 Hz, 1722.
        { folio: '7r', facsimilePage: 13, dateEdtf: '1722-05-02', diplomatic: `For a voice flute to play with the harpsichord at the low chamber pitch, ${word}`, translation: `A voice flute for the harpsichord at low chamber pitch (${word}).`, mentions: [{ term: 'voice flute', language: 'en', sizeSlug: 'voice-flute' }], pitchTags: [{ statement: 'the low chamber pitch', aHz: 410 }] },
        // Voice flute but too late.
        { folio: '15v', facsimilePage: 30, dateEdtf: '1745', diplomatic: `Another voice flute, bought later, ${word}`, mentions: [{ term: 'voice flute', language: 'en', sizeSlug: 'voice-flute' }], pitchTags: [{ statement: 'low pitch', aHz: 415 }] },
        // Voice flute, early enough, but at a high pitch.
        { folio: '3r', facsimilePage: 5, dateEdtf: '1720', diplomatic: `A voice flute at the high organ pitch, ${word}`, mentions: [{ term: 'voice flute', language: 'en', sizeSlug: 'voice-flute' }], pitchTags: [{ statement: 'organ pitch', aHz: 465 }] },
        // Low pitch and early, but an alto.
        { folio: '5r', facsimilePage: 9, dateEdtf: '1721', diplomatic: `A treble flute at the low chamber pitch, ${word}`, mentions: [{ term: 'treble flute', language: 'en', sizeSlug: 'alto' }], pitchTags: [{ statement: 'the low chamber pitch', aHz: 410 }] },
      ],
    });
    await waitForExtraction(contributorApi, sourceId);
    await approveSource(editorApi, sourceId);
    await Promise.all([contributorApi.dispose(), editorApi.dispose()]);
    const wanted = excerptIds[0]!;
    const reader = await actor(browser, 'reader');
    const page = reader.page;
    await eventually(
      async () => {
        const response = await page.request.get(`/api/search?q=${word}`);
        return ((await response.json()) as { total: number }).total === 4;
      },
      { timeout: 20_000, message: 'the approved source did not reach the search index' },
    );

    // ---- Search the whole archive with the page's filters: size by its checkbox, pitch by the
    // slider (keyboard), years by URL; every passage shown must meet all three.
    await page.goto('/search');
    const filters = page.getByRole('complementary', { name: 'Filters' });
    // The box follows the URL (a navigation), so it shows ticked once the URL has changed.
    const voiceFlute = filters.getByRole('checkbox', { name: 'Voice flute' });
    await voiceFlute.click();
    await page.waitForURL(/size=voice-flute/);
    await eventually(() => voiceFlute.isChecked(), { message: 'the Voice flute box is not ticked after filtering' });
    const highest = filters.getByRole('slider', { name: 'Highest a′ in hertz' });
    await highest.focus();
    await page.keyboard.press('End');
    for (let i = 0; i < 60; i += 1) await page.keyboard.press('ArrowLeft');
    expect(await highest.getAttribute('aria-valuetext')).toBe('420 Hz');
    await page.waitForURL(/aMax=420/);
    const url = new URL(page.url());
    url.searchParams.set('to', '1729');
    await page.goto(`${url.pathname}${url.search}`);
    await visible(page.getByRole('heading', { name: /^\d+ passages?$/ }));
    const hits = page.getByRole('article');
    await visible(hits);
    const shown = await hits.count();
    expect(shown).toBeGreaterThan(0);
    for (let i = 0; i < shown; i += 1) {
      const hitText = await hits.nth(i).innerText();
      const tags = await hits.nth(i).locator('dl').innerText();
      expect(tags, `a filtered passage concerns the voice flute: ${hitText}`).toMatch(/Sizes\s[^\n]*Voice flute/);
      const hz = [...tags.matchAll(/a′ = ([\d.]+) Hz/g)].map((m) => Number(m[1]));
      expect(Math.min(...hz), `a filtered passage has a′ ≤ 420 Hz: ${hitText}`).toBeLessThanOrEqual(420);
      const dateLabel = await hits.nth(i).locator('header p').innerText();
      const year = Number(/\d{4}/.exec(dateLabel)?.[0]);
      expect(year, `a filtered passage is from before 1730: ${hitText}`).toBeLessThanOrEqual(1729);
    }
    await screenshot(page, 'j3-01-search-filtered');

    // Narrow to this run's source by a word of it: exactly the one passage that meets all three.
    await page.getByLabel('Words or "a phrase in quotes"').fill(word);
    await page.waitForURL(new RegExp(`q=${word}`));
    await visible(page.getByRole('heading', { name: /^1 passage$/ }));
    const params = new URL(page.url()).searchParams;
    expect(params.getAll('size')).toEqual(['voice-flute']);
    expect(params.get('aMax')).toBe('420');
    expect(params.get('to')).toBe('1729');
    const hit = page.getByRole('article').filter({ has: page.getByRole('link', { name: `${title}, fol. 7r` }) });
    await visible(hit.getByText('Voice flute'));
    await visible(hit.getByText('a′ = 410 Hz'));
    await visible(hit.locator('mark').first());
    await screenshot(page, 'j3-02-search-narrowed');
    // Without the filters, the same word finds all four passages of the source.
    expect(((await (await page.request.get(`/api/search?q=${word}`)).json()) as { total: number }).total).toBe(4);

    // ---- Read it beside its facsimile page
    await hit.getByRole('link', { name: `${title}, fol. 7r` }).click();
    await page.waitForURL(`**/excerpts/${wanted}`);
    await visible(page.getByRole('heading', { level: 1, name: `fol. 7r · ${title}` }));
    const viewer = page.getByRole('toolbar', { name: 'Facsimile controls' });
    await visible(viewer);
    expect(await viewer.getByLabel('Page number').inputValue()).toBe('13');
    await visible(viewer.getByText('of 40', { exact: true }));
    await visible(page.getByRole('img', { name: new RegExp(`${word}\\.pdf, page 13 of 40`) }));
    await facsimileDrawn(page);
    await screenshot(page, 'j3-03-excerpt-beside-facsimile');

    // ---- Cite as BibTeX with the folio locator, and download the .bib
    const cite = card(page, 'Cite');
    await cite.getByLabel('Format').selectOption('bibtex');
    await visible(cite.getByText(/^@\w+\{/));
    expect(await cite.locator('pre').innerText()).toContain('fol. 7r');
    const bib = await download(page, cite.getByRole('link', { name: 'Download .bib' }));
    expect(bib.name).toMatch(/\.bib$/);
    expect(bib.text.trimStart()).toMatch(/^@\w+\{/);
    expect(bib.text).toContain('fol. 7r');
    expect(bib.text).toContain(word);
    await screenshot(page, 'j3-04-cite-bibtex');

    // ---- Add it to a programme (creating one first when the reader has none)
    const programmeTitle = `Voice flute and harpsichord, ${word}`;
    const marker = `[@${wanted}, fol. 7r]`;
    await page.getByRole('button', { name: 'Add to programme' }).click();
    const panel = page.locator('[data-slot="add-to-programme"]');
    await visible(panel.getByRole('button', { name: 'Close' }));
    await panel.getByText(/You have no programme yet|Programme/).first().waitFor();
    if (await panel.getByRole('link', { name: 'Start one' }).count()) await panel.getByRole('link', { name: 'Start one' }).click();
    else await page.goto('/programmes');
    await page.waitForURL('**/programmes');
    await page.getByRole('textbox', { name: 'Title' }).fill(programmeTitle);
    await page.getByRole('button', { name: 'Create' }).click();
    await page.waitForURL(/\/programmes\/[^/]+$/);
    const programmeUrl = new URL(page.url()).pathname;

    await page.goto(`/excerpts/${wanted}`);
    await page.getByRole('button', { name: 'Add to programme' }).click();
    await panel.getByLabel('Programme').selectOption({ label: programmeTitle });
    await panel.getByRole('button', { name: `Add ${marker}` }).click();
    await visible(panel.getByText('Added.'));
    await panel.getByRole('link', { name: 'Open the programme' }).click();
    await page.waitForURL(`**${programmeUrl}`);

    // ---- Notes with a citation marker; the preview shows the footnote and the bibliography
    const notes = page.getByLabel('Programme notes');
    await visible(notes);
    expect(await notes.inputValue()).toContain(marker);
    await notes.fill(
      `## Why a voice flute\n\nA household book of the 1720s buys a voice flute to play with the harpsichord “at the low chamber pitch” ${marker}, about a semitone below modern pitch.\n\nSo tonight the flute part is played on a D recorder at a′ = 410 Hz.\n`,
    );
    const preview = page.getByRole('region', { name: 'Preview' });
    await visible(preview.getByRole('heading', { name: 'Notes' }));
    await visible(preview.getByRole('heading', { name: 'Bibliography' }));
    await visible(preview.getByRole('listitem').filter({ hasText: 'fol. 7r' }));
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await visible(page.getByText('Saved.'));
    await screenshot(page, 'j3-05-programme-notes');

    // ---- Exports: HTML, Word, Markdown and BibTeX
    const exports = card(page, 'Export');
    const html = await download(page, exports.getByRole('link', { name: 'Print-ready HTML' }));
    expect(html.name).toMatch(/\.html$/);
    expect(html.text).toContain(programmeTitle);
    expect(html.text).toMatch(/<sup[^>]*class="footnote-ref"|class="footnote-ref"/);
    expect(html.text).toMatch(/<section class="footnotes">[\s\S]*fol\. 7r[\s\S]*<\/section>/);
    expect(html.text).toMatch(/<section class="bibliography"><h2>Bibliography<\/h2>[\s\S]*<\/section>/);
    expect(html.text).toContain(word);

    const docx = await download(page, exports.getByRole('link', { name: 'Word (.docx)' }));
    expect(docx.name).toMatch(/\.docx$/);
    expect(docx.bytes.subarray(0, 2).toString('latin1')).toBe('PK');
    const footnotesXml = zipText(docx.bytes, 'word/footnotes.xml');
    // Footnotes -1 and 0 are Word's separators; a real note has a positive id.
    expect(footnotesXml).toMatch(/<w:footnote\b[^>]*w:id="[1-9]\d*"/);
    expect(footnotesXml).toContain('fol. 7r');
    const documentXml = zipText(docx.bytes, 'word/document.xml');
    expect(documentXml).toMatch(/<w:footnoteReference\b[^>]*w:id="[1-9]\d*"/);
    expect(documentXml).toContain('Bibliography');

    const markdown = await download(page, exports.getByRole('link', { name: 'Markdown' }));
    expect(markdown.name).toMatch(/\.md$/);
    expect(markdown.text).toMatch(/\[\^1\]/);
    expect(markdown.text).toMatch(/^\[\^1\]: .*fol\. 7r/m);
    expect(markdown.text).toMatch(/^## Bibliography/m);

    const programmeBib = await download(page, exports.getByRole('link', { name: 'BibTeX (.bib)' }));
    expect(programmeBib.name).toMatch(/\.bib$/);
    expect(programmeBib.text.trimStart()).toMatch(/^@\w+\{/);
    expect(programmeBib.text).toContain(word);
    await screenshot(page, 'j3-06-programme-exported');
    await reader.context.close();
  });
});
