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

export interface Scene {
  word: string;
  title: string;
  /** Approved, public, with a 40-page facsimile. */
  approvedSourceId: string;
  approvedExcerptId: string;
  /** Awaiting review. */
  submittedSourceId: string;
  submittedExcerptId: string;
  /** A draft of the demo contributor, where excerpts can be added. */
  draftSourceId: string;
  /** A programme of the demo reader citing the approved excerpt. */
  programmeId: string;
}

/**
 * The material the accessibility and keyboard checks look at, made over the API: one approved
 * source (searchable), one awaiting review, one draft, and a reader's programme.
 */
export async function buildScene(prefix: string): Promise<Scene> {
  const word = runWord(prefix);
  const title = `Letters on the flute, ${word}`;
  const contributor = await ApiSession.signIn('contributor');
  const editor = await ApiSession.signIn('editor');
  const reader = await ApiSession.signIn('reader');
  try {
    const { writeFacsimilePdf } = await import('./pdf');
    const pdfPath = await writeFacsimilePdf(`${word}.pdf`, { title, pages: 40, marker: word });
    const excerpt = (folio: string, facsimilePage: number, sizeSlug: string, aHz: number): ExcerptSeed => ({
      folio,
      facsimilePage,
      diplomatic: `The ${sizeSlug.replace('-', ' ')} at ${aHz}, as written on fol. ${folio}, ${word}`,
      translation: `The ${sizeSlug.replace('-', ' ')} at a′ = ${aHz} Hz (${word}).`,
      mentions: [{ term: sizeSlug.replace('-', ' '), language: 'en', sizeSlug }],
      pitchTags: [{ statement: `pitch ${aHz}`, aHz }],
    });
    const approved = await catalogueAndSubmit(contributor, {
      title,
      dateEdtf: '1719',
      pdfPath,
      excerpts: [excerpt('4r', 7, 'voice-flute', 415), excerpt('6v', 12, 'alto', 410)],
    });
    await waitForExtraction(contributor, approved.sourceId);
    await approveSource(editor, approved.sourceId);
    const submitted = await catalogueAndSubmit(contributor, {
      title: `Awaiting review: ${title}`,
      dateEdtf: '1724',
      pdfPath,
      excerpts: [excerpt('2r', 3, 'tenor', 415)],
    });
    const draft = await contributor.post<SourceResponse>('/api/sources', {
      title: `Draft: ${title}`,
      sourceType: 'letter',
      dateEdtf: '1726',
      languages: ['en'],
      holdingInstitution: 'Fictional Library of Windway',
      shelfmark: 'MS Draft 3',
      rightsStatement: 'Fictional; free to reproduce.',
      facsimileAccess: 'public',
    });
    await contributor.upload(`/api/sources/${draft.data.id}/facsimiles`, pdfPath, { rightsConfirmed: 'true' });
    const programme = await reader.post<{ data?: { id: string }; id?: string }>('/api/programmes', { title: `Programme: ${title}` });
    const programmeId = programme.data?.id ?? programme.id!;
    const current = await reader.get<{ data?: { version: number }; version?: number }>(`/api/programmes/${programmeId}`);
    await reader.patch(`/api/programmes/${programmeId}`, {
      version: current.data?.version ?? current.version,
      notesMarkdown: `The voice flute at chamber pitch [@${approved.excerptIds[0]}, fol. 4r].\n`,
    });
    // Searchable before anyone looks.
    const deadline = Date.now() + 20_000;
    for (;;) {
      const found = await reader.get<{ total: number }>(`/api/search?q=${word}`);
      if (found.total === 2) break;
      if (Date.now() > deadline) throw new Error('The approved scene source did not reach the search index');
      await new Promise((r) => setTimeout(r, 250));
    }
    return {
      word,
      title,
      approvedSourceId: approved.sourceId,
      approvedExcerptId: approved.excerptIds[0]!,
      submittedSourceId: submitted.sourceId,
      submittedExcerptId: submitted.excerptIds[0]!,
      draftSourceId: draft.data.id,
      programmeId,
    };
  } finally {
    await Promise.all([contributor.dispose(), editor.dispose(), reader.dispose()]);
  }
}
