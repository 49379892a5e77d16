/**
 * The authorization matrix: for every `METHOD path` the API mounts, the status each actor
 * gets — anonymous, reader, the contributor who owns the record, another contributor,
 * an editor, an admin — and how to build a request whose body is valid, so the status
 * reflects authorization, not validation (ASVS 4.0.3 V4.1.1, V4.1.3, V4.2.1).
 *
 * OK = any of 200/201/202/204 (allowed). Denials: 401 (sign in), 403 (signed in, not allowed),
 * 404 (drafts, programmes and other people's private records are invisible rather than
 * forbidden, so their existence does not leak — ASVS V4.2.1).
 * A key may carry a variant after ` · ` (another record state for the same route).
 * Records are fresh per request and belong to `owner`; unless a variant says otherwise the
 * record is a DRAFT source with one draft excerpt.
 */
import { testPassword } from '../../support/http';
import { strongPassword, uniqueEmail, type Req, type Who, type World } from './world';

export const OK = 'ok' as const;
export type Expected = number | typeof OK;
export interface Row {
  expect: [anonymous: Expected, reader: Expected, owner: Expected, other: Expected, editor: Expected, admin: Expected];
  build: (w: World, who: Who) => Promise<Req> | Req;
  /** Runs on a fresh session (the route signs in, out, or replaces the session). */
  freshSession?: boolean;
}
const row = (expect: Row['expect'], build: Row['build'], freshSession = false): Row => ({ expect, build, freshSession });
const path = (p: string): Req => ({ path: p });

const PUBLIC: Row['expect'] = [OK, OK, OK, OK, OK, OK];
const SIGNED_IN: Row['expect'] = [401, OK, OK, OK, OK, OK];
const CONTRIBUTORS: Row['expect'] = [401, 403, OK, OK, OK, OK];
const EDITORS: Row['expect'] = [401, 403, 403, 403, OK, OK];
const ADMINS: Row['expect'] = [401, 403, 403, 403, 403, OK];
/** A draft: its owner and editors; everyone else 404 (anonymous writes 401). */
const DRAFT_READ: Row['expect'] = [404, 404, OK, 404, OK, OK];
const DRAFT_WRITE: Row['expect'] = [401, 404, OK, 404, OK, OK];
/** Private to the owner, editors included (programmes). */
const OWNER_ONLY: Row['expect'] = [401, 404, OK, 404, 404, 404];
const NOBODY: Row['expect'] = [404, 404, 404, 404, 404, 404];

const newExcerpt = { locatorType: 'folio', locatorValue: '3r', diplomatic: 'Vier Blockflöten im Chorton' };
const bibtex = '@book{matrix, title={A Matrix Treatise}, author={Doe, Jan}, year={1701}, publisher={Nowhere}}';
const importEntry = { title: 'Imported for the matrix', sourceType: 'treatise', dateEdtf: '1701', languages: ['en'], creators: [{ name: 'Doe, Jan', role: 'author' }] };

