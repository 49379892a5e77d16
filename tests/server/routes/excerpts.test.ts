import { describe, it, expect } from 'vitest';
import { anonymous, signedIn } from '../../support/http';
import { approveDirectly, buildExcerpt, createExcerptVia, createSourceVia } from '../../fixtures/catalogue';

async function excerptCounts(publicId: string) {
  const { Excerpt, Revision, SearchOutbox, InstrumentMention } = await import('@server/models');
  const excerpt = (await Excerpt.findOne({ where: { publicId } }))!;
  return {
    excerpt,
    revisions: await Revision.count({ where: { entityType: 'excerpt', entityId: excerpt.id } }),
    outbox: await SearchOutbox.count({ where: { entityType: 'excerpt', entityId: excerpt.id } }),
    mentions: await InstrumentMention.count({ where: { excerptId: excerpt.id } }),
  };
}

describe('POST /api/sources/:id/excerpts', () => {
  it('creates a draft excerpt with mentions, pitch tags, a revision and an outbox row', async () => {
    const { client, user } = await signedIn('contributor');
    const source = await createSourceVia(client, { dateEdtf: '1712-03' });
    const res = await client.post(`/api/sources/${source.id}/excerpts`, buildExcerpt({ commentary: 'See *fol. 13r*.' }));
    expect(res.status).toBe(201);
    const data = res.body.data;
    expect(data).toMatchObject({
      status: 'draft',
      version: 1,
      locator: { type: 'folio', value: '12v', label: 'fol. 12v' },
      source: { id: source.id },
      contributor: { id: user.id, displayName: user.displayName },
      date: { edtf: '1712-03', inherited: true },
      dateEdtf: null,
      commentaryHtml: '<p>See <em>fol. 13r</em>.</p>\n',
      mentions: [{ term: 'Blockflöten', language: 'de', sizeSlug: 'alto', sizeName: 'Alto recorder', certainty: 'probable', note: null }],
    });
    // Ellis 1885: cents = 1200·log2(415/440) = −101.27, rounded to 0.1.
    expect(data.pitchTags).toEqual([{ statement: 'im Cammerton', aHz: 415, centsFrom440: -101.3, derivation: 'inferred', note: null }]);
    expect(res.body.abilities).toEqual({ update: true, review: false, publish: false });
    const c = await excerptCounts(data.id);
    expect([c.revisions, c.outbox]).toEqual([1, 1]);
  });

  it('names bad nested fields: size slug, a′ range, locator, EDTF', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const res = await client.post(
      `/api/sources/${source.id}/excerpts`,
      buildExcerpt({
        locatorValue: '12x',
        dateEdtf: 'about 1700',
        mentions: [{ term: 'fluyt', language: 'nl', sizeSlug: 'kazoo' }],
        pitchTags: [{ statement: 'very high', aHz: 520 }],
      }),
    );
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(['mentions.0.sizeSlug', 'pitchTags.0.aHz', 'dateEdtf']));
    const locator = await client.post(`/api/sources/${source.id}/excerpts`, buildExcerpt({ locatorValue: '12x' }));
    expect(locator.body.error.fields.locatorValue).toMatch(/folio/);
  });

  it('is refused to readers (403), other contributors (404 on a draft), and on a submitted source (409)', async () => {
    const owner = await signedIn('contributor');
    const source = await createSourceVia(owner.client);
    expect((await (await signedIn('contributor')).client.post(`/api/sources/${source.id}/excerpts`, buildExcerpt())).status).toBe(404);
    await createExcerptVia(owner.client, source.id);
    await owner.client.post(`/api/sources/${source.id}/submit`, {}).expect(200);
    const late = await owner.client.post(`/api/sources/${source.id}/excerpts`, buildExcerpt());
    expect(late.status).toBe(409);
    await approveDirectly(source.id);
    expect((await (await signedIn('reader')).client.post(`/api/sources/${source.id}/excerpts`, buildExcerpt())).status).toBe(403);
  });
});

