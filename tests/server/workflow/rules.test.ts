import { describe, it, expect } from 'vitest';
import { anonymous } from '../../support/http';
import { actor, countRows, createExcerpt, createSource, currentVersion, decide, editExcerpt, submittedSource, withdrawSource } from './support';

describe('POST /api/reviews — who may decide', () => {
  it('returns 403 when a contributor approves their own work', async () => {
    const contributor = await actor('contributor');
    const { source } = await submittedSource(contributor, 1);
    const res = await decide(contributor, 'source', source.id, (await currentVersion('source', source.id)).version, 'approve');
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/Only editors/);
  });

  it('returns 403 when an editor decides on their own work: another editor must', async () => {
    const editor = await actor('editor');
    const { source } = await submittedSource(editor, 1);
    const before = await countRows('source', source.id);
    const res = await decide(editor, 'source', source.id, (await currentVersion('source', source.id)).version, 'approve');
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/You contributed this source.*never approve, return or reject their own work/);
    expect(await countRows('source', source.id)).toEqual(before);
    const page = await editor.client.get(`/api/reviews/source/${source.id}`);
    expect(page.body.data.abilities).toMatchObject({ decide: false });
  });

  it('returns 403 when a reader decides, and 401 when nobody is signed in', async () => {
    const contributor = await actor('contributor');
    const reader = await actor('reader');
    const { source } = await submittedSource(contributor, 1);
    expect((await decide(reader, 'source', source.id, 2, 'approve')).status).toBe(403);
    expect((await reader.client.get('/api/reviews')).status).toBe(403);
    const nobody = await anonymous();
    expect((await nobody.post('/api/reviews', { target: { kind: 'source', id: source.id, version: 2 }, decision: 'approve' })).status).toBe(401);
  });
});

describe('POST /api/reviews — illegal transitions', () => {
  it('returns 409 naming the state when approving a draft', async () => {
    const contributor = await actor('contributor');
    const editor = await actor('editor');
    const source = await createSource(contributor);
    const res = await decide(editor, 'source', source.id, source.version, 'approve');
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/Cannot approve this source: it is “Draft” \(draft\)/);
    expect((await currentVersion('source', source.id)).status).toBe('draft');
  });

  it('returns 400 naming `comment` when returning or rejecting without one', async () => {
    const contributor = await actor('contributor');
    const editor = await actor('editor');
    const { excerpts } = await submittedSource(contributor, 1);
    const { version } = await currentVersion('excerpt', excerpts[0].id);
    for (const decision of ['return', 'reject']) {
      const res = await decide(editor, 'excerpt', excerpts[0].id, version, decision, { comment: '   ' });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.comment).toMatch(/comment is required/);
    }
    const unknown = await decide(editor, 'excerpt', excerpts[0].id, version, 'return', { comment: 'x', fieldComments: [{ field: 'shoeSize', comment: 'no' }] });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.fields['fieldComments.0.field']).toMatch(/not a field/);
  });

  it('returns 409 for a decision on a stale version', async () => {
    const contributor = await actor('contributor');
    const editor = await actor('editor');
    const { excerpts } = await submittedSource(contributor, 1);
    const { version } = await currentVersion('excerpt', excerpts[0].id);
    const res = await decide(editor, 'excerpt', excerpts[0].id, version - 1, 'approve');
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(new RegExp(`you reviewed version ${version - 1}, the current one is ${version}`));
  });

  it('lets exactly one of two concurrent decisions through; the other gets 409', async () => {
    const contributor = await actor('contributor');
    const [a, b] = [await actor('editor'), await actor('editor')];
    const { excerpts } = await submittedSource(contributor, 1);
    const { version } = await currentVersion('excerpt', excerpts[0].id);
    const before = await countRows('excerpt', excerpts[0].id);
    const results = await Promise.all([
      decide(a, 'excerpt', excerpts[0].id, version, 'approve'),
      decide(b, 'excerpt', excerpts[0].id, version, 'return', { comment: 'Check the locator.' }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
    expect(await countRows('excerpt', excerpts[0].id)).toEqual({ revisions: before.revisions + 1, outbox: before.outbox + 1, reviews: before.reviews + 1 });
  });

  it('rejects: the item leaves the queue and cannot be approved afterwards', async () => {
    const contributor = await actor('contributor');
    const editor = await actor('editor');
    const { source } = await submittedSource(contributor, 1);
    const { version } = await currentVersion('source', source.id);
    expect((await decide(editor, 'source', source.id, version, 'reject', { comment: 'Not a primary source.' })).status).toBe(201);
    const again = await decide(editor, 'source', source.id, version + 1, 'approve');
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/“Rejected”/);
  });
});

describe('editing outside the workflow', () => {
  it('returns 403 when a reader edits an excerpt', async () => {
    const contributor = await actor('contributor');
    const reader = await actor('reader');
    const editor = await actor('editor');
    const { source, excerpts } = await submittedSource(contributor, 1);
    await decide(editor, 'source', source.id, (await currentVersion('source', source.id)).version, 'approve');
    const { version } = await currentVersion('excerpt', excerpts[0].id);
    const res = await editExcerpt(reader, excerpts[0].id, { version, translation: 'Vandalised' });
    expect(res.status).toBe(403);
    expect((await currentVersion('excerpt', excerpts[0].id)).version).toBe(version);
  });

  it('returns 409 with a clear message when editing a withdrawn excerpt', async () => {
    const contributor = await actor('contributor');
    const { source, excerpts } = await submittedSource(contributor, 1);
    expect((await withdrawSource(contributor, source.id)).status).toBe(200);
    const { version, status } = await currentVersion('excerpt', excerpts[0].id);
    expect(status).toBe('withdrawn');
    const res = await editExcerpt(contributor, excerpts[0].id, { version, translation: 'Changed' });
    expect(res.status).toBe(409);
    expect(res.body.error!.message).toMatch(/withdrawn; reopen it/);
  });

  it('returns 409 when resubmitting an excerpt of a draft source alone, and 404 for a stranger who cannot see the draft', async () => {
    const contributor = await actor('contributor');
    const stranger = await actor('contributor');
    const source = await createSource(contributor);
    const excerpt = await createExcerpt(contributor, source.id, 1);
    const alone = await contributor.client.post(`/api/excerpts/${excerpt.id}/submit`, {});
    expect(alone.status).toBe(409);
    expect(alone.body.error.message).toMatch(/submit the source/);
    expect((await stranger.client.post(`/api/excerpts/${excerpt.id}/submit`, {})).status).toBe(404);
  });
});
