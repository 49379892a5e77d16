/**
 * The document builder: one search document per excerpt, flattened with its source.
 *
 * Which version is indexed: an excerpt whose public version exists (approved now, or
 * approved before and carrying a newer unapproved edit) is indexed as that **last
 * approved version**, read from its Revision snapshot at `approvedVersion`, with
 * `visibility: 'public'`; the pending edit is not indexed until it is approved.
 * Everything else is indexed as its current working version with `visibility:
 * 'draft'`, found only by its owners (`ownerIds`: the excerpt's and the source's
 * contributor) and editors. One document per excerpt keeps hits and facet counts
 * equal to counts of excerpts. The same rule applies to the source's fields.
 */
import { Op, QueryTypes, type Transaction } from 'sequelize';
import { marked, type Token } from 'marked';
import { getSequelize } from '@server/db';
import { Revision } from '@server/models';
import { INSTRUMENT_SIZES } from '@shared/reckoner/sizes';
import { formatLocator } from '@shared/catalogue/locator';
import type { LocatorType, SourceType } from '@shared/catalogue/vocabulary';
import { namesOfSize } from './settings';

export interface ExcerptDocument {
  id: string;
  excerptId: string;
  rowId: number;
  sourceId: string;
  sourceRowId: number;
  sourceTitle: string;
  sourceType: SourceType;
  creators: string[];
  place: string | null;
  languages: string[];
  locator: string;
  diplomatic: string;
  normalised: string | null;
  translation: string | null;
  commentary: string | null;
  terms: string[];
  sizes: string[];
  sizeNames: string[];
  families: string[];
  aHz: number[];
  yearEarliest: number | null;
  yearLatest: number | null;
  decades: number[];
  dateLabel: string;
  status: string;
  visibility: 'public' | 'draft';
  contributorId: number;
  ownerIds: number[];
}

/** Private-use characters the query code uses as highlight tags; never let text carry them. */
const clean = (s: string | null | undefined): string | null => (s ? s.replace(/[\uE000\uE001]/g, '') : null);

function plainTokens(tokens: Token[], out: string[]): void {
  for (const t of tokens) {
    const children = (t as { tokens?: Token[] }).tokens;
    const items = (t as { items?: Token[] }).items;
    if (children?.length) plainTokens(children, out);
    else if (items?.length) plainTokens(items, out);
    else if (t.type === 'space' || t.type === 'hr' || t.type === 'html') out.push(' ');
    else if ('text' in t && typeof t.text === 'string') out.push(t.text);
    if (t.type === 'paragraph' || t.type === 'heading' || t.type === 'list_item') out.push('\n');
  }
}

/** Markdown commentary as plain text (links keep their words, markup goes). */
export function markdownToPlain(markdown: string | null): string | null {
  if (!markdown) return null;
  const out: string[] = [];
  plainTokens(marked.lexer(markdown), out);
  return out.join('').replace(/[ \t]+/g, ' ').replace(/\n{2,}/g, '\n').trim() || null;
}

const yearOf = (day: string | null | undefined): number | null => {
  if (!day) return null;
  const year = Number.parseInt(day.slice(0, day.indexOf('-', 1)), 10);
  return Number.isFinite(year) ? year : null;
};

/** Every decade the date range touches (at most 40: a vaguer date is not placed in decades). */
export function decadesOf(from: number | null, to: number | null): number[] {
  if (from === null || to === null) return [];
  const first = Math.floor(from / 10) * 10;
  const last = Math.floor(to / 10) * 10;
  if ((last - first) / 10 >= 40) return [];
  const out: number[] = [];
  for (let d = first; d <= last; d += 10) out.push(d);
  return out;
}

const published = (r: { status: string; approvedVersion: number | null }) => r.status === 'approved' || r.approvedVersion !== null;

type Snapshot = Record<string, unknown>;
type MentionLike = { term: string; sizeSlug: string };
type PitchLike = { aHz: number | string };

/** An excerpt row as the builder reads it (plain data: the re-index loads 100,000 of these). */
export interface ExcerptRecord {
  id: number; publicId: string; sourceId: number; status: string; approvedVersion: number | null; contributorId: number;
  locatorType: string; locatorValue: string; diplomatic: string; normalised: string | null; translation: string | null;
  commentary: string | null; dateEarliest: string | null; dateLatest: string | null; dateLabel: string | null;
  mentions: MentionLike[]; pitchTags: PitchLike[];
}
export interface SourceRecord {
  id: number; publicId: string; status: string; approvedVersion: number | null; contributorId: number; title: string;
  sourceType: string; creators: unknown; place: string | null; languages: unknown; dateEarliest: string; dateLatest: string; dateLabel: string;
}

