import { describe, it, expect } from 'vitest';
import { anonymous, signedIn } from '../../support/http';
import { approveDirectly, buildSource, createExcerptVia, createSourceVia } from '../../fixtures/catalogue';

async function counts(sourcePublicId: string) {
  const { Source, Revision, SearchOutbox } = await import('@server/models');
  const source = (await Source.findOne({ where: { publicId: sourcePublicId } }))!;
  return {
    source,
    revisions: await Revision.count({ where: { entityType: 'source', entityId: source.id } }),
    outbox: await SearchOutbox.count({ where: { entityType: 'source', entityId: source.id } }),
  };
}

describe('POST /api/sources', () => {
  it('creates a draft at version 1 with dates, a revision and an outbox row', async () => {
    const { client, user } = await signedIn('contributor');
    const res = await client.post('/api/sources', buildSource({ dateEdtf: '1700~' }));
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ status: 'draft', version: 1, approvedVersion: null, contributor: { id: user.id } });
    expect(res.body.data.id).toMatch(/^S[0-9A-Z]{7}$/);
    expect(res.body.data.date.label).toMatch(/1700/);
    expect(res.body.data.date.earliest < '1700-01-01').toBe(true); // approximate dates are widened
    expect(res.body.abilities).toMatchObject({ update: true, submit: true, upload: true, addExcerpt: true, review: false });
    const after = await counts(res.body.data.id);
    expect(after.revisions).toBe(1);
    expect(after.outbox).toBe(1);
  });

  it('returns 403 for a reader and 401 for an anonymous visitor', async () => {
    const { client } = await signedIn('reader');
    expect((await client.post('/api/sources', buildSource())).status).toBe(403);
    expect((await (await anonymous()).post('/api/sources', buildSource())).status).toBe(401);
  });

  it('names each bad field', async () => {
    const { client } = await signedIn('contributor');
    const res = await client.post('/api/sources', buildSource({ dateEdtf: '17th century', languages: ['English'], sourceType: 'scroll', extra: 1 }));
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(['dateEdtf', 'languages.0', 'sourceType', 'extra']));
  });
});

describe('GET /api/sources/:id and the list', () => {
  it('hides drafts from readers and other contributors (404), shows them to the owner and editors', async () => {
    const owner = await signedIn('contributor');
    const source = await createSourceVia(owner.client);
    expect((await owner.client.get(`/api/sources/${source.id}`)).status).toBe(200);
    expect((await (await signedIn('editor')).client.get(`/api/sources/${source.id}`)).status).toBe(200);
    expect((await (await signedIn('contributor')).client.get(`/api/sources/${source.id}`)).status).toBe(404);
    expect((await (await anonymous()).get(`/api/sources/${source.id}`)).status).toBe(404);
  });

  it('lists approved sources to everyone, own drafts to their contributor, everything to editors', async () => {
    const owner = await signedIn('contributor');
    const tag = `Velmark-list-${Date.now()}`;
    const draft = await createSourceVia(owner.client, { title: `${tag} draft` });
    const approved = await createSourceVia(owner.client, { title: `${tag} approved` });
    await approveDirectly(approved.id);
    const ids = (res: { body: { data: { id: string }[] } }) => res.body.data.map((s) => s.id);

    const anon = await (await anonymous()).get(`/api/sources?q=${tag}`);
    expect(anon.status).toBe(200);
    expect(ids(anon)).toEqual([approved.id]);
    expect(anon.body).toMatchObject({ total: 1, page: 1, perPage: 25 });
    expect(ids(await owner.client.get(`/api/sources?q=${tag}`)).sort()).toEqual([draft.id, approved.id].sort());
    expect(ids(await owner.client.get(`/api/sources?q=${tag}&mine=1&status=draft`))).toEqual([draft.id]);
    expect(ids(await (await signedIn('contributor')).client.get(`/api/sources?q=${tag}`))).toEqual([approved.id]);
    expect(ids(await (await signedIn('editor')).client.get(`/api/sources?q=${tag}`)).sort()).toEqual([draft.id, approved.id].sort());
  });

  it('filters by type, language and overlapping years, sorts and pages', async () => {
    const { client } = await signedIn('editor');
    const tag = `Oderstadt-filter-${Date.now()}`;
    const a = await createSourceVia(client, { title: `${tag} A`, dateEdtf: '1650/1660', languages: ['fr'], sourceType: 'letter' });
    const b = await createSourceVia(client, { title: `${tag} B`, dateEdtf: '1701', languages: ['de', 'la'] });
    const c = await createSourceVia(client, { title: `${tag} C`, dateEdtf: '1755', languages: ['de'] });
    const ids = async (query: string) => (await client.get(`/api/sources?q=${tag}&${query}`)).body.data.map((s: { id: string }) => s.id);
    expect(await ids('type=letter')).toEqual([a.id]);
    expect(await ids('lang=la')).toEqual([b.id]);
    expect(await ids('from=1655&to=1701&sort=date')).toEqual([a.id, b.id]);
    expect(await ids('sort=-title')).toEqual([c.id, b.id, a.id]);
    expect(await ids('sort=title&order=desc')).toEqual([c.id, b.id, a.id]);
    const page2 = await client.get(`/api/sources?q=${tag}&sort=title&perPage=2&page=2`);
    expect(page2.body).toMatchObject({ total: 3, page: 2, perPage: 2 });
    expect(page2.body.data.map((s: { id: string }) => s.id)).toEqual([c.id]);
    expect((await client.get('/api/sources?sort=colour')).body.error.fields.sort).toBeTruthy();
    expect((await client.get('/api/sources?from=1800&to=1700')).body.error.fields.to).toBeTruthy();
  });

  it('answers 401 for mine=1 without a session', async () => {
    expect((await (await anonymous()).get('/api/sources?mine=1')).status).toBe(401);
  });
});

