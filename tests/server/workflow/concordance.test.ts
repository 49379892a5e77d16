import { describe, it, expect } from 'vitest';
import type { ConcordanceEntry } from '@shared/review/types';
import { anonymous } from '../../support/http';
import { actor, countRows, createExcerpt, createSource, currentVersion, decide, submitSource } from './support';

async function approvedSourceWith(mentions: { term: string; language: string; sizeSlug: string; certainty: string }[][]) {
  const contributor = await actor('contributor');
  const editor = await actor('editor');
  const source = await createSource(contributor);
  const excerpts = [];
  for (const [i, m] of mentions.entries()) excerpts.push(await createExcerpt(contributor, source.id, i + 1, { mentions: m }));
  await submitSource(contributor, source.id);
  await decide(editor, 'source', source.id, (await currentVersion('source', source.id)).version, 'approve');
  return { contributor, editor, source, excerpts };
}

const entry = (data: ConcordanceEntry[], term: string, language: string) => data.find((e) => e.term === term && e.language === language)!;

describe('GET /api/concordance', () => {
  it('lists terms as written → sizes with counts, certainty and examples, from approved material only', async () => {
    const unique = `flauto-${Date.now()}`;
    const { excerpts } = await approvedSourceWith([
      [{ term: unique, language: 'it', sizeSlug: 'alto', certainty: 'certain' }],
      [{ term: unique, language: 'it', sizeSlug: 'alto', certainty: 'probable' }],
      [{ term: unique, language: 'it', sizeSlug: 'tenor', certainty: 'conjectural' }],
    ]);
    const draftOwner = await actor('contributor');
    const draft = await createSource(draftOwner);
    await createExcerpt(draftOwner, draft.id, 1, { mentions: [{ term: unique, language: 'it', sizeSlug: 'bass', certainty: 'certain' }] });

    const res = await (await anonymous()).get('/api/concordance');
    expect(res.status).toBe(200);
    const found = entry(res.body.data, unique, 'it');
    expect(found.excerpts).toBe(3);
    expect(found.sizes).toEqual([
      { sizeSlug: 'alto', sizeName: expect.any(String), excerpts: 2, certainty: { certain: 1, probable: 1, conjectural: 0 }, examples: [excerpts[0].id, excerpts[1].id] },
      { sizeSlug: 'tenor', sizeName: expect.any(String), excerpts: 1, certainty: { certain: 0, probable: 0, conjectural: 1 }, examples: [excerpts[2].id] },
    ]);
    expect(res.body.abilities.edit).toBe(false);
  });
});

describe('PATCH /api/concordance', () => {
  it('returns 403 for contributors and 404 for a term nobody used', async () => {
    const contributor = await actor('contributor');
    const editor = await actor('editor');
    expect((await contributor.client.patch('/api/concordance', { term: 'x', language: 'fr', toSize: 'alto' })).status).toBe(403);
    expect((await editor.client.patch('/api/concordance', { term: `nothing-${Date.now()}`, language: 'fr', toSize: 'alto' })).status).toBe(404);
    expect((await editor.client.patch('/api/concordance', { term: 'x', language: 'fr', toSize: 'kazoo' })).body.error.fields.toSize).toBeTruthy();
  });

  it('corrects a mapping through a new version, revision and outbox row per affected excerpt', async () => {
    const term = `flute-${Date.now()}`;
    const { editor, excerpts } = await approvedSourceWith([
      [{ term, language: 'fr', sizeSlug: 'alto', certainty: 'probable' }],
      [{ term, language: 'fr', sizeSlug: 'alto', certainty: 'certain' }, { term: 'basse', language: 'fr', sizeSlug: 'bass', certainty: 'certain' }],
      [{ term: 'basse', language: 'fr', sizeSlug: 'bass', certainty: 'certain' }],
    ]);
    const before = await Promise.all(excerpts.map((e) => countRows('excerpt', e.id)));
    const versions = await Promise.all(excerpts.map((e) => currentVersion('excerpt', e.id)));
    const res = await editor.client.patch('/api/concordance', { term, language: 'fr', fromSize: 'alto', toSize: 'voice-flute', reason: 'Hotteterre means the D instrument here' });
    expect(res.status).toBe(200);
    expect(res.body.data).toEqual({ affectedMentions: 2, affectedExcerpts: [excerpts[0].id, excerpts[1].id] });
    for (const [i, e] of excerpts.slice(0, 2).entries()) {
      const now = await currentVersion('excerpt', e.id);
      expect(now).toMatchObject({ version: versions[i].version + 1, status: 'approved', approvedVersion: versions[i].version + 1 });
      expect(await countRows('excerpt', e.id)).toMatchObject({ revisions: before[i].revisions + 1, outbox: before[i].outbox + 1 });
      const snap = await editor.client.get(`/api/history/excerpt/${e.id}/v/${now.version}`);
      expect(snap.body.data.snapshot.mentions[0]).toMatchObject({ term, sizeSlug: 'voice-flute' });
      expect(snap.body.data.reason).toMatch(/Concordance: .* now denotes voice-flute/);
    }
    expect(await countRows('excerpt', excerpts[2].id)).toEqual(before[2]);
    const list = await editor.client.get('/api/concordance');
    expect(entry(list.body.data, term, 'fr').sizes.map((s: { sizeSlug: string }) => s.sizeSlug)).toEqual(['voice-flute']);
  });

  it('merges a spelling into another, exactly (not case- or accent-folded)', async () => {
    const stem = `fluste-${Date.now()}`;
    const { editor, excerpts } = await approvedSourceWith([
      [{ term: stem, language: 'fr', sizeSlug: 'alto', certainty: 'certain' }],
      [{ term: stem.toUpperCase(), language: 'fr', sizeSlug: 'alto', certainty: 'certain' }],
    ]);
    const res = await editor.client.patch('/api/concordance', { term: stem, language: 'fr', toSize: 'alto', mergeInto: { term: `${stem}-douce` } });
    expect(res.body.data.affectedExcerpts).toEqual([excerpts[0].id]);
    const list = (await editor.client.get('/api/concordance')).body.data;
    expect(list.some((e: ConcordanceEntry) => e.term === stem)).toBe(false);
    expect(entry(list, `${stem}-douce`, 'fr').excerpts).toBe(1);
    expect(entry(list, stem.toUpperCase(), 'fr').excerpts).toBe(1);
  });
});
