/**
 * The app process killed (SIGKILL: no handler, no `finally` runs) in the middle of a facsimile
 * upload or a submission: no half-written rows, and every file left behind is one the orphan
 * sweeper removes. Then the app starts again and serves.
 * ASVS 4.0.3 names no requirement for crash consistency: this is a reliability requirement of
 * issue 8. (Leftover upload files must not pile up either; nearest is V12.1.1, uploads must not
 * be able to fill the storage.)
 */
import { afterAll, describe, expect, it } from 'vitest';
import { fork, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdtempSync, readdirSync, rmSync, statSync } from 'node:fs';
import { request as httpRequest } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { PDFDocument } from 'pdf-lib';
import { QueryTypes, Transaction } from 'sequelize';
import { resetConfigCache } from '@server/config';
import { getSequelize } from '@server/db';
import { Excerpt, Facsimile, Revision, SearchOutbox, Source } from '@server/models';
import { sweepOrphanFiles } from '@server/services/facsimile-jobs';
import { createUser, testPassword } from '../../support/http';
import { buildExcerpt, buildSource } from '../../fixtures/catalogue';
import { makePdf } from '../../fixtures/pdf';

// This file's own storage, shared with its app processes, so the sweep touches no other file's uploads.
const storageDir = mkdtempSync(join(process.env.TEST_RUN_DIR ?? tmpdir(), 'app-killed-'));
process.env.STORAGE_DIR = storageDir;
resetConfigCache();

const serveScript = fileURLToPath(new URL('../../../server/cli/serve.ts', import.meta.url));
const MB = 1024 * 1024;
const running = new Set<ChildProcess>();

afterAll(() => {
  for (const child of running) child.kill('SIGKILL');
  rmSync(storageDir, { recursive: true, force: true });
});

/** `npm run serve` as its own process on this file's database, started as tests/load/run.ts does. */
async function startApp() {
  const env: NodeJS.ProcessEnv = { ...process.env, PORT: '0', MIGRATE: '0', STORAGE_DIR: storageDir };
  // No search client: nothing drains search_outbox, so the test can count the rows a write left there.
  delete env.MEILI_HOST;
  // Its stderr stays visible (a crash while starting says why); its start-up line does not.
  const child = fork(serveScript, [], { execArgv: ['--import', 'tsx'], env, stdio: ['ignore', 'ignore', 'inherit', 'ipc'] });
  running.add(child);
  const exited = new Promise<NodeJS.Signals | null>((done) => child.once('exit', (_code, signal) => (running.delete(child), done(signal))));
  const url = await Promise.race([
    new Promise<string>((done) => child.once('message', (message) => done((message as { url: string }).url))),
    exited.then((signal) => Promise.reject(new Error(`the app stopped while starting (${signal})`))),
  ]);
  return { url, child, exited };
}
type AppProcess = Awaited<ReturnType<typeof startApp>>;

/** Row counts and version sums; read uncommitted, they include what an open transaction has written so far. */
async function tally(level: 'READ_UNCOMMITTED' | 'READ_COMMITTED') {
  const sql = `SELECT (SELECT COUNT(*) FROM facsimiles) AS facsimiles, (SELECT COUNT(*) FROM revisions) AS revisions,
    (SELECT COUNT(*) FROM search_outbox) AS outbox, (SELECT COALESCE(SUM(version), 0) FROM sources) AS sourceVersions,
    (SELECT COALESCE(SUM(version), 0) FROM excerpts) AS excerptVersions`;
  const [row] = await getSequelize().transaction({ isolationLevel: Transaction.ISOLATION_LEVELS[level] }, (transaction) =>
    getSequelize().query<Record<string, number>>(sql, { type: QueryTypes.SELECT, transaction }),
  );
  return Object.fromEntries(Object.entries(row).map(([k, v]) => [k, Number(v)]));
}

/** Search outbox rows written but not committed yet: how far an open catalogue write has got. */
const uncommittedOutboxRows = async () => (await tally('READ_UNCOMMITTED')).outbox - (await tally('READ_COMMITTED')).outbox;