interface Loaded {
  excerpt: ExcerptRecord;
  source: SourceRecord;
  excerptSnapshot: Snapshot | null;
  sourceSnapshot: Snapshot | null;
}

/** The public version of an excerpt/source as a plain record, or null when it must stay a draft. */
function publicView(current: ExcerptRecord | SourceRecord, snapshot: Snapshot | null): Snapshot | null {
  if (current.status === 'approved') return current as unknown as Snapshot;
  if (current.approvedVersion === null) return null;
  return snapshot;
}

export function buildDocument({ excerpt, source, excerptSnapshot, sourceSnapshot }: Loaded): ExcerptDocument {
  const isPublic = published(excerpt) && published(source);
  const e = (isPublic ? publicView(excerpt, excerptSnapshot) : null) ?? null;
  const s = (isPublic ? publicView(source, sourceSnapshot) : null) ?? null;
  const visible = isPublic && e !== null && s !== null;
  const ex = visible ? e : (excerpt as unknown as Snapshot);
  const so = visible ? s : (source as unknown as Snapshot);

  const mentions = ((visible && Array.isArray(ex.mentions) ? ex.mentions : excerpt.mentions) ?? []) as MentionLike[];
  const pitchTags = ((visible && Array.isArray(ex.pitchTags) ? ex.pitchTags : excerpt.pitchTags) ?? []) as PitchLike[];
  const sizes = [...new Set(mentions.map((m) => m.sizeSlug))];
  const families = [...new Set(sizes.map((slug) => INSTRUMENT_SIZES.find((x) => x.slug === slug)?.family).filter((f): f is NonNullable<typeof f> => !!f))];
  const str = (o: Snapshot, k: string) => (typeof o[k] === 'string' ? (o[k] as string) : null);
  const ownEarliest = str(ex, 'dateEarliest');
  const earliest = ownEarliest ?? str(so, 'dateEarliest');
  const latest = (ownEarliest ? str(ex, 'dateLatest') : null) ?? str(so, 'dateLatest');
  const dateLabel = (ownEarliest ? str(ex, 'dateLabel') : null) ?? str(so, 'dateLabel') ?? '';
  const yearEarliest = yearOf(earliest);
  const yearLatest = yearOf(latest);
  const creators = Array.isArray(json(so.creators)) ? (json(so.creators) as { name: string }[]).map((c) => c.name) : [];
  const ownerIds = [...new Set([excerpt.contributorId, source.contributorId])];

  return {
    id: excerpt.publicId,
    excerptId: excerpt.publicId,
    rowId: excerpt.id,
    sourceId: source.publicId,
    sourceRowId: source.id,
    sourceTitle: clean(str(so, 'title')) ?? '',
    sourceType: (str(so, 'sourceType') ?? source.sourceType) as SourceType,
    creators,
    place: clean(str(so, 'place')),
    languages: Array.isArray(json(so.languages)) ? (json(so.languages) as string[]) : [],
    locator: formatLocator((str(ex, 'locatorType') ?? excerpt.locatorType) as LocatorType, str(ex, 'locatorValue') ?? excerpt.locatorValue),
    diplomatic: clean(str(ex, 'diplomatic')) ?? '',
    normalised: clean(str(ex, 'normalised')),
    translation: clean(str(ex, 'translation')),
    commentary: clean(markdownToPlain(str(ex, 'commentary'))),
    terms: [...new Set(mentions.map((m) => m.term))],
    sizes,
    sizeNames: sizes.flatMap(namesOfSize),
    families,
    aHz: [...new Set(pitchTags.map((t) => Number(t.aHz)).filter(Number.isFinite))],
    yearEarliest,
    yearLatest,
    decades: decadesOf(yearEarliest, yearLatest),
    dateLabel,
    status: visible ? 'approved' : excerpt.status,
    visibility: visible ? 'public' : 'draft',
    contributorId: excerpt.contributorId,
    ownerIds,
  };
}

/** JSON columns come back from raw queries as text. */
const json = (v: unknown): unknown => (typeof v === 'string' ? JSON.parse(v) : v);