describe('GET /api/excerpts/:id', () => {
  it('renders hostile Markdown commentary inert', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const commentary = [
      '<script>alert("x")</script>',
      '<img src=x onerror="alert(1)">',
      '[click](javascript:alert(1)) and [fine](https://example.test/a)',
      '<p onclick="alert(2)" style="color:red">styled</p>',
      '<style>body{display:none}</style>',
    ].join('\n\n');
    const excerpt = await createExcerptVia(client, source.id, { commentary });
    const html: string = (await client.get(`/api/excerpts/${excerpt.id}`)).body.data.commentaryHtml;
    expect(html).not.toMatch(/<script|onerror|onclick|javascript:|<style|style=|<img/i);
    expect(html).toContain('<a href="https://example.test/a" rel="nofollow noopener">fine</a>');
    expect(html).toContain('styled');
  });

  it('hides a draft from others and shows the approved version to readers after an edit', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const excerpt = await createExcerptVia(client, source.id, { diplomatic: 'approved text' });
    expect((await (await anonymous()).get(`/api/excerpts/${excerpt.id}`)).status).toBe(404);
    await approveDirectly(source.id);
    const edited = await client.patch(`/api/excerpts/${excerpt.id}`, { version: 1, diplomatic: 'new unreviewed text' });
    expect(edited.body.data).toMatchObject({ status: 'draft', version: 2, approvedVersion: 1 });
    const reader = await (await anonymous()).get(`/api/excerpts/${excerpt.id}`);
    expect(reader.status).toBe(200);
    expect(reader.body.data).toMatchObject({ diplomatic: 'approved text', version: 1, showingApprovedVersion: true });
    expect(reader.body.data.mentions[0].sizeSlug).toBe('alto');
    expect(reader.body.abilities.update).toBe(false);
  });
});

describe('PATCH /api/excerpts/:id', () => {
  it('replaces mentions and pitch tags, keeps what was not sent, records the version', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const excerpt = await createExcerptVia(client, source.id);
    const res = await client.patch(`/api/excerpts/${excerpt.id}`, {
      version: 1,
      dateEdtf: '1700-02-10',
      mentions: [
        { term: 'Fleute douce', language: 'fr', sizeSlug: 'voice-flute', certainty: 'conjectural' },
        { term: 'basse de flute', language: 'fr', sizeSlug: 'bass' },
      ],
      pitchTags: [{ statement: 'un ton plus bas', aHz: 392, derivation: 'inferred' }],
    });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ version: 2, dateEdtf: '1700-02-10', date: { inherited: false }, translation: expect.stringContaining('recorders') });
    expect(res.body.data.mentions.map((m: { sizeSlug: string }) => m.sizeSlug)).toEqual(['voice-flute', 'bass']);
    expect(res.body.data.pitchTags[0]).toMatchObject({ aHz: 392, centsFrom440: -200 }); // 1200·log2(392/440) = −199.99 (Ellis 1885)
    const snapshot = (await client.get(`/api/excerpts/${excerpt.id}/revisions/2`)).body.data.snapshot;
    expect(snapshot.mentions).toHaveLength(2);
    expect(snapshot.pitchTags[0].aHz).toBe(392);
    const list = (await client.get(`/api/excerpts/${excerpt.id}/revisions`)).body.data;
    expect(list).toEqual([
      expect.objectContaining({ version: 1, authorId: expect.any(Number), author: { displayName: expect.any(String) }, reason: 'Created' }),
      expect.objectContaining({ version: 2, reason: null }),
    ]);
  });

  it('answers 409 on a stale version and leaves the excerpt, its tags and its history alone', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const excerpt = await createExcerptVia(client, source.id);
    await client.patch(`/api/excerpts/${excerpt.id}`, { version: 1, diplomatic: 'kept' }).expect(200);
    const before = await excerptCounts(excerpt.id);
    const res = await client.patch(`/api/excerpts/${excerpt.id}`, { version: 1, diplomatic: 'lost', mentions: [] });
    expect(res.status).toBe(409);
    expect(res.body.error.fields.version).toBeTruthy();
    const after = await excerptCounts(excerpt.id);
    expect(after.excerpt.diplomatic).toBe('kept');
    expect([after.revisions, after.outbox, after.mentions]).toEqual([before.revisions, before.outbox, before.mentions]);
  });

  it('checks a changed locator value against the stored type', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const excerpt = await createExcerptVia(client, source.id);
    const res = await client.patch(`/api/excerpts/${excerpt.id}`, { version: 1, locatorValue: '12x' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.locatorValue).toMatch(/folio/);
    const bad = await client.patch(`/api/excerpts/${excerpt.id}`, { version: 1, pitchTags: [{ statement: 'low', aHz: 300 }], colour: 'red' });
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['pitchTags.0.aHz', 'colour']));
  });

  it('returns 403 to a reader and 409 while submitted', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const excerpt = await createExcerptVia(client, source.id);
    await client.post(`/api/sources/${source.id}/submit`, {}).expect(200);
    const res = await client.patch(`/api/excerpts/${excerpt.id}`, { version: 2, diplomatic: 'x' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/awaiting review/);
    await approveDirectly(source.id);
    expect((await (await signedIn('reader')).client.patch(`/api/excerpts/${excerpt.id}`, { version: 2, diplomatic: 'x' })).status).toBe(403);
  });
});