describe('PATCH /api/sources/:id', () => {
  it('saves a new version with a revision and outbox row in the same transaction', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const before = await counts(source.id);
    const res = await client.patch(`/api/sources/${source.id}`, { version: 1, title: 'A corrected title', reason: 'typo' });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ title: 'A corrected title', version: 2, creators: [{ name: 'Matthias Kellerwind', role: 'compiler' }] });
    const after = await counts(source.id);
    expect(after.revisions).toBe(before.revisions + 1);
    expect(after.outbox).toBe(before.outbox + 1);
    const history = await client.get(`/api/sources/${source.id}/revisions`);
    expect(history.body.data.map((r: { version: number }) => r.version)).toEqual([1, 2]);
    expect(history.body.data[1]).toMatchObject({ reason: 'typo', author: { displayName: expect.any(String) } });
    const v1 = await client.get(`/api/sources/${source.id}/revisions/1`);
    expect(v1.body.data.snapshot).toMatchObject({ title: expect.stringContaining('Inventory'), excerptIds: [] });
  });

  it('answers 409 for a stale version and writes nothing', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    await client.patch(`/api/sources/${source.id}`, { version: 1, title: 'First edit' }).expect(200);
    const before = await counts(source.id);
    const stale = await client.patch(`/api/sources/${source.id}`, { version: 1, title: 'Lost edit' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('conflict');
    expect(stale.body.error.message).toMatch(/version 1.*version 2/);
    expect(stale.body.error.fields.version).toBeTruthy();
    const after = await counts(source.id);
    expect(after.source.title).toBe('First edit');
    expect(after.source.version).toBe(2);
    expect(after.revisions).toBe(before.revisions);
    expect(after.outbox).toBe(before.outbox);
  });

  it('keeps unsent fields (creators, access) as they were', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client, { facsimileAccess: 'hidden' });
    const res = await client.patch(`/api/sources/${source.id}`, { version: 1, place: 'Oderstadt' });
    expect(res.body.data).toMatchObject({ place: 'Oderstadt', facsimileAccess: 'hidden', creators: [{ name: 'Matthias Kellerwind' }] });
  });

  it('sends an edited approved source back to draft, keeping the approved version public', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client, { title: 'Approved title' });
    await approveDirectly(source.id);
    const res = await client.patch(`/api/sources/${source.id}`, { version: 1, title: 'Unreviewed title' });
    expect(res.body.data).toMatchObject({ status: 'draft', version: 2, approvedVersion: 1, title: 'Unreviewed title' });
    const reader = await (await anonymous()).get(`/api/sources/${source.id}`);
    expect(reader.body.data).toMatchObject({ title: 'Approved title', version: 1, status: 'approved', showingApprovedVersion: true });
    const history = await (await anonymous()).get(`/api/sources/${source.id}/revisions`);
    expect(history.body.data.map((r: { version: number }) => r.version)).toEqual([1]);
    expect((await (await anonymous()).get(`/api/sources/${source.id}/revisions/2`)).status).toBe(404);
  });

  it('lets an editor publish a change to approved material with a reason; others get 403', async () => {
    const owner = await signedIn('contributor');
    const source = await createSourceVia(owner.client);
    await approveDirectly(source.id);
    expect((await owner.client.patch(`/api/sources/${source.id}`, { version: 1, title: 'x', publish: true, reason: 'r' })).status).toBe(403);
    const { client } = await signedIn('editor');
    const noReason = await client.patch(`/api/sources/${source.id}`, { version: 1, title: 'Fixed', publish: true });
    expect(noReason.body.error.fields.reason).toBeTruthy();
    const res = await client.patch(`/api/sources/${source.id}`, { version: 1, title: 'Fixed', publish: true, reason: 'Shelfmark typo' });
    expect(res.body.data).toMatchObject({ status: 'approved', version: 2, approvedVersion: 2, title: 'Fixed' });
  });

  it('refuses edits while submitted, withdrawn or rejected with a 409 that says what to do', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    await createExcerptVia(client, source.id);
    await client.post(`/api/sources/${source.id}/submit`, {}).expect(200);
    const submitted = await client.patch(`/api/sources/${source.id}`, { version: 2, title: 'x' });
    expect(submitted.status).toBe(409);
    expect(submitted.body.error.message).toMatch(/awaiting review/);
    await client.post(`/api/sources/${source.id}/withdraw`, {}).expect(200);
    const withdrawn = await client.patch(`/api/sources/${source.id}`, { version: 3, title: 'x' });
    expect(withdrawn.status).toBe(409);
    expect(withdrawn.body.error.message).toMatch(/reopen/);
    const reopened = await client.post(`/api/sources/${source.id}/reopen`, {});
    expect(reopened.body.data).toMatchObject({ status: 'draft', version: 4 });
    expect(reopened.body.data.excerpts[0].status).toBe('draft');
  });

  it('returns 403 to another contributor who can see the approved source', async () => {
    const owner = await signedIn('contributor');
    const source = await createSourceVia(owner.client);
    await approveDirectly(source.id);
    const other = await signedIn('contributor');
    expect((await other.client.patch(`/api/sources/${source.id}`, { version: 1, title: 'x' })).status).toBe(403);
  });
});