export const routeExpectations: Record<string, Row> = {
  'GET /api/health': row(PUBLIC, () => path('/api/health')),
  'GET /api/openapi.json': row(PUBLIC, () => path('/api/openapi.json')),
  'GET /api/auth/me': row(PUBLIC, () => path('/api/auth/me')),
  'POST /api/auth/register': row(PUBLIC, () => ({ path: '/api/auth/register', body: { email: uniqueEmail('reg'), displayName: 'Matrix Newcomer', password: strongPassword } }), true),
  'POST /api/auth/login': row(PUBLIC, async (w, who) => ({ path: '/api/auth/login', body: { email: w.users.get(who === 'anonymous' ? 'reader' : who)!.email, password: testPassword } }), true),
  'POST /api/auth/logout': row(PUBLIC, () => path('/api/auth/logout'), true),
  'POST /api/auth/password-reset': row(PUBLIC, () => ({ path: '/api/auth/password-reset', body: { email: uniqueEmail('reset') } })),
  'POST /api/auth/password-reset/confirm': row(PUBLIC, async (w) => ({ path: '/api/auth/password-reset/confirm', body: { token: await w.token('reset'), password: strongPassword } })),
  'POST /api/auth/verify-email': row(PUBLIC, async (w) => ({ path: '/api/auth/verify-email', body: { token: await w.token('verify') } })),

  'GET /api/users': row(ADMINS, () => path('/api/users')),
  'POST /api/users/invitations': row(ADMINS, () => ({ path: '/api/users/invitations', body: { email: uniqueEmail('invite'), displayName: 'Invited Person', role: 'contributor' } })),
  'PATCH /api/users/:id': row(ADMINS, async (w) => ({ path: `/api/users/${await w.someUser()}`, body: { role: 'contributor' } })),

  'GET /api/reckon/sounding': row(PUBLIC, () => path('/api/reckon/sounding?size=voice-flute&a=415')),
  'GET /api/reckon/fingering': row(PUBLIC, () => path('/api/reckon/fingering?size=alto&key=F%20major&fingering=F')),
  'GET /api/reckon/date': row(PUBLIC, () => path('/api/reckon/date?value=1700-02-10&calendar=julian&yearStart=mar25')),
  'GET /api/search': row(PUBLIC, () => path('/api/search?q=Handflöten')),
  'GET /api/insights': row(PUBLIC, () => path('/api/insights')),
  'GET /api/sizes': row(PUBLIC, () => path('/api/sizes')),
  'PATCH /api/sizes/:slug': row(EDITORS, () => ({ path: '/api/sizes/alto', body: { otherNames: ['treble', 'Altblockflöte'] } })),

  'GET /api/sources': row(PUBLIC, () => path('/api/sources')),
  'POST /api/sources': row(CONTRIBUTORS, () => ({ path: '/api/sources', body: importEntry })),
  'GET /api/sources/:id': row(DRAFT_READ, async (w) => path(`/api/sources/${(await w.record()).s}`)),
  'GET /api/sources/:id · approved': row(PUBLIC, async (w) => path(`/api/sources/${(await w.record('approved')).s}`)),
  'PATCH /api/sources/:id': row(DRAFT_WRITE, async (w) => ({ path: `/api/sources/${(await w.record()).s}`, body: { version: 1, title: 'Retitled' } })),
  'PATCH /api/sources/:id · approved': row([401, 403, OK, 403, OK, OK], async (w) => ({ path: `/api/sources/${(await w.record('approved')).s}`, body: { version: 1, title: 'Retitled' } })),
  'POST /api/sources/:id/submit': row(DRAFT_WRITE, async (w) => ({ path: `/api/sources/${(await w.record()).s}/submit`, body: {} })),
  'POST /api/sources/:id/withdraw': row(DRAFT_WRITE, async (w) => ({ path: `/api/sources/${(await w.record('submitted')).s}/withdraw`, body: {} })),
  'POST /api/sources/:id/reopen': row(DRAFT_WRITE, async (w) => ({ path: `/api/sources/${(await w.record('withdrawn')).s}/reopen`, body: {} })),
  'GET /api/sources/:id/excerpts': row(DRAFT_READ, async (w) => path(`/api/sources/${(await w.record()).s}/excerpts`)),
  'GET /api/sources/:id/revisions': row(DRAFT_READ, async (w) => path(`/api/sources/${(await w.record()).s}/revisions`)),
  'GET /api/sources/:id/revisions/:version': row(DRAFT_READ, async (w) => path(`/api/sources/${(await w.record()).s}/revisions/1`)),
  'POST /api/sources/:id/excerpts': row(DRAFT_WRITE, async (w) => ({ path: `/api/sources/${(await w.record()).s}/excerpts`, body: newExcerpt })),
  'POST /api/sources/:id/facsimiles': row(DRAFT_WRITE, async (w) => {
    const { s } = await w.record();
    const { smallPdf } = await import('./world');
    return { path: `/api/sources/${s}/facsimiles`, upload: { field: 'file', name: 'scan.pdf', bytes: await smallPdf(`Upload to ${s}`), fields: { rightsConfirmed: 'true' } } };
  }),
  'GET /api/sources/:id/tei': row(NOBODY, async (w) => path(`/api/sources/${(await w.record()).s}/tei`)),
  'GET /api/sources/:id/tei · approved': row(PUBLIC, async (w) => path(`/api/sources/${(await w.record('approved')).s}/tei`)),
  'GET /api/sources/:id/cite': row(NOBODY, async (w) => path(`/api/sources/${(await w.record()).s}/cite?format=bibtex`)),
  'GET /api/sources/:id/cite · approved': row(PUBLIC, async (w) => path(`/api/sources/${(await w.record('approved')).s}/cite?format=bibtex`)),

  'GET /api/excerpts/:id': row(DRAFT_READ, async (w) => path(`/api/excerpts/${(await w.record()).e}`)),
  'GET /api/excerpts/:id · approved': row(PUBLIC, async (w) => path(`/api/excerpts/${(await w.record('approved')).e}`)),
  'PATCH /api/excerpts/:id': row(DRAFT_WRITE, async (w) => ({ path: `/api/excerpts/${(await w.record()).e}`, body: { version: 1, diplomatic: 'Changed' } })),
  'PATCH /api/excerpts/:id · approved': row([401, 403, OK, 403, OK, OK], async (w) => ({ path: `/api/excerpts/${(await w.record('approved')).e}`, body: { version: 1, diplomatic: 'Changed' } })),
  'GET /api/excerpts/:id/revisions': row(DRAFT_READ, async (w) => path(`/api/excerpts/${(await w.record()).e}/revisions`)),
  'GET /api/excerpts/:id/revisions/:version': row(DRAFT_READ, async (w) => path(`/api/excerpts/${(await w.record()).e}/revisions/1`)),
  'POST /api/excerpts/:id/submit': row([401, 404, OK, 404, OK, OK], async (w) => ({ path: `/api/excerpts/${(await w.record('approved', 'draft')).e}/submit`, body: {} })),
  'GET /api/excerpts/:id/cite': row(NOBODY, async (w) => path(`/api/excerpts/${(await w.record()).e}/cite?format=ris`)),
  'GET /api/excerpts/:id/cite · approved': row(PUBLIC, async (w) => path(`/api/excerpts/${(await w.record('approved')).e}/cite?format=ris`)),
  'GET /api/cite/styles': row(PUBLIC, () => path('/api/cite/styles')),
  'POST /api/cite': row(PUBLIC, async (w) => ({ path: '/api/cite', body: { ids: [(await w.record('approved')).e], format: 'bibtex' } })),

  'GET /api/facsimiles/:id': row(DRAFT_READ, async (w) => path(`/api/facsimiles/${(await w.facsimile()).f}`)),
  'GET /api/facsimiles/:id/file': row(DRAFT_READ, async (w) => path(`/api/facsimiles/${(await w.facsimile()).f}/file`)),
  'GET /api/facsimiles/:id/file · approved, public': row(PUBLIC, async (w) => path(`/api/facsimiles/${(await w.facsimile('approved', 'public')).f}/file`)),
  'GET /api/facsimiles/:id/file · approved, signed-in': row(SIGNED_IN, async (w) => path(`/api/facsimiles/${(await w.facsimile('approved', 'signed-in')).f}/file`)),
  'GET /api/facsimiles/:id/file · approved, hidden': row([401, 403, OK, 403, OK, OK], async (w) => path(`/api/facsimiles/${(await w.facsimile('approved', 'hidden')).f}/file`)),
  'GET /api/facsimiles/:id/pages/:n/text': row(DRAFT_READ, async (w) => path(`/api/facsimiles/${(await w.facsimile()).f}/pages/1/text`)),
  'GET /api/facsimiles/:id/pages/:n/text · approved, hidden': row([401, 403, OK, 403, OK, OK], async (w) => path(`/api/facsimiles/${(await w.facsimile('approved', 'hidden')).f}/pages/1/text`)),

  'GET /api/programmes': row(SIGNED_IN, () => path('/api/programmes')),
  'POST /api/programmes': row(SIGNED_IN, () => ({ path: '/api/programmes', body: { title: 'A concert' } })),
  'POST /api/programmes/preview': row(SIGNED_IN, () => ({ path: '/api/programmes/preview', body: { notesMarkdown: 'Notes.' } })),
  'GET /api/programmes/:id': row(OWNER_ONLY, async (w) => path(`/api/programmes/${await w.programme()}`)),
  'PATCH /api/programmes/:id': row(OWNER_ONLY, async (w) => ({ path: `/api/programmes/${await w.programme()}`, body: { version: 1, title: 'Renamed' } })),
  'DELETE /api/programmes/:id': row(OWNER_ONLY, async (w) => path(`/api/programmes/${await w.programme()}`)),
  'POST /api/programmes/:id/preview': row(OWNER_ONLY, async (w) => path(`/api/programmes/${await w.programme()}/preview`)),
  'POST /api/programmes/:id/share': row(OWNER_ONLY, async (w) => path(`/api/programmes/${await w.programme()}/share`)),
  'DELETE /api/programmes/:id/share': row(OWNER_ONLY, async (w) => path(`/api/programmes/${await w.programme()}/share`)),
  'GET /api/programmes/:id/export': row(OWNER_ONLY, async (w) => path(`/api/programmes/${await w.programme()}/export?format=markdown`)),
  'GET /api/shared-programmes/:token': row(PUBLIC, async (w) => path(`/api/shared-programmes/${await w.sharedToken()}`)),
  'GET /api/shared-programmes/:token/preview': row(PUBLIC, async (w) => path(`/api/shared-programmes/${await w.sharedToken()}/preview`)),
  'GET /api/shared-programmes/:token/export': row(PUBLIC, async (w) => path(`/api/shared-programmes/${await w.sharedToken()}/export?format=bib`)),

  'POST /api/import/preview': row(CONTRIBUTORS, () => ({ path: '/api/import/preview', body: { text: bibtex, format: 'bibtex' } })),
  'POST /api/import': row(CONTRIBUTORS, () => ({ path: '/api/import', body: { entries: [importEntry] } })),

  'GET /api/reviews': row(EDITORS, () => path('/api/reviews')),
  'POST /api/reviews': row(EDITORS, async (w) => ({ path: '/api/reviews', body: { target: { kind: 'source', id: (await w.record('submitted')).s, version: 1 }, decision: 'return', comment: 'Please check the shelfmark.' } })),
  'GET /api/reviews/mine': row(CONTRIBUTORS, () => path('/api/reviews/mine')),
  // A draft's review page does not exist for signed-in strangers (404, as for the draft itself).
  'GET /api/reviews/:kind/:id': row([401, 404, OK, 404, OK, OK], async (w) => path(`/api/reviews/source/${(await w.record()).s}`)),
  'GET /api/history/:kind/:id': row(DRAFT_READ, async (w) => path(`/api/history/source/${(await w.record()).s}`)),
  'GET /api/history/:kind/:id · approved': row(PUBLIC, async (w) => path(`/api/history/excerpt/${(await w.record('approved')).e}`)),
  'GET /api/history/:kind/:id/diff': row(DRAFT_READ, async (w) => path(`/api/history/source/${(await w.twoVersions()).s}/diff`)),
  'GET /api/history/:kind/:id/v/:version': row(DRAFT_READ, async (w) => path(`/api/history/source/${(await w.record()).s}/v/1`)),
  'POST /api/history/:kind/:id/restore': row(EDITORS, async (w) => ({ path: `/api/history/source/${(await w.twoVersions()).s}/restore`, body: { version: 1, reason: 'Matrix restore' } })),
  'GET /api/concordance': row(PUBLIC, () => path('/api/concordance')),
  'PATCH /api/concordance': row(EDITORS, async (w) => ({ path: '/api/concordance', body: { term: (await w.record('approved')).term, language: 'de', toSize: 'tenor' } })),
  'GET /api/admin/outbox': row(ADMINS, () => path('/api/admin/outbox')),
  'GET /api/admin/reindex': row(ADMINS, () => path('/api/admin/reindex')),
  'POST /api/admin/reindex': row(ADMINS, () => ({ path: '/api/admin/reindex', body: {} })),

  'GET /oai': row(PUBLIC, () => path('/oai?verb=Identify')),
  'POST /oai': row(PUBLIC, () => ({ path: '/oai', body: { verb: 'Identify' } })),
};
