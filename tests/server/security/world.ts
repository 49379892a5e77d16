/**
 * Actors and fresh fixtures for the authorization matrix. Every fixture belongs to the
 * `owner` contributor and is created anew for each request, so a write by one actor
 * never changes what the next actor meets.
 */
import { createHash, randomBytes } from 'node:crypto';
import { PDFDocument, StandardFonts } from 'pdf-lib';
import type { Role } from '@shared/schemas/auth';
import type { SessionUser } from '@server/auth/passport';
import { anonymous, createUser, testPassword, type Client } from '../../support/http';
import { buildExcerpt, buildSource } from '../../support/factories';

export const WHO = ['anonymous', 'reader', 'owner', 'other', 'editor', 'admin'] as const;
export type Who = (typeof WHO)[number];
const roleOf: Record<Exclude<Who, 'anonymous'>, Role> = { reader: 'reader', owner: 'contributor', other: 'contributor', editor: 'editor', admin: 'admin' };

type User = Awaited<ReturnType<typeof createUser>>;
type WorkflowState = 'draft' | 'submitted' | 'approved' | 'returned' | 'rejected' | 'withdrawn';

/** One request of the matrix: the method comes from the table key, the rest from here. */
export interface Req {
  path: string;
  body?: object;
  /** multipart upload: one file plus text fields */
  upload?: { field: string; name: string; bytes: Buffer; fields: Record<string, string> };
}

export async function smallPdf(text = 'Windway test facsimile'): Promise<Buffer> {
  const pdf = await PDFDocument.create();
  const page = pdf.addPage([300, 200]);
  page.drawText(text, { x: 20, y: 100, size: 12, font: await pdf.embedFont(StandardFonts.Helvetica) });
  return Buffer.from(await pdf.save({ useObjectStreams: false }));
}

let termCounter = 0;

export class World {
  readonly users = new Map<Exclude<Who, 'anonymous'>, User>();
  private readonly clients = new Map<Exclude<Who, 'anonymous'>, Client>();

  static async create(): Promise<World> {
    const world = new World();
    for (const who of WHO) {
      if (who === 'anonymous') continue;
      world.users.set(who, await createUser(roleOf[who], { displayName: `Matrix ${who}` }));
    }
    return world;
  }

  get owner(): User {
    return this.users.get('owner')!;
  }

  session(who: Exclude<Who, 'anonymous'>): SessionUser {
    const u = this.users.get(who)!;
    return { id: u.id, role: u.role, displayName: u.displayName, email: u.email };
  }

  /** A signed-in (or anonymous) client; `fresh` gives a new session, for routes that end or replace one. */
  async client(who: Who, fresh = false): Promise<Client> {
    if (who === 'anonymous') return anonymous();
    const cached = this.clients.get(who);
    if (cached && !fresh) return cached;
    const client = await anonymous();
    const res = await client.login(this.users.get(who)!.email, testPassword);
    if (res.status !== 200) throw new Error(`sign-in of ${who} failed: ${res.status}`);
    if (!fresh) this.clients.set(who, client);
    return client;
  }

  /** A source of the owner in `state`, with one excerpt (state `excerptState`, default the same). */
  async record(state: WorkflowState = 'draft', excerptState: WorkflowState = state, facsimileAccess?: 'public' | 'signed-in' | 'hidden') {
    const source = await buildSource(this.owner.id, { status: state });
    if (facsimileAccess) await source.update({ facsimileAccess });
    const excerpt = await buildExcerpt(source, { status: excerptState, term: `Matrixflöte${++termCounter}` });
    return { source, excerpt, s: source.publicId, e: excerpt.publicId, term: `Matrixflöte${termCounter}` };
  }

  /** A draft at version 2 (the owner retitled it), so version 1 can be restored. */
  async twoVersions() {
    const rec = await this.record('draft');
    const { updateSource } = await import('@server/commands/update-source');
    await updateSource(this.session('owner'), rec.s, { version: 1, title: 'Retitled for the matrix' } as never);
    return rec;
  }

  /** A one-page PDF facsimile stored through the file store, text already extracted. */
  async facsimile(state: WorkflowState = 'draft', access: 'public' | 'signed-in' | 'hidden' = 'signed-in') {
    const rec = await this.record(state, state, access);
    const bytes = await smallPdf(`Facsimile of ${rec.s}`);
    const sha256 = createHash('sha256').update(bytes).digest('hex');
    const { contentKey, getFileStore } = await import('@server/storage/file-store');
    const { Facsimile } = await import('@server/models');
    await getFileStore().put(contentKey(sha256), bytes);
    const facsimile = await Facsimile.create({
      sourceId: rec.source.id, storageKey: contentKey(sha256), originalName: 'matrix.pdf', mediaType: 'application/pdf',
      byteSize: bytes.length, sha256, pageCount: 1, extractionStatus: 'done', extractionProgress: 1, extractionError: null,
      pageTexts: ['Facsimile text'], rightsConfirmedAt: new Date(), uploadedById: this.owner.id,
    });
    return { ...rec, f: facsimile.id };
  }

  /** A programme of the owner, through the API. */
  async programme(): Promise<string> {
    const res = await (await this.client('owner')).post('/api/programmes', { title: 'Matrix programme', notesMarkdown: 'Notes.' });
    if (res.status !== 201) throw new Error(`programme fixture: ${res.status} ${JSON.stringify(res.body)}`);
    return res.body.data.id;
  }

  /** The share token of a shared programme of the owner. */
  async sharedToken(): Promise<string> {
    const id = await this.programme();
    const res = await (await this.client('owner')).post(`/api/programmes/${id}/share`);
    const token = /([A-Za-z0-9_-]{43})$/.exec(String(res.body?.data?.sharePath ?? ''))?.[1];
    if (!token) throw new Error(`share fixture: ${res.status} ${JSON.stringify(res.body)}`);
    return token;
  }

  /** A single-use token of a fresh reader (reset, verify). */
  async token(purpose: 'reset' | 'verify'): Promise<string> {
    const user = await createUser('reader');
    if (purpose === 'verify') await user.update({ emailVerifiedAt: null });
    const { issueToken } = await import('@server/services/user-tokens');
    return issueToken(user.id, purpose);
  }

  async someUser(): Promise<number> {
    return (await createUser('reader')).id;
  }
}

export const uniqueEmail = (what: string) => `${what}-${randomBytes(4).toString('hex')}@example.test`;
export const strongPassword = 'a long passphrase of reed and cane 7';
