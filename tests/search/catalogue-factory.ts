/**
 * Builds sources and excerpts straight through the models, with the same tail every
 * catalogue command has (revision + outbox row in one transaction), and reads the
 * index back, so search tests can compare the index with the database.
 */
import type { Transaction } from 'sequelize';
import { getSequelize } from '@server/db';
import { Excerpt, InstrumentMention, PitchTag, SearchOutbox, Source } from '@server/models';
import { newPublicId } from '@server/services/public-ids';
import { enqueueSearchSync, recordRevision } from '@server/services/revisions';
import { describeEdtf } from '@shared/reckoner/dates';
import { centsFromModern, roundTo } from '@shared/reckoner/pitch';
import type { SourceType, WorkflowState } from '@shared/catalogue/vocabulary';
import { getSearchClient } from '@search/client';
import { excerptsUid } from '@search/settings';
import { buildDocuments, type ExcerptDocument } from '@search/documents';
import { drainAll } from '@search/outbox-worker';

export interface SourceSpec {
  contributorId: number;
  title?: string;
  sourceType?: SourceType;
  dateEdtf?: string;
  languages?: string[];
  place?: string | null;
  status?: WorkflowState;
}

export interface ExcerptSpec {
  contributorId?: number;
  diplomatic: string;
  normalised?: string | null;
  translation?: string | null;
  commentary?: string | null;
  dateEdtf?: string | null;
  status?: WorkflowState;
  mentions?: { term: string; sizeSlug: string; language?: string }[];
  pitch?: number[];
  locatorValue?: string;
}

const tx = <T>(fn: (t: Transaction) => Promise<T>) => getSequelize().transaction(fn);

function snapshotOf(excerpt: Excerpt, mentions: InstrumentMention[], pitchTags: PitchTag[]) {
  const { id: _id, ...plain } = excerpt.get({ plain: true }) as Record<string, unknown>;
  return {
    ...plain,
    mentions: mentions.map((m) => ({ term: m.term, language: m.language, sizeSlug: m.sizeSlug, certainty: m.certainty, note: m.note })),
    pitchTags: pitchTags.map((p) => ({ statement: p.statement, aHz: Number(p.aHz), derivation: p.derivation })),
  };
}

export async function makeSource(spec: SourceSpec): Promise<Source> {
  const date = describeEdtf(spec.dateEdtf ?? '1700');
  const status = spec.status ?? 'approved';
  return tx(async (transaction) => {
    const source = await Source.create(
      {
        publicId: newPublicId('S'),
        title: spec.title ?? 'A fictional treatise on the flute',
        sourceType: spec.sourceType ?? 'treatise',
        creators: [{ name: 'Ambrose Quill', role: 'author' }],
        dateEdtf: date.edtf,
        dateEarliest: date.earliest,
        dateLatest: date.latest,
        dateLabel: date.label,
        place: spec.place ?? 'London',
        languages: spec.languages ?? ['en'],
        holdingInstitution: null,
        shelfmark: null,
        publication: null,
        externalUrl: null,
        rightsStatement: null,
        status,
        contributorId: spec.contributorId,
        approvedVersion: status === 'approved' ? 1 : null,
        submittedAt: null,
      },
      { transaction },
    );
    const { id: _id, ...snapshot } = source.get({ plain: true }) as Record<string, unknown>;
    await recordRevision({ entityType: 'source', entityId: source.id, version: 1, snapshot, authorId: spec.contributorId }, transaction);
    await enqueueSearchSync('source', source.id, 'upsert', transaction);
    return source;
  });
}

async function writeTags(excerptId: number, spec: Pick<ExcerptSpec, 'mentions' | 'pitch'>, transaction: Transaction) {
  await InstrumentMention.destroy({ where: { excerptId }, transaction });
  await PitchTag.destroy({ where: { excerptId }, transaction });
  const mentions = await InstrumentMention.bulkCreate(
    (spec.mentions ?? []).map((m, position) => ({ excerptId, term: m.term, language: m.language ?? 'en', sizeSlug: m.sizeSlug, certainty: 'certain' as const, note: null, position })),
    { transaction },
  );
  const pitchTags = await PitchTag.bulkCreate(
    (spec.pitch ?? []).map((aHz, position) => ({ excerptId, statement: `a′ = ${aHz}`, aHz, centsFrom440: roundTo(centsFromModern(aHz), 1), derivation: 'stated' as const, note: null, position })),
    { transaction },
  );
  return { mentions, pitchTags };
}

