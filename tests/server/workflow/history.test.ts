import { describe, it, expect } from 'vitest';
import { anonymous } from '../../support/http';
import { actor, countRows, currentVersion, decide, editExcerpt, submittedSource } from './support';

async function approvedExcerpt() {
  const contributor = await actor('contributor');
  const editor = await actor('editor');
  const { source, excerpts } = await submittedSource(contributor, 1);
  await decide(editor, 'source', source.id, (await currentVersion('source', source.id)).version, 'approve');
  return { contributor, editor, source, excerpt: excerpts[0] };
}

describe('GET /api/history/:kind/:id', () => {
  it('lists every version to the contributor and editors, and only approved ones to readers', async () => {
    const { contributor, excerpt } = await approvedExcerpt();
    const mine = await contributor.client.get(`/api/history/excerpt/${excerpt.id}`);
    expect(mine.status).toBe(200);
    // created (1), submitted (2), approved (3): newest first
    expect(mine.body.data.map((r: { version: number }) => r.version)).toEqual([3, 2, 1]);
    expect(mine.body.data[0]).toMatchObject({ status: 'approved', approved: true });
    const publicList = await (await anonymous()).get(`/api/history/excerpt/${excerpt.id}`);
    expect(publicList.body.data.map((r: { version: number }) => r.version)).toEqual([3]);
    expect((await (await anonymous()).get(`/api/history/excerpt/${excerpt.id}/v/1`)).status).toBe(404);
  });

  it('serves a stable permalink of each approved version', async () => {
    const { excerpt } = await approvedExcerpt();
    const res = await (await anonymous()).get(`/api/history/excerpt/${excerpt.id}/v/3`);
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ kind: 'excerpt', id: excerpt.id, version: 3, currentVersion: 3 });
    expect(res.body.data.snapshot.diplomatic).toMatch(/passage 1/);
    expect(res.body.data.snapshot.mentions[0]).toMatchObject({ term: 'flute douce', sizeSlug: 'alto' });
  });
});

describe('GET /api/history/:kind/:id/diff', () => {
  it('compares any two versions field by field, words for texts and items for mentions', async () => {
    const { contributor, editor, excerpt } = await approvedExcerpt();
    const edit = await editExcerpt(contributor, excerpt.id, {
      version: 3,
      translation: 'The recorder is held thus, firmly, passage 1.',
      mentions: [{ term: 'flute a bec', language: 'fr', sizeSlug: 'alto', certainty: 'certain' }],
    });
    expect(edit.status).toBe(200);
    const res = await editor.client.get(`/api/history/excerpt/${excerpt.id}/diff`).query({ from: 1, to: 4 });
    expect(res.status).toBe(200);
    const byField = Object.fromEntries(res.body.data.changes.map((c: { field: string }) => [c.field, c]));
    expect(Object.keys(byField).sort()).toEqual(['mentions', 'translation']);
    expect(byField.translation.parts).toContainEqual({ value: 'firmly, ', added: true });
    expect(byField.mentions.items).toEqual([
      { value: 'flute douce [fr] → alto, probable', change: 'removed' },
      { value: 'flute a bec [fr] → alto, certain', change: 'added' },
    ]);
    const bad = await editor.client.get(`/api/history/excerpt/${excerpt.id}/diff`).query({ from: 4, to: 2 });
    expect(bad.status).toBe(400);
  });
});

describe('POST /api/history/:kind/:id/restore', () => {
  it('writes a NEW version with the old content, a revision and an outbox row; editors only', async () => {
    const { contributor, editor, excerpt } = await approvedExcerpt();
    await editExcerpt(contributor, excerpt.id, { version: 3, translation: 'A worse translation.' });
    const state = await currentVersion('excerpt', excerpt.id);
    expect(state).toMatchObject({ version: 4, status: 'draft', approvedVersion: 3 });

    const denied = await contributor.client.post(`/api/history/excerpt/${excerpt.id}/restore`, { version: 3, reason: 'Undo my change' });
    expect(denied.status).toBe(403);
    const noReason = await editor.client.post(`/api/history/excerpt/${excerpt.id}/restore`, { version: 3 });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.fields.reason).toBeTruthy();

    const before = await countRows('excerpt', excerpt.id);
    const res = await editor.client.post(`/api/history/excerpt/${excerpt.id}/restore`, { version: 3, reason: 'The new translation lost a clause', baseVersion: 4 });
    expect(res.status).toBe(201);
    // Version 3 was approved, so restoring it republishes it at once.
    expect(res.body.data).toMatchObject({ version: 5, status: 'approved', approvedVersion: 5 });
    expect(await countRows('excerpt', excerpt.id)).toMatchObject({ revisions: before.revisions + 1, outbox: before.outbox + 1 });
    const diff = await editor.client.get(`/api/history/excerpt/${excerpt.id}/diff`).query({ from: 3, to: 5 });
    expect(diff.body.data.changes).toEqual([]);
    const list = await editor.client.get(`/api/history/excerpt/${excerpt.id}`);
    expect(list.body.data[0].reason).toMatch(/Restored version 3: The new translation lost a clause/);

    // Restoring a version that was never approved sends the item back to the queue.
    const unreviewed = await editor.client.post(`/api/history/excerpt/${excerpt.id}/restore`, { version: 4, reason: 'Try the other wording' });
    expect(unreviewed.body.data).toMatchObject({ version: 6, status: 'submitted' });
  });

  it('keeps a concurrent edit from overwriting a restore: the stale save gets 409 and nothing is lost', async () => {
    const { contributor, editor, excerpt } = await approvedExcerpt();
    await editExcerpt(contributor, excerpt.id, { version: 3, translation: 'Draft wording.' });
    // The editor restores while the contributor still has version 4 open.
    await editor.client.post(`/api/history/excerpt/${excerpt.id}/restore`, { version: 3, reason: 'Back to the approved text' }).expect(201);
    const stale = await editExcerpt(contributor, excerpt.id, { version: 4, translation: 'My unsaved text.' });
    expect(stale.status).toBe(409);
    expect(stale.body.error!.message).toMatch(/changed by someone else/);
    const snapshot = await editor.client.get(`/api/history/excerpt/${excerpt.id}/v/5`);
    expect(snapshot.body.data.snapshot.translation).toBe('The recorder is held thus, passage 1.');
    // Both earlier texts are still in the history.
    const v4 = await editor.client.get(`/api/history/excerpt/${excerpt.id}/v/4`);
    expect(v4.body.data.snapshot.translation).toBe('Draft wording.');
    // A restore based on an old view is refused too.
    const staleRestore = await editor.client.post(`/api/history/excerpt/${excerpt.id}/restore`, { version: 4, reason: 'x'.repeat(5), baseVersion: 4 });
    expect(staleRestore.status).toBe(409);
  });
});
