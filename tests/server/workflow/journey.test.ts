import { describe, it, expect } from 'vitest';
import { waitForMail } from '../../support/mail';
import { actor, countRows, currentVersion, decide, editExcerpt, linkPath, submittedSource } from './support';

describe('journey 2: submit → return one excerpt → fix and resubmit → approve', () => {
  it('runs end to end with a revision for every change and an e-mail at every step', async () => {
    const contributor = await actor('contributor');
    const editor = await actor('editor');
    const { source, excerpts } = await submittedSource(contributor, 3);

    // New submission → every active editor, with a link to the review page.
    const notice = await waitForMail(editor.user.email, /New submission to review/);
    expect(notice.subject).toContain('Principes de la flute');
    const reviewPath = linkPath(notice.text);
    expect(reviewPath).toBe(`/review/source/${source.id}`);
    expect((await editor.client.get(`/api${reviewPath.replace('/review/', '/reviews/')}`)).status).toBe(200);

    // The queue lists the source and its three excerpts, oldest first, with counts.
    const queue = await editor.client.get('/api/reviews').query({ contributor: String(contributor.user.id) });
    expect(queue.status).toBe(200);
    expect(queue.body.data.map((r: { id: string }) => r.id).sort()).toEqual([source.id, ...excerpts.map((e) => e.id)].sort());
    expect(queue.body.counts.excerpt.submitted).toBeGreaterThanOrEqual(3);
    const times = queue.body.data.map((r: { waitingSince: string }) => r.waitingSince);
    expect([...times].sort()).toEqual(times);
    expect(queue.body.data.find((r: { kind: string }) => r.kind === 'source').submittedExcerpts).toBe(3);

    // The editor returns the second excerpt with a comment anchored to a field.
    const second = excerpts[1];
    const before = await countRows('excerpt', second.id);
    const v = (await currentVersion('excerpt', second.id)).version;
    const returned = await decide(editor, 'excerpt', second.id, v, 'return', {
      comment: 'The translation misses the second clause.',
      fieldComments: [{ field: 'translation', comment: '“ainsi” is “thus”, but the clause after it is missing.' }],
    });
    expect(returned.status).toBe(201);
    expect(returned.body.item).toMatchObject({ status: 'returned', version: v + 1 });
    const after = await countRows('excerpt', second.id);
    expect(after).toEqual({ revisions: before.revisions + 1, outbox: before.outbox + 1, reviews: before.reviews + 1 });

    // The contributor is told, with the comments and a link that works for them.
    const decision = await waitForMail(contributor.user.email, /was returned for changes/);
    expect(decision.text).toContain('The translation misses the second clause.');
    expect(decision.text).toContain('Translation: “ainsi” is “thus”');
    const submissionPath = linkPath(decision.text);
    expect(submissionPath).toBe(`/submissions/excerpt/${second.id}`);
    const mine = await contributor.client.get(`/api/reviews/excerpt/${second.id}`);
    expect(mine.status).toBe(200);
    expect(mine.body.data.reviews[0]).toMatchObject({ decision: 'return', fieldComments: [{ field: 'translation' }] });
    const list = await contributor.client.get('/api/reviews/mine');
    expect(list.body.data[0]).toMatchObject({ id: second.id, status: 'returned', lastReview: { decision: 'return' } });

    // The contributor fixes the translation and resubmits just that excerpt.
    const fixed = await editExcerpt(contributor, second.id, { version: v + 1, translation: 'The recorder is held thus, with both hands, passage 2.' });
    expect(fixed.status).toBe(200);
    const resubmit = await contributor.client.post(`/api/excerpts/${second.id}/submit`, { version: v + 2 });
    expect(resubmit.status).toBe(200);
    expect(resubmit.body.data).toMatchObject({ status: 'submitted', version: v + 3 });
    const again = await waitForMail(editor.user.email, /New submission to review: .*p\. 12/);
    expect(linkPath(again.text)).toBe(`/review/excerpt/${second.id}`);

    // The review page shows what the resubmission changed, word by word.
    const page = await editor.client.get(`/api/reviews/excerpt/${second.id}`);
    expect(page.body.data.abilities.decide).toBe(true);
    const change = page.body.data.sinceLastReview.changes.find((c: { field: string }) => c.field === 'translation');
    expect(change.type).toBe('text');
    expect(change.parts.filter((p: { added?: boolean }) => p.added).map((p: { value: string }) => p.value).join('')).toContain('with both hands');

    // Approving the source approves its excerpts awaiting review too.
    const sourceVersion = (await currentVersion('source', source.id)).version;
    const approved = await decide(editor, 'source', source.id, sourceVersion, 'approve');
    expect(approved.status).toBe(201);
    expect(approved.body.alsoApproved.sort()).toEqual(excerpts.map((e) => e.id).sort());
    for (const e of excerpts) {
      const state = await currentVersion('excerpt', e.id);
      expect(state.status).toBe('approved');
      expect(state.approvedVersion).toBe(state.version);
    }
    const src = await currentVersion('source', source.id);
    expect(src).toMatchObject({ status: 'approved', approvedVersion: sourceVersion + 1 });
    const approvedMail = await waitForMail(contributor.user.email, /was approved/);
    expect(approvedMail.text).toContain('3 excerpt(s)');
    expect(linkPath(approvedMail.text)).toBe(`/submissions/source/${source.id}`);

    // Nothing is left in the queue for this contributor.
    const empty = await editor.client.get('/api/reviews').query({ contributor: String(contributor.user.id) });
    expect(empty.body.total).toBe(0);
  });
});
