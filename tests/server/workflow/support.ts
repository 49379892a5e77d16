/**
 * Builders and actions for the workflow tests. Catalogue steps (create, edit, submit,
 * withdraw) go through the catalogue API when it is mounted, else through the same
 * commands the API calls, so these tests exercise the review half either way.
 */
import type { Response } from 'supertest';
import { signedIn, type Client } from '../../support/http';
import type { SessionUser } from '@server/auth/passport';
import type { User } from '@server/models';

export interface Actor {
  client: Client;
  user: User;
  session: SessionUser;
}

export async function actor(role: 'reader' | 'contributor' | 'editor' | 'admin'): Promise<Actor> {
  const { client, user } = await signedIn(role);
  return { client, user, session: { id: user.id, role: user.role, displayName: user.displayName, email: user.email } };
}

export interface Result {
  status: number;
  body: { error?: { code: string; message: string; fields?: Record<string, string> } } & Record<string, unknown>;
}

const routeMissing = (res: Response) => res.status === 404 && /The API route/.test(String(res.body?.error?.message ?? ''));

/** Runs a command the way its route would answer: status and error body. */
async function viaCommand(run: () => Promise<unknown>, okStatus = 200): Promise<Result> {
  const { HttpError } = await import('@server/errors');
  try {
    const value = await run();
    return { status: okStatus, body: { data: value as Record<string, unknown> } };
  } catch (error) {
    if (error instanceof HttpError) return { status: error.status, body: { error: { code: error.code, message: error.message, fields: error.fields } } };
    throw error;
  }
}

export const sourceInput = (overrides: Record<string, unknown> = {}) => ({
  title: 'Principes de la flute traversiere, ou flute d’Allemagne (test copy)',
  sourceType: 'treatise',
  creators: [{ name: 'Jacques Hotteterre', role: 'author' }],
  dateEdtf: '1707',
  languages: ['fr'],
  holdingInstitution: 'Test Library',
  shelfmark: 'Mus. 1',
  rightsStatement: 'Public domain; facsimile by the test library.',
  ...overrides,
});

export const excerptInput = (n: number, overrides: Record<string, unknown> = {}) => ({
  locatorType: 'page',
  locatorValue: String(10 + n),
  diplomatic: `La flute douce se tient ainsi, passage ${n}.`,
  normalised: `La flûte douce se tient ainsi, passage ${n}.`,
  translation: `The recorder is held thus, passage ${n}.`,
  translationLanguage: 'en',
  mentions: [{ term: 'flute douce', language: 'fr', sizeSlug: 'alto', certainty: 'probable' }],
  pitchTags: [{ statement: 'un ton plus bas', aHz: 415, derivation: 'inferred' }],
  ...overrides,
});

export async function createSource(a: Actor, overrides: Record<string, unknown> = {}): Promise<{ id: string; version: number }> {
  const res = await a.client.post('/api/sources', sourceInput(overrides));
  if (!routeMissing(res)) {
    if (res.status !== 201) throw new Error(`create source: ${res.status} ${JSON.stringify(res.body)}`);
    return { id: res.body.data.id, version: res.body.data.version };
  }
  const { createSource: create } = await import('@server/commands/create-source');
  const { sourceFieldsSchema } = await import('@shared/catalogue/schemas');
  const source = await create(a.session, sourceFieldsSchema.parse(sourceInput(overrides)));
  return { id: source.publicId, version: source.version };
}

export async function createExcerpt(a: Actor, sourceId: string, n: number, overrides: Record<string, unknown> = {}): Promise<{ id: string; version: number }> {
  const res = await a.client.post(`/api/sources/${sourceId}/excerpts`, excerptInput(n, overrides));
  if (!routeMissing(res)) {
    if (res.status !== 201) throw new Error(`create excerpt: ${res.status} ${JSON.stringify(res.body)}`);
    return { id: res.body.data.id, version: res.body.data.version };
  }
  const { createExcerpt: create } = await import('@server/commands/create-excerpt');
  const { createExcerptSchema } = await import('@shared/catalogue/schemas');
  const excerpt = await create(a.session, sourceId, createExcerptSchema.parse(excerptInput(n, overrides)));
  return { id: excerpt.publicId, version: excerpt.version };
}

export async function submitSource(a: Actor, sourceId: string): Promise<Result> {
  const res = await a.client.post(`/api/sources/${sourceId}/submit`, {});
  if (!routeMissing(res)) return res as unknown as Result;
  const { submitSource: submit } = await import('@server/commands/submit-source');
  return viaCommand(() => submit(a.session, sourceId));
}

export async function withdrawSource(a: Actor, sourceId: string): Promise<Result> {
  const res = await a.client.post(`/api/sources/${sourceId}/withdraw`, {});
  if (!routeMissing(res)) return res as unknown as Result;
  const { withdrawSource: withdraw } = await import('@server/commands/withdraw-source');
  return viaCommand(() => withdraw(a.session, sourceId));
}

export async function editExcerpt(a: Actor, excerptId: string, changes: Record<string, unknown>): Promise<Result> {
  const res = await a.client.patch(`/api/excerpts/${excerptId}`, changes);
  if (!routeMissing(res)) return res as unknown as Result;
  const { updateExcerpt } = await import('@server/commands/update-excerpt');
  const { updateExcerptSchema } = await import('@shared/catalogue/schemas');
  const parsed = updateExcerptSchema.safeParse(changes);
  if (!parsed.success) return { status: 400, body: { error: { code: 'validation_failed', message: parsed.error.message } } };
  return viaCommand(() => updateExcerpt(a.session, excerptId, parsed.data));
}

/** A contributor's source with `n` excerpts, submitted for review. */
export async function submittedSource(contributor: Actor, n = 3) {
  const source = await createSource(contributor);
  const excerpts = [];
  for (let i = 1; i <= n; i += 1) excerpts.push(await createExcerpt(contributor, source.id, i));
  const res = await submitSource(contributor, source.id);
  if (res.status !== 200 && res.status !== 201) throw new Error(`submit: ${res.status} ${JSON.stringify(res.body)}`);
  return { source, excerpts };
}

export async function currentVersion(kind: 'source' | 'excerpt', id: string): Promise<{ version: number; status: string; approvedVersion: number | null; rowId: number }> {
  const { Source, Excerpt } = await import('@server/models');
  const row = kind === 'source' ? await Source.findOne({ where: { publicId: id } }) : await Excerpt.findOne({ where: { publicId: id } });
  if (!row) throw new Error(`${kind} ${id} not found`);
  return { version: row.version, status: row.status, approvedVersion: row.approvedVersion, rowId: row.id };
}

export async function countRows(kind: 'source' | 'excerpt', id: string) {
  const { Revision, SearchOutbox, Review } = await import('@server/models');
  const { rowId } = await currentVersion(kind, id);
  const where = { entityType: kind, entityId: rowId };
  return { revisions: await Revision.count({ where }), outbox: await SearchOutbox.count({ where }), reviews: await Review.count({ where }) };
}

export const decide = (a: Actor, kind: 'source' | 'excerpt', id: string, version: number, decision: string, extra: Record<string, unknown> = {}) =>
  a.client.post('/api/reviews', { target: { kind, id, version }, decision, ...extra });

/** The path of the first Windway link in a mail's text. */
export function linkPath(text: string): string {
  const match = /(https?:\/\/\S+)/.exec(text);
  if (!match) throw new Error(`no link in: ${text}`);
  return new URL(match[1]).pathname;
}
