/**
 * Journey 2 (../shared/handbook/product.md): an editor is e-mailed about a new submission,
 * opens the review from the mail, returns one excerpt with a comment; the contributor is
 * e-mailed, reads the comment on My submissions, fixes the excerpt and resubmits; the editor
 * approves; the source is searchable within seconds. Mail goes over real SMTP to the capture.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { waitForMail } from '../support/mail';
import { baseUrl, demoAccount, screenshot } from './support/browser';
import { actor, facsimileDrawn, launchBrowser, linkIn, visible } from './support/journey';
import { ApiSession, catalogueAndSubmit, runWord } from './support/api';
import { writeFacsimilePdf } from './support/pdf';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Mail links must lead to this app; when they do not, the journey still goes on by the link's path. */
function appPath(link: URL): string {
  expect.soft(link.origin, `the mail links to ${link.href}, not to the app at ${baseUrl()}`).toBe(new URL(baseUrl()).origin);
  return `${link.pathname}${link.search}`;
}

describe('journey 2: review by e-mail, return, fix, resubmit, approve', () => {
  it('returns one excerpt with a comment, the contributor fixes and resubmits it, the editor approves, and search finds it within seconds', async () => {
    const word = runWord('havelund');
    const fixWord = runWord('corrected');
    const title = `Account of the chapel music, ${word}`;
    const editorEmail = demoAccount('editor').email;
    const contributorEmail = demoAccount('contributor').email;

    // ---- The scene: the demo contributor has catalogued a source with three excerpts and submitted it.
    const contributorApi = await ApiSession.signIn('contributor');
    const pdfPath = await writeFacsimilePdf(`${word}.pdf`, { title, pages: 40, marker: word });
    const submittedAt = Date.now();
    const { sourceId, excerptIds } = await catalogueAndSubmit(contributorApi, {
      title,
      dateEdtf: '1718',
      pdfPath,
      excerpts: [
        { folio: '2r', facsimilePage: 3, diplomatic: `Paid for a voice flute for the chapel, ${word}`, mentions: [{ term: 'voice flute', language: 'en', sizeSlug: 'voice-flute' }], pitchTags: [{ statement: 'at chapel pitch', aHz: 415 }] },
        { folio: '5v', facsimilePage: 10, diplomatic: `Paid for mending the treble flute, ${word}`, translation: 'Paid for mending the treble flute (draft translation).', mentions: [{ term: 'treble flute', language: 'en', sizeSlug: 'alto' }], pitchTags: [{ statement: 'at the old pitch', aHz: 408 }] },
        { folio: '9r', facsimilePage: 17, diplomatic: `Paid for a new bass flute, ${word}`, mentions: [{ term: 'bass flute', language: 'en', sizeSlug: 'bass' }], pitchTags: [{ statement: 'to match the organ', aHz: 415 }] },
      ],
    });
    await contributorApi.dispose();
    const returnedId = excerptIds[1]!;

    // Readers cannot find it before it is approved.
    const reader = await actor(browser);
    await reader.page.goto(`/search?q=${word}`);
    await visible(reader.page.getByRole('heading', { name: /^0 passages/ }));

    // ---- The editor's mail about the new submission, and its link to the review
    const notice = await waitForMail(editorEmail, new RegExp(`^New submission to review: ${title}`), 15_000);
    expect(notice.subject).toContain('with 3 excerpts');
    const reviewLink = linkIn(notice.text);
    expect(reviewLink.pathname).toBe(`/review/source/${sourceId}`);

    const editor = await actor(browser, 'editor');
    await editor.page.goto(appPath(reviewLink));
    await visible(editor.page.getByRole('heading', { level: 1, name: title }));
    await visible(editor.page.getByText(/Review · Source · Awaiting review/));
    await facsimileDrawn(editor.page);
    await screenshot(editor.page, 'j2-01-review-source');

    // ---- Return ONE excerpt (fol. 5v) with a comment, and a comment on its translation
    await editor.page.getByRole('region', { name: 'Excerpts' }).getByRole('link', { name: 'fol. 5v' }).click();
    await editor.page.waitForURL(`**/review/excerpt/${returnedId}`);
    await visible(editor.page.getByText(/Review · Excerpt · Awaiting review/));
    await editor.page.getByRole('button', { name: 'Comment on Translation', exact: true }).click();
    const decision = editor.page.getByRole('form', { name: 'Decision' });
    await decision.getByLabel('Translation', { exact: true }).fill('Say which flute: “treble flute” is the alto recorder here, not a transverse flute.');
    await decision.getByRole('radio', { name: /Return for changes/ }).check();
    await decision.getByLabel(/Comment to the contributor/).fill('Please give the folio’s own wording in the translation and name the instrument precisely.');
    await screenshot(editor.page, 'j2-02-return-excerpt');
    await decision.getByRole('button', { name: 'Return for changes' }).click();
    await visible(editor.page.getByText(/returned to the contributor\. The contributor has been e-mailed\./));

    // ---- The contributor's mail, My submissions with the comment, the fix and the resubmission
    const returnedMail = await waitForMail(contributorEmail, new RegExp(`^Your submission “${title}, fol\\. 5v” was returned for changes`), 15_000);
    expect(returnedMail.text).toContain('name the instrument precisely');
    expect(returnedMail.text).toContain('Translation: Say which flute');
    const submissionLink = linkIn(returnedMail.text);
    expect(submissionLink.pathname).toBe(`/submissions/excerpt/${returnedId}`);

    const contributor = await actor(browser, 'contributor');
    await contributor.page.goto('/submissions');
    await visible(contributor.page.getByText(/\d+ items? came back with comments: fix and submit again\./));
    const returnedItem = contributor.page.getByRole('listitem').filter({ has: contributor.page.getByRole('link', { name: `${title}, fol. 5v` }) });
    await visible(returnedItem.getByText('Returned for changes'));
    await visible(returnedItem.getByText(/name the instrument precisely/));
    await visible(returnedItem.getByText(/Say which flute/));
    await screenshot(contributor.page, 'j2-03-my-submissions-returned');

    await contributor.page.goto(appPath(submissionLink));
    await visible(contributor.page.getByText(/Editor’s comment:/));
    await contributor.page.getByRole('link', { name: 'Edit the excerpt' }).click();
    await contributor.page.getByRole('link', { name: 'Edit excerpt' }).click();
    const form = contributor.page.getByRole('form', { name: 'Edit excerpt fol. 5v' });
    await visible(form);
    await form.getByLabel(/^Translation/).fill(`Paid for mending the treble flute, that is the alto recorder (${fixWord}).`);
    await form.getByLabel('What changed, for the revision history').fill('Translation names the instrument, as the editor asked.');
    await form.getByRole('button', { name: 'Save changes' }).click();
    await visible(contributor.page.getByText('Your changes were saved.'));

    await contributor.page.goto(`/submissions/excerpt/${returnedId}`);
    await contributor.page.getByRole('button', { name: 'Submit again for review' }).click();
    await visible(contributor.page.getByText(/Sent back to the editors as version \d+\./));
    await screenshot(contributor.page, 'j2-04-resubmitted');
    await waitForMail(editorEmail, new RegExp(`^New submission to review: ${title}, fol\\. 5v`), 15_000);

    // ---- The editor approves the fixed excerpt, then the source with the other two
    await editor.page.goto('/review');
    const queueRow = editor.page.getByRole('row').filter({ has: editor.page.getByRole('link', { name: `${title}, fol. 5v` }) });
    await visible(queueRow.getByText(/resubmitted/));
    await screenshot(editor.page, 'j2-05-queue-resubmitted');
    await queueRow.getByRole('link', { name: `${title}, fol. 5v` }).click();
    await editor.page.waitForURL(`**/review/excerpt/${returnedId}`);
    await editor.page.getByRole('button', { name: /Since the last decision/ }).click();
    await visible(editor.page.getByText(fixWord).first());
    const approveExcerpt = editor.page.getByRole('form', { name: 'Decision' });
    await approveExcerpt.getByRole('radio', { name: /Approve/ }).check();
    await approveExcerpt.getByRole('button', { name: 'Approve' }).click();
    await visible(editor.page.getByText(/approved\. The contributor has been e-mailed\./));

    await editor.page.goto(`/review/source/${sourceId}`);
    const approveSource = editor.page.getByRole('form', { name: 'Decision' });
    await approveSource.getByRole('radio', { name: /Approve/ }).check();
    await approveSource.getByRole('button', { name: 'Approve' }).click();
    await visible(editor.page.getByText(/approved, with 2 excerpt\(s\)\. The contributor has been e-mailed\./));
    const approvedAt = Date.now();
    await screenshot(editor.page, 'j2-06-source-approved');
    await waitForMail(contributorEmail, new RegExp(`^Your submission “${title}” was approved`), 15_000);

    // ---- Searchable within seconds, by a reader who is not signed in
    let found = false;
    while (!found && Date.now() - approvedAt < 10_000) {
      await reader.page.goto(`/search?q=${word}`);
      await reader.page.getByRole('heading', { name: /passages?$/ }).waitFor();
      found = (await reader.page.getByRole('heading', { name: /^3 passages/ }).count()) === 1;
      if (!found) await reader.page.waitForTimeout(250);
    }
    expect(found, 'the approved source is found by search within 10 s').toBe(true);
    const seconds = (Date.now() - approvedAt) / 1000;
    expect(seconds).toBeLessThan(10);
    for (const folio of ['2r', '5v', '9r']) await visible(reader.page.getByRole('link', { name: `${title}, fol. ${folio}` }));
    // The fixed text is what is published.
    await reader.page.goto(`/search?q=${fixWord}`);
    await visible(reader.page.getByRole('link', { name: `${title}, fol. 5v` }));
    await screenshot(reader.page, 'j2-07-searchable');
    console.log(`[journey 2] submitted → searchable in ${((Date.now() - submittedAt) / 1000).toFixed(1)} s; approval → searchable in ${seconds.toFixed(1)} s`);

    for (const a of [reader, editor, contributor]) await a.context.close();
  });
});