/**
 * SIGKILL, then wait until MariaDB has rolled back what the dead process left uncommitted: a
 * dead connection sends nothing more, so once no write is pending the committed state is final.
 */
async function kill(app: AppProcess): Promise<void> {
  app.child.kill('SIGKILL');
  expect(await app.exited).toBe('SIGKILL');
  await until('the rollback of what the dead process left open', async () => JSON.stringify(await tally('READ_UNCOMMITTED')) === JSON.stringify(await tally('READ_COMMITTED')), 20);
}

/** Polls until `probe` holds; `pauseMs` 0 (the default) for windows only milliseconds long. */
async function until(what: string, probe: () => Promise<boolean> | boolean, pauseMs = 0, timeoutMs = 15_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!(await probe())) {
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => (pauseMs ? setTimeout(r, pauseMs) : setImmediate(r)));
  }
}

/** A contributor's signed-in session; users and sessions live in MariaDB, so it outlives each app process. */
async function signIn(url: string) {
  const user = await createUser('contributor');
  const cookiesOf = (res: Response) => res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  const me = await fetch(`${url}/api/auth/me`);
  const anonymous = { cookie: cookiesOf(me), 'x-csrf-token': ((await me.json()) as { csrfToken: string }).csrfToken };
  const login = await fetch(`${url}/api/auth/login`, {
    method: 'POST',
    headers: { ...anonymous, 'content-type': 'application/json' },
    body: JSON.stringify({ email: user.email, password: testPassword }),
  });
  expect(login.status).toBe(200);
  const headers = { cookie: cookiesOf(login), 'x-csrf-token': ((await login.json()) as { csrfToken: string }).csrfToken };
  const post = async (base: string, path: string, body: object) => {
    const res = await fetch(`${base}${path}`, { method: 'POST', headers: { ...headers, 'content-type': 'application/json' }, body: JSON.stringify(body) });
    return { status: res.status, body: (await res.json()) as { data: { id: string } } };
  };
  return { headers, post };
}
let session: Awaited<ReturnType<typeof signIn>> | undefined;

/** A fresh app process, the contributor signed in, and a new source of theirs. */
async function appWithSource() {
  const app = await startApp();
  session ??= await signIn(app.url);
  const source = await session.post(app.url, '/api/sources', buildSource());
  expect(source.status).toBe(201);
  const publicId = source.body.data.id;
  return { app, session, publicId, id: (await Source.findOne({ where: { publicId } }))!.id };
}

/** A raw request whose body the test writes itself; its connection dies with the app. */
function rawPost(url: string, headers: Record<string, string>) {
  const req = httpRequest(url, { method: 'POST', headers });
  const state = { req, answered: false };
  req.on('error', () => {});
  req.on('response', (res) => ((state.answered = true), res.resume()));
  return state;
}

function multipart(file: Buffer) {
  const boundary = `----windway-${randomBytes(8).toString('hex')}`;
  const head = Buffer.from(
    `--${boundary}\r\nContent-Disposition: form-data; name="rightsConfirmed"\r\n\r\ntrue\r\n` +
      `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="scan.pdf"\r\nContent-Type: application/pdf\r\n\r\n`,
  );
  return { body: Buffer.concat([head, file, Buffer.from(`\r\n--${boundary}--\r\n`)]), headLength: head.length, type: `multipart/form-data; boundary=${boundary}` };
}

const filesUnder = (dir: string): string[] =>
  existsSync(dir) ? readdirSync(dir, { recursive: true, withFileTypes: true }).filter((e) => e.isFile()).map((e) => join(e.parentPath, e.name)) : [];
const storedFiles = () => filesUnder(join(storageDir, 'sha256'));
const tempFiles = () => filesUnder(join(storageDir, '.tmp'));