export async function makeExcerpt(source: Source, spec: ExcerptSpec): Promise<Excerpt> {
  const status = spec.status ?? 'approved';
  const date = spec.dateEdtf ? describeEdtf(spec.dateEdtf) : null;
  return tx(async (transaction) => {
    const excerpt = await Excerpt.create(
      {
        publicId: newPublicId('E'),
        sourceId: source.id,
        locatorType: 'folio',
        locatorValue: spec.locatorValue ?? '12v',
        facsimilePage: null,
        diplomatic: spec.diplomatic,
        normalised: spec.normalised ?? null,
        translation: spec.translation ?? null,
        translationLanguage: spec.translation ? 'en' : null,
        translator: null,
        commentary: spec.commentary ?? null,
        dateEdtf: date?.edtf ?? null,
        dateEarliest: date?.earliest ?? null,
        dateLatest: date?.latest ?? null,
        dateLabel: date?.label ?? null,
        topics: [],
        status,
        contributorId: spec.contributorId ?? source.contributorId,
        approvedVersion: status === 'approved' ? 1 : null,
      },
      { transaction },
    );
    const { mentions, pitchTags } = await writeTags(excerpt.id, spec, transaction);
    await recordRevision({ entityType: 'excerpt', entityId: excerpt.id, version: 1, snapshot: snapshotOf(excerpt, mentions, pitchTags), authorId: excerpt.contributorId }, transaction);
    await enqueueSearchSync('excerpt', excerpt.id, 'upsert', transaction);
    return excerpt;
  });
}

/** An edit as the commands make it: new version, revision, outbox row; approved material goes back to draft. */
export async function editExcerpt(excerpt: Excerpt, changes: Partial<ExcerptSpec>): Promise<Excerpt> {
  return tx(async (transaction) => {
    const fields: Record<string, unknown> = {};
    for (const key of ['diplomatic', 'normalised', 'translation', 'commentary'] as const) if (key in changes) fields[key] = changes[key];
    const status = changes.status ?? (excerpt.status === 'approved' ? 'draft' : excerpt.status);
    await excerpt.update({ ...fields, status, version: excerpt.version + 1 }, { transaction });
    const tags = changes.mentions || changes.pitch ? await writeTags(excerpt.id, changes, transaction) : null;
    const mentions = tags?.mentions ?? (await InstrumentMention.findAll({ where: { excerptId: excerpt.id }, transaction }));
    const pitchTags = tags?.pitchTags ?? (await PitchTag.findAll({ where: { excerptId: excerpt.id }, transaction }));
    await recordRevision({ entityType: 'excerpt', entityId: excerpt.id, version: excerpt.version, snapshot: snapshotOf(excerpt, mentions, pitchTags), authorId: excerpt.contributorId }, transaction);
    await enqueueSearchSync('excerpt', excerpt.id, 'upsert', transaction);
    return excerpt;
  });
}

export async function deleteExcerpt(excerpt: Excerpt): Promise<void> {
  await tx(async (transaction) => {
    await excerpt.destroy({ transaction });
    await enqueueSearchSync('excerpt', excerpt.id, 'delete', transaction);
  });
}

export async function deleteSource(source: Source): Promise<void> {
  await tx(async (transaction) => {
    await source.destroy({ transaction });
    await enqueueSearchSync('source', source.id, 'delete', transaction);
  });
}

/** Drains the outbox and insists it is empty afterwards. */
export async function syncSearch(): Promise<void> {
  const result = await drainAll();
  if (result.error) throw new Error(`search sync failed: ${result.error}`);
  const left = await SearchOutbox.count();
  if (left) throw new Error(`${left} outbox rows left after draining`);
}

/** Every document in this file's index, by id. */
export async function indexedDocuments(): Promise<Map<string, Record<string, unknown>>> {
  const client = getSearchClient()!;
  const page = await client.index(excerptsUid()).getDocuments({ limit: 10_000 });
  return new Map(page.results.map((d) => [String(d.id), d as Record<string, unknown>]));
}

/** What the index should hold: a document per excerpt in the database, built from the database. */
export async function expectedDocuments(): Promise<Map<string, ExcerptDocument>> {
  const ids = (await Excerpt.findAll({ attributes: ['id'], raw: true })).map((e) => e.id);
  const { docs } = await buildDocuments(ids);
  return new Map(docs.map((d) => [d.id, d]));
}