/** Latest snapshots of the given entities at their approved versions, keyed by entity id. */
async function approvedSnapshots(entityType: 'source' | 'excerpt', records: (ExcerptRecord | SourceRecord)[], transaction?: Transaction) {
  const wanted = records.filter((r) => r.status !== 'approved' && r.approvedVersion !== null);
  const map = new Map<number, Snapshot>();
  if (!wanted.length) return map;
  const rows = await Revision.findAll({
    where: { entityType, [Op.or]: wanted.map((r) => ({ entityId: r.id, version: r.approvedVersion! })) },
    attributes: ['entityId', 'snapshot'],
    transaction,
  });
  for (const row of rows) map.set(row.entityId, json(row.snapshot) as Snapshot);
  return map;
}

const EXCERPT_COLUMNS = `id, public_id AS publicId, source_id AS sourceId, status, approved_version AS approvedVersion,
  contributor_id AS contributorId, locator_type AS locatorType, locator_value AS locatorValue, diplomatic, normalised,
  translation, commentary, date_earliest AS dateEarliest, date_latest AS dateLatest, date_label AS dateLabel`;
const SOURCE_COLUMNS = `id, public_id AS publicId, status, approved_version AS approvedVersion, contributor_id AS contributorId,
  title, source_type AS sourceType, creators, place, languages, date_earliest AS dateEarliest, date_latest AS dateLatest, date_label AS dateLabel`;

/**
 * Builds documents for excerpts by row id, with four plain queries per batch (no
 * model instances: the re-index builds 100,000). Ids without an excerpt (deleted)
 * come back in `missing`, so the caller deletes their documents.
 */
export async function buildDocuments(excerptIds: number[], transaction?: Transaction): Promise<{ docs: ExcerptDocument[]; missing: number[] }> {
  if (!excerptIds.length) return { docs: [], missing: [] };
  const sequelize = getSequelize();
  const select = <T extends object>(sql: string, ids: number[]) =>
    sequelize.query<T>(sql, { replacements: [ids], type: QueryTypes.SELECT, transaction });
  const excerpts = await select<ExcerptRecord>(`SELECT ${EXCERPT_COLUMNS} FROM excerpts WHERE id IN (?)`, excerptIds);
  if (!excerpts.length) return { docs: [], missing: [...excerptIds] };
  const ids = excerpts.map((e) => e.id);
  const sourceIds = [...new Set(excerpts.map((e) => e.sourceId))];
  const [mentions, pitchTags, sourceRows] = await Promise.all([
    select<MentionLike & { excerptId: number }>('SELECT excerpt_id AS excerptId, term, size_slug AS sizeSlug FROM instrument_mentions WHERE excerpt_id IN (?) ORDER BY excerpt_id, position', ids),
    select<PitchLike & { excerptId: number }>('SELECT excerpt_id AS excerptId, a_hz AS aHz FROM pitch_tags WHERE excerpt_id IN (?) ORDER BY excerpt_id, position', ids),
    select<SourceRecord>(`SELECT ${SOURCE_COLUMNS} FROM sources WHERE id IN (?)`, sourceIds),
  ]);
  const byExcerpt = new Map(excerpts.map((e) => [e.id, Object.assign(e, { mentions: [] as MentionLike[], pitchTags: [] as PitchLike[] })]));
  for (const m of mentions) byExcerpt.get(m.excerptId)?.mentions.push(m);
  for (const p of pitchTags) byExcerpt.get(p.excerptId)?.pitchTags.push(p);
  const sources = new Map(sourceRows.map((s) => [s.id, s]));
  const [excerptSnaps, sourceSnaps] = await Promise.all([
    approvedSnapshots('excerpt', excerpts, transaction),
    approvedSnapshots('source', sourceRows, transaction),
  ]);
  const docs: ExcerptDocument[] = [];
  const found = new Set<number>();
  for (const excerpt of excerpts) {
    const source = sources.get(excerpt.sourceId);
    if (!source) continue;
    found.add(excerpt.id);
    docs.push(buildDocument({ excerpt, source, excerptSnapshot: excerptSnaps.get(excerpt.id) ?? null, sourceSnapshot: sourceSnaps.get(source.id) ?? null }));
  }
  return { docs, missing: excerptIds.filter((id) => !found.has(id)) };
}