describe('the app process killed during an upload', () => {
  it('mid-stream: no facsimile row; the sweeper removes the partial temp file', async () => {
    const { app, session, publicId, id } = await appWithSource();
    // 8 MB announced, the part headers and 1 MB sent: the app is writing the file when it dies.
    const { body, headLength, type } = multipart(Buffer.concat([Buffer.from('%PDF-1.7\n'), Buffer.alloc(8 * MB, 0x20)]));
    const upload = rawPost(`${app.url}/api/sources/${publicId}/facsimiles`, { ...session.headers, 'content-type': type, 'content-length': String(body.length) });
    upload.req.write(body.subarray(0, headLength + MB));
    await until('the partial upload on disk', () => tempFiles().some((path) => statSync(path, { throwIfNoEntry: false })?.size), 20);
    await kill(app);

    expect(await Facsimile.count({ where: { sourceId: id } })).toBe(0);
    expect(tempFiles().length).toBeGreaterThan(0);
    expect((await sweepOrphanFiles({ olderThanMs: 0 })).temp.length).toBeGreaterThan(0);
    expect(tempFiles()).toEqual([]);
    expect(storedFiles()).toEqual([]);
  }, 60_000);

  it('while storing the file: a row always has its whole file, and after the sweep no file lacks a row', async () => {
    // A valid PDF made large (6 MB of attached random bytes), so that storing it takes a moment.
    const doc = await PDFDocument.load(await makePdf(3));
    await doc.attach(randomBytes(6 * MB), 'padding.bin', { mimeType: 'application/octet-stream' });
    const pdf = Buffer.from(await doc.save());
    const moments: [string, () => boolean][] = [
      ['copying into the store', () => filesUnder(join(storageDir, '.tmp', 'store')).length > 0],
      ['the stored file renamed into place', () => storedFiles().length > 0],
    ];
    for (const [moment, reached] of moments) {
      const { app, session, publicId, id } = await appWithSource();
      const { body, type } = multipart(Buffer.concat([pdf, Buffer.from(`%${moment}\n`)])); // new bytes each time, so never a duplicate
      const upload = rawPost(`${app.url}/api/sources/${publicId}/facsimiles`, { ...session.headers, 'content-type': type, 'content-length': String(body.length) });
      upload.req.end(body);
      await until(moment, () => reached() || upload.answered);
      const answered = upload.answered;
      await kill(app);
      const rows = await Facsimile.findAll({ where: { sourceId: id } });
      console.log(`[app-killed] upload killed ${answered ? 'after its answer, not' : 'when'} ${moment}: ${rows.length} row(s), ${storedFiles().length} stored file(s)`);
      for (const row of rows) expect(statSync(join(storageDir, ...row.storageKey.split('/'))).size).toBe(row.byteSize);
    }
    await sweepOrphanFiles({ olderThanMs: 0 });
    expect(tempFiles()).toEqual([]);
    const referenced = (await Facsimile.findAll()).map((f) => join(storageDir, ...f.storageKey.split('/')));
    expect(storedFiles().sort()).toEqual([...new Set(referenced)].sort());
  }, 120_000);
});

/** The source and its excerpts: status, version, revision versions and search outbox rows of each. */
async function stateOf(sourceId: number) {
  const source = (await Source.findByPk(sourceId))!;
  const excerpts = await Excerpt.findAll({ where: { sourceId }, order: [['id', 'ASC']] });
  const entities = [{ kind: 'source' as const, row: source }, ...excerpts.map((row) => ({ kind: 'excerpt' as const, row }))];
  return Promise.all(
    entities.map(async ({ kind, row }) => ({
      kind,
      status: row.status,
      version: row.version,
      revisions: (await Revision.findAll({ where: { entityType: kind, entityId: row.id }, order: [['version', 'ASC']] })).map((r) => r.version),
      outbox: await SearchOutbox.count({ where: { entityType: kind, entityId: row.id } }),
    })),
  );
}