describe('POST /api/sources/:id/submit', () => {
  it('lists what is missing', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client, { rightsStatement: null, creators: [], holdingInstitution: null, shelfmark: null });
    const res = await client.post(`/api/sources/${source.id}/submit`, {});
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields).toMatchObject({
      rightsStatement: expect.any(String),
      excerpts: 'Add at least one excerpt',
      holdingInstitution: expect.any(String),
      shelfmark: expect.any(String),
    });
  });

  it('submits the source and its draft excerpts together, with revisions and outbox rows', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const one = await createExcerptVia(client, source.id);
    const two = await createExcerptVia(client, source.id, { locatorValue: '13r' });
    const before = await counts(source.id);
    const res = await client.post(`/api/sources/${source.id}/submit`, {});
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ status: 'submitted', version: 2 });
    expect(res.body.data.submittedAt).toBeTruthy();
    expect(res.body.submittedExcerpts.sort()).toEqual([one.id, two.id].sort());
    expect(res.body.data.excerpts.map((e: { status: string; version: number }) => [e.status, e.version])).toEqual([['submitted', 2], ['submitted', 2]]);
    const after = await counts(source.id);
    expect(after.revisions).toBe(before.revisions + 1);
    expect(after.outbox).toBe(before.outbox + 1);
    expect((await client.post(`/api/sources/${source.id}/submit`, {})).status).toBe(409);
  });

  it('returns 403 to someone else and 404 for an unknown id', async () => {
    const owner = await signedIn('contributor');
    const source = await createSourceVia(owner.client);
    await approveDirectly(source.id);
    expect((await (await signedIn('reader')).client.post(`/api/sources/${source.id}/submit`, {})).status).toBe(403);
    expect((await owner.client.post('/api/sources/S0000000/submit', {})).status).toBe(404);
    expect((await owner.client.get('/api/sources/not-an-id')).status).toBe(400);
  });
});

describe('GET /api/sources/:id/excerpts', () => {
  it('lists the excerpts a person may see', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const excerpt = await createExcerptVia(client, source.id);
    const res = await client.get(`/api/sources/${source.id}/excerpts`);
    expect(res.body.data).toEqual([
      expect.objectContaining({ id: excerpt.id, locator: { type: 'folio', value: '12v', label: 'fol. 12v' }, sizes: ['alto'], aHz: [415] }),
    ]);
  });
});
