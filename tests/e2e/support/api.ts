/**
 * Setting the scene over the public API (fast), so each journey file can run on its own:
 * a signed-in API session per demo account, and helpers that catalogue, submit and approve
 * material the way the web client does (JSON, session cookie, X-CSRF-Token).
 */
import { readFileSync } from 'node:fs';
import { basename } from 'node:path';
import { request, type APIRequestContext, type APIResponse } from 'playwright-core';
import { baseUrl, demoAccount, type DemoRole } from './browser';

export class ApiSession {
  private constructor(
    readonly context: APIRequestContext,
    private csrf: string,
  ) {}

  static async signIn(role: DemoRole): Promise<ApiSession> {
    const context = await request.newContext({ baseURL: baseUrl() });
    const me = await context.get('/api/auth/me');
    const { csrfToken } = (await me.json()) as { csrfToken: string };
    const account = demoAccount(role);
    const login = await context.post('/api/auth/login', { data: account, headers: { 'X-CSRF-Token': csrfToken } });
    if (!login.ok()) throw new Error(`API sign-in of the demo ${role} failed: ${login.status()} ${await login.text()}`);
    const body = (await login.json()) as { csrfToken: string };
    return new ApiSession(context, body.csrfToken);
  }

  private async check<T>(response: APIResponse, what: string): Promise<T> {
    if (!response.ok()) throw new Error(`${what} failed: ${response.status()} ${await response.text()}`);
    return (response.status() === 204 ? undefined : await response.json()) as T;
  }

  get<T>(path: string): Promise<T> {
    return this.context.get(path).then((r) => this.check<T>(r, `GET ${path}`));
  }
  post<T>(path: string, data: unknown): Promise<T> {
    return this.context.post(path, { data, headers: { 'X-CSRF-Token': this.csrf } }).then((r) => this.check<T>(r, `POST ${path}`));
  }
  patch<T>(path: string, data: unknown): Promise<T> {
    return this.context.patch(path, { data, headers: { 'X-CSRF-Token': this.csrf } }).then((r) => this.check<T>(r, `PATCH ${path}`));
  }
  upload<T>(path: string, filePath: string, fields: Record<string, string>): Promise<T> {
    return this.context
      .post(path, {
        headers: { 'X-CSRF-Token': this.csrf },
        multipart: { ...fields, file: { name: basename(filePath), mimeType: 'application/pdf', buffer: readFileSync(filePath) } },
      })
      .then((r) => this.check<T>(r, `POST ${path} (upload)`));
  }

  dispose(): Promise<void> {
    return this.context.dispose();
  }
}

export interface SourceResponse {
  data: {
    id: string;
    title: string;
    status: string;
    version: number;
    facsimiles: { id: number; extractionStatus: string; pageCount: number | null }[];
    excerpts: { id: string; status: string; version: number; locator: { label: string } }[];
  };
}
export interface ExcerptResponse {
  data: { id: string; status: string; version: number; locator: { type: string; value: string; label: string } };
}

export interface ExcerptSeed {
  folio: string;
  facsimilePage: number;
  diplomatic: string;
  translation?: string;
  dateEdtf?: string | null;
  mentions: { term: string; language: string; sizeSlug: string; certainty?: string }[];
  pitchTags: { statement: string; aHz: number; derivation?: string }[];
}

/** A unique word for this run, so searches find this run's material and nothing else. */
export const runWord = (prefix: string) => `${prefix}${Date.now().toString(36)}${Math.floor(Math.random() * 1e4).toString(36)}`;

/** Catalogues a source with its facsimile and excerpts as the demo contributor, and submits it. */
export async function catalogueAndSubmit(
  contributor: ApiSession,
  input: { title: string; dateEdtf: string; pdfPath: string; excerpts: ExcerptSeed[]; facsimileAccess?: 'public' | 'signed-in' },
): Promise<{ sourceId: string; excerptIds: string[] }> {
  const source = await contributor.post<SourceResponse>('/api/sources', {
    title: input.title,
    sourceType: 'account',
    creators: [{ name: 'Hieronymus Quaintance (fictional)', role: 'scribe' }],
    dateEdtf: input.dateEdtf,
    calendarNote: 'unstated',
    place: 'Amsterdam',
    languages: ['en'],
    holdingInstitution: 'Fictional Municipal Archive of Windway',
    shelfmark: 'MS Demo 17',
    rightsStatement: 'Fictional document made for testing; free to reproduce.',
    facsimileAccess: input.facsimileAccess ?? 'public',
  });
  const sourceId = source.data.id;
  await contributor.upload(`/api/sources/${sourceId}/facsimiles`, input.pdfPath, { rightsConfirmed: 'true' });
  const excerptIds: string[] = [];
  for (const e of input.excerpts) {
    const created = await contributor.post<ExcerptResponse>(`/api/sources/${sourceId}/excerpts`, {
      locatorType: 'folio',
      locatorValue: e.folio,
      facsimilePage: e.facsimilePage,
      diplomatic: e.diplomatic,
      translation: e.translation ?? null,
      translationLanguage: e.translation ? 'en' : null,
      dateEdtf: e.dateEdtf ?? null,
      mentions: e.mentions.map((m) => ({ certainty: 'certain', ...m })),
      pitchTags: e.pitchTags.map((p) => ({ derivation: 'stated', ...p })),
    });
    excerptIds.push(created.data.id);
  }
  await contributor.post(`/api/sources/${sourceId}/submit`, {});
  return { sourceId, excerptIds };
}

/** Approves a submitted source (and with it its excerpts awaiting review) as the demo editor. */
export async function approveSource(editor: ApiSession, sourceId: string): Promise<void> {
  const source = await editor.get<SourceResponse>(`/api/sources/${sourceId}`);
  await editor.post('/api/reviews', { target: { kind: 'source', id: sourceId, version: source.data.version }, decision: 'approve' });
}

/** Waits until the facsimiles of a source have their text extracted (the background job). */
export async function waitForExtraction(session: ApiSession, sourceId: string, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const source = await session.get<SourceResponse>(`/api/sources/${sourceId}`);
    if (source.data.facsimiles.every((f) => f.extractionStatus === 'done')) return;
    if (source.data.facsimiles.some((f) => f.extractionStatus === 'failed')) throw new Error('Text extraction failed');
    if (Date.now() > deadline) throw new Error(`Text extraction of ${sourceId} did not finish in ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 250));
  }
}