describe('the app process killed during a submission', () => {
  const EXCERPTS = 20; // a submission writes one outbox row for the source and one per excerpt, each with its revision
  const sources: { publicId: string; id: number }[] = [];

  it('leaves each source either untouched or wholly submitted, never in between', async () => {
    // When to kill: with the transaction open (after its first write, and halfway), once the
    // answer has begun (committed), and at two random moments.
    type Moment = (uncommitted: number, answered: boolean, elapsedMs: number) => boolean;
    const randomMoment = (): [string, Moment] => {
      const atMs = Math.floor(Math.random() * 150);
      return [`${atMs} ms after sending`, (_u, _a, elapsedMs) => elapsedMs >= atMs];
    };
    const moments: [string, Moment][] = [
      ['after its first write', (uncommitted) => uncommitted >= 1],
      ['halfway through its writes', (uncommitted) => uncommitted >= (EXCERPTS + 1) / 2],
      ['once answered', (_u, answered) => answered],
      randomMoment(),
      randomMoment(),
    ];
    const outcomes: string[] = [];
    let rolledBack = 0;
    for (const [moment, reached] of moments) {
      const { app, session, publicId, id } = await appWithSource();
      for (let e = 0; e < EXCERPTS; e += 1) expect((await session.post(app.url, `/api/sources/${publicId}/excerpts`, buildExcerpt())).status).toBe(201);
      sources.push({ publicId, id });
      const before = await stateOf(id);

      const submit = rawPost(`${app.url}/api/sources/${publicId}/submit`, { ...session.headers, 'content-type': 'application/json', 'content-length': '2' });
      submit.req.end('{}');
      const sentAt = Date.now();
      let uncommitted = 0;
      await until(moment, async () => reached((uncommitted = await uncommittedOutboxRows()), submit.answered, Date.now() - sentAt) || submit.answered);
      await kill(app);

      const after = await stateOf(id);
      // Every entity: one revision per version, the highest equal to its version.
      for (const entity of after) expect(entity.revisions).toEqual(Array.from({ length: entity.version }, (_, i) => i + 1));
      if (after[0].status === 'draft') {
        expect(after, `killed ${moment}: not submitted, so nothing may have changed`).toEqual(before);
        if (uncommitted > 0) rolledBack += 1;
      } else {
        // Submitted: the source and every draft excerpt moved together, each with its revision and outbox row.
        expect(after).toEqual(before.map((b) => ({ ...b, status: 'submitted', version: b.version + 1, revisions: [...b.revisions, b.version + 1], outbox: b.outbox + 1 })));
        expect((await Source.findByPk(id))!.submittedAt).not.toBeNull();
      }
      if (moment === 'once answered') expect(after[0].status).toBe('submitted');
      outcomes.push(`${moment} (${uncommitted} uncommitted outbox rows seen): ${after[0].status}`);
    }
    console.log(`[app-killed] submissions killed ${outcomes.join('; ')}`);
    // At least one kill hit an open transaction that had already written, and it was rolled back whole.
    expect(rolledBack).toBeGreaterThanOrEqual(1);
  }, 180_000);

  it('then starts again and serves: the session, reads and writes work', async () => {
    const app = await startApp();
    session ??= await signIn(app.url);
    const health = await fetch(`${app.url}/api/health`);
    expect(health.status).toBe(200);
    expect(await health.json()).toMatchObject({ db: 'ok' });
    const mine = await fetch(`${app.url}/api/sources?mine=1`, { headers: session.headers });
    expect(mine.status).toBe(200);
    expect(((await mine.json()) as { total: number }).total).toBeGreaterThanOrEqual(sources.length);
    expect((await session.post(app.url, '/api/sources', buildSource())).status).toBe(201);
    // A source a kill left untouched is submitted whole now.
    for (const { publicId, id } of sources) {
      if ((await Source.findByPk(id))!.status !== 'draft') continue;
      expect((await session.post(app.url, `/api/sources/${publicId}/submit`, {})).status).toBe(200);
      expect((await stateOf(id)).every((e) => e.status === 'submitted')).toBe(true);
    }
    await kill(app);
  }, 60_000);
});
