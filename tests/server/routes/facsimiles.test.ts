import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { mkdtempSync, readdirSync, existsSync, mkdirSync, writeFileSync, utimesSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { anonymous, signedIn, type Client } from '../../support/http';
import { approveDirectly, createSourceVia } from '../../fixtures/catalogue';
import { elfBytes, htmlBytes, makePdf } from '../../fixtures/pdf';

// This file's own storage, so the sweeper test cannot touch other files' uploads.
const storageDir = mkdtempSync(join(process.env.TEST_RUN_DIR ?? tmpdir(), 'facsimiles-'));
process.env.STORAGE_DIR = storageDir;
const { resetConfigCache } = await import('@server/config');
resetConfigCache();
const { startFacsimileWork, sweepOrphanFiles } = await import('@server/services/facsimile-jobs');

let stopWork: () => Promise<void>;
beforeAll(() => {
  stopWork = startFacsimileWork({ pollMs: 100 });
});
afterAll(async () => {
  await stopWork();
});

// The smallest valid PNG: 1×1 pixel (PNG specification, W3C 2003).
const png = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAQAAAC1HAwCAAAAC0lEQVR42mNkYAAAAAYAAjCB0C8AAAAASUVORK5CYII=', 'base64');

function upload(client: Client, sourceId: string, body: Buffer, filename: string, fields: Record<string, string> = { rightsConfirmed: 'true' }) {
  let req = client.agent.post(`/api/sources/${sourceId}/facsimiles`).set('X-CSRF-Token', client.csrfToken);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach('file', body, { filename, contentType: 'application/pdf' });
}

const storedKeys = () => {
  const root = join(storageDir, 'sha256');
  return existsSync(root) ? readdirSync(root, { recursive: true, withFileTypes: true }).filter((e) => e.isFile()).map((e) => e.name) : [];
};
const tempEntries = () => {
  const dir = join(storageDir, '.tmp', 'uploads');
  return existsSync(dir) ? readdirSync(dir) : [];
};

async function until<T>(probe: () => Promise<T>, done: (value: T) => boolean, timeoutMs = 20_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe();
    if (done(value)) return value;
    if (Date.now() > deadline) throw new Error(`timed out; last value ${JSON.stringify(value)}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

describe('POST /api/sources/:id/facsimiles', () => {
  it('accepts a 40-page PDF at once and extracts its text page by page in the background', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const res = await upload(client, source.id, await makePdf(40, (p) => `Folio ${p}: item ${p} Fleute douce`), 'inventory.pdf');
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ originalName: 'inventory.pdf', mediaType: 'application/pdf', pageCount: 40, extractionStatus: 'pending', sourceId: source.id });
    expect(res.body.data.sha256).toMatch(/^[0-9a-f]{64}$/);
    const id = res.body.data.id;
    const done = await until(() => client.get(`/api/facsimiles/${id}`), (r) => ['done', 'failed'].includes(r.body.data.extractionStatus));
    expect(done.body.data).toMatchObject({ extractionStatus: 'done', extractionProgress: 40, extractionError: null });
    const page17 = await client.get(`/api/facsimiles/${id}/pages/17/text`);
    expect(page17.body.data).toMatchObject({ page: 17, pageCount: 40, text: 'Folio 17: item 17 Fleute douce' });
    expect((await client.get(`/api/facsimiles/${id}/pages/41/text`)).status).toBe(404);
    expect(tempEntries()).toEqual([]);
    const detail = await client.get(`/api/sources/${source.id}`);
    expect(detail.body.data.facsimiles.map((f: { id: number }) => f.id)).toEqual([id]);
  });

  it('answers 200 with the existing facsimile for the same bytes again', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const pdf = await makePdf(2, (p) => `duplicate test ${p} ${Date.now()}`);
    const first = await upload(client, source.id, pdf, 'a.pdf');
    const again = await upload(client, source.id, pdf, 'b.pdf');
    expect(again.status).toBe(200);
    expect(again.body).toMatchObject({ duplicate: true, data: { id: first.body.data.id, originalName: 'a.pdf' } });
    const { Facsimile } = await import('@server/models');
    expect(await Facsimile.count({ where: { sha256: first.body.data.sha256 } })).toBe(1);
  });

  it('marks an image done at once with one page', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const res = await upload(client, source.id, png, 'leaf.png');
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ mediaType: 'image/png', pageCount: 1, extractionStatus: 'done' });
  });

  it('stores a path-traversal or control-character name as a plain base name', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const res = await upload(client, source.id, await makePdf(1, () => `traversal ${Date.now()}`), '../../etc/pass\u202ewd.pdf');
    expect(res.status).toBe(201);
    expect(res.body.data.originalName).toBe('passwd.pdf');
    const backslashes = await upload(client, source.id, await makePdf(1, () => `traversal 2 ${Date.now()}`), '..\\..\\windows\\scan.pdf');
    expect(backslashes.body.data.originalName).toBe('scan.pdf');
    expect(storedKeys().every((name) => /^[0-9a-f]{64}$/.test(name))).toBe(true);
    // A raw control character breaks the multipart header itself: a 400, not a crash.
    const broken = await upload(client, source.id, png, 'bad\u0007name.png');
    expect(broken.status).toBe(400);
  });

  const refusals: [string, () => Promise<Buffer>, string, number, RegExp][] = [
    ['a renamed executable', async () => elfBytes(), 'scan.pdf', 415, /x-elf.*accepted are PDF, JPEG, PNG, TIFF/],
    ['an HTML file named .pdf', async () => htmlBytes(), 'scan.pdf', 415, /no recognised file type.*accepted/],
    ['a truncated PDF', async () => (await makePdf(10)).subarray(0, 1500), 'cut.pdf', 422, /could not be read as a PDF: /],
  ];
  for (const [what, bytes, name, status, message] of refusals) {
    it(`refuses ${what} (${status}) and keeps nothing`, async () => {
      const { client } = await signedIn('contributor');
      const source = await createSourceVia(client);
      const before = storedKeys();
      const res = await upload(client, source.id, await bytes(), name);
      expect(res.status).toBe(status);
      expect(res.body.error.message).toMatch(message);
      expect(storedKeys()).toEqual(before);
      expect(tempEntries()).toEqual([]);
    });
  }

  it('requires rightsConfirmed=true and a file, naming each', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const noRights = await upload(client, source.id, await makePdf(1), 'x.pdf', {});
    expect(noRights.status).toBe(400);
    expect(noRights.body.error.fields.rightsConfirmed).toMatch(/Confirm/);
    const noFile = await client.agent.post(`/api/sources/${source.id}/facsimiles`).set('X-CSRF-Token', client.csrfToken).field('rightsConfirmed', 'true');
    expect(noFile.body.error.fields.file).toBeTruthy();
    expect(tempEntries()).toEqual([]);
  });

  it('is refused to others: 404 on someone else’s draft, 403 to a reader of an approved source', async () => {
    const owner = await signedIn('contributor');
    const source = await createSourceVia(owner.client);
    expect((await upload((await signedIn('contributor')).client, source.id, png, 'x.png')).status).toBe(404);
    await approveDirectly(source.id);
    expect((await upload((await signedIn('reader')).client, source.id, png, 'x.png')).status).toBe(403);
  });
});

describe('upload size limits', () => {
  const previous = { bytes: process.env.UPLOAD_MAX_BYTES, pages: process.env.UPLOAD_MAX_PAGES };
  beforeAll(() => {
    process.env.UPLOAD_MAX_BYTES = String(20 * 1024);
    process.env.UPLOAD_MAX_PAGES = '3';
    resetConfigCache();
  });
  afterAll(() => {
    for (const [name, value] of [['UPLOAD_MAX_BYTES', previous.bytes], ['UPLOAD_MAX_PAGES', previous.pages]] as const) {
      if (value === undefined) delete process.env[name];
      else process.env[name] = value;
    }
    resetConfigCache();
  });

  it('answers 422 for a PDF with more pages than allowed, and keeps nothing', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const before = storedKeys();
    const res = await upload(client, source.id, await makePdf(5, (p) => `too many ${p} ${Date.now()}`), 'long.pdf');
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/5 pages; at most 3/);
    expect(storedKeys()).toEqual(before);
    expect(tempEntries()).toEqual([]);
  });

  it('answers 413 with the limit and keeps nothing', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const before = storedKeys();
    const res = await upload(client, source.id, Buffer.concat([await makePdf(1), Buffer.alloc(100 * 1024, 0x20)]), 'big.pdf');
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/upload limit of 20 KB/);
    expect(storedKeys()).toEqual(before);
    expect(tempEntries()).toEqual([]);
  });
});

describe('GET /api/facsimiles/:id/file', () => {
  async function sourceWithFile(access: 'public' | 'signed-in' | 'hidden') {
    const owner = await signedIn('contributor');
    const source = await createSourceVia(owner.client, { facsimileAccess: access });
    const pdf = await makePdf(1, () => `access ${access} ${Date.now()}`);
    const res = await upload(owner.client, source.id, pdf, 'Inventar 1712.pdf');
    await approveDirectly(source.id);
    return { owner, id: res.body.data.id as number, pdf };
  }

  it('streams a public facsimile to anyone, inline, with its type and nosniff', async () => {
    const { id, pdf } = await sourceWithFile('public');
    const res = await (await anonymous()).get(`/api/facsimiles/${id}/file`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toBe("inline; filename*=UTF-8''Inventar%201712.pdf");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(Buffer.compare(res.body as Buffer, pdf)).toBe(0);
  });

  it('shows a signed-in facsimile only to signed-in users', async () => {
    const { id } = await sourceWithFile('signed-in');
    expect((await (await anonymous()).get(`/api/facsimiles/${id}/file`)).status).toBe(401);
    expect((await (await anonymous()).get(`/api/facsimiles/${id}/pages/1/text`)).status).toBe(401);
    expect((await (await signedIn('reader')).client.get(`/api/facsimiles/${id}/file`)).status).toBe(200);
  });

  it('shows a hidden facsimile only to its contributor and editors', async () => {
    const { id, owner } = await sourceWithFile('hidden');
    expect((await (await signedIn('reader')).client.get(`/api/facsimiles/${id}/file`)).status).toBe(403);
    expect((await (await signedIn('contributor')).client.get(`/api/facsimiles/${id}/file`)).status).toBe(403);
    expect((await owner.client.get(`/api/facsimiles/${id}/file`)).status).toBe(200);
    expect((await (await signedIn('editor')).client.get(`/api/facsimiles/${id}/file`)).status).toBe(200);
    // The metadata stays visible with the source; it says the file is not.
    expect((await (await signedIn('reader')).client.get(`/api/facsimiles/${id}`)).body.access).toEqual({ file: false });
  });

  it('hides facsimiles of a draft source entirely (404)', async () => {
    const owner = await signedIn('contributor');
    const source = await createSourceVia(owner.client, { facsimileAccess: 'public' });
    const res = await upload(owner.client, source.id, png, 'leaf.png');
    expect((await (await anonymous()).get(`/api/facsimiles/${res.body.data.id}/file`)).status).toBe(404);
  });
});

describe('sweepOrphanFiles', () => {
  it('deletes stored files no row references and stale temp files, and keeps the rest', async () => {
    const { client } = await signedIn('contributor');
    const source = await createSourceVia(client);
    const kept = (await upload(client, source.id, await makePdf(1, () => `kept ${Date.now()}`), 'kept.pdf')).body.data.sha256;
    const { getFileStore, contentKey } = await import('@server/storage/file-store');
    const orphan = 'f'.repeat(64);
    await getFileStore().put(contentKey(orphan), Buffer.from('left behind by a crash'));
    const tempDir = join(storageDir, '.tmp', 'uploads', 'req-crashed');
    mkdirSync(tempDir, { recursive: true });
    writeFileSync(join(tempDir, 'upload.bin'), 'partial');
    const old = new Date(Date.now() - 2 * 60 * 60 * 1000);
    utimesSync(join(tempDir, 'upload.bin'), old, old);
    utimesSync(tempDir, old, old);

    const swept = await sweepOrphanFiles({ olderThanMs: 0 });
    expect(swept.files).toEqual([contentKey(orphan)]);
    expect(storedKeys()).toContain(kept);
    expect(storedKeys()).not.toContain(orphan);
    expect(existsSync(tempDir)).toBe(false);
  });

  it('keeps an upload in progress inside an old scratch folder, and the scratch folders themselves', async () => {
    const uploads = join(storageDir, '.tmp', 'uploads');
    const fresh = join(uploads, 'req-in-progress');
    mkdirSync(fresh, { recursive: true });
    writeFileSync(join(fresh, 'upload.bin'), 'arriving');
    const old = new Date(Date.now() - 2 * 60 * 60 * 1000);
    utimesSync(uploads, old, old);

    const swept = await sweepOrphanFiles();
    expect(swept.temp).toEqual([]);
    expect(existsSync(join(fresh, 'upload.bin'))).toBe(true);
    rmSync(fresh, { recursive: true });
  });
});
