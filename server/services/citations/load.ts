/**
 * Loads what may be cited: approved material only (anyone may read it), at an approved version.
 * A version is citable when it is the current approved version or an editor approved it
 * (a Review with decision `approve`); its data is the live row at that version or its Revision
 * snapshot. Anything else is reported as not found, as if it did not exist.
 */
import { Op } from 'sequelize';
import type { CitableExcerpt, CitableSource } from '@shared/citations/csl';
import { excerptToCsl, sourceToCsl } from '@shared/citations/csl';
import { Excerpt, Review, Revision, Source } from '../../models';
import type { EntityType } from '../../models/revision';
import { getConfig, publicUrl } from '../../config';
import { notFound } from '../../errors';
import type { Citable } from './format';

export interface CitableTarget {
  kind: 'excerpt' | 'source';
  id: string;
  source: CitableSource;
  excerpt?: CitableExcerpt;
}

type Row = Source | Excerpt;

async function atVersion<T extends Row>(entityType: EntityType, row: T, requested?: number): Promise<Record<string, unknown> | null> {
  if (row.approvedVersion == null) return null;
  const version = requested ?? row.approvedVersion;
  if (version > row.version) return null;
  if (version !== row.approvedVersion) {
    const approved = await Review.count({ where: { entityType, entityId: row.id, version, decision: 'approve' } });
    if (!approved) return null;
  }
  const plain = row.get({ plain: true }) as Record<string, unknown>;
  if (version === row.version) return plain;
  const revision = await Revision.findOne({ where: { entityType, entityId: row.id, version } });
  if (!revision) return null;
  const snapshot = revision.snapshot ?? {};
  const merged: Record<string, unknown> = { ...plain, version };
  for (const key of Object.keys(plain)) if (key in snapshot && key !== 'id' && key !== 'publicId') merged[key] = snapshot[key];
  return merged;
}

function asSource(data: Record<string, unknown>): CitableSource {
  return {
    publicId: String(data.publicId),
    title: String(data.title),
    sourceType: data.sourceType as CitableSource['sourceType'],
    creators: (data.creators as CitableSource['creators']) ?? [],
    dateEdtf: String(data.dateEdtf),
    place: (data.place as string | null) ?? null,
    languages: (data.languages as string[]) ?? [],
    holdingInstitution: (data.holdingInstitution as string | null) ?? null,
    shelfmark: (data.shelfmark as string | null) ?? null,
    publication: (data.publication as CitableSource['publication']) ?? null,
    version: Number(data.version),
  };
}

function asExcerpt(data: Record<string, unknown>): CitableExcerpt {
  return {
    publicId: String(data.publicId),
    locatorType: data.locatorType as CitableExcerpt['locatorType'],
    locatorValue: String(data.locatorValue),
    version: Number(data.version),
  };
}

// Only the columns a citation uses (asSource, asExcerpt, atVersion): the long texts stay in
// MariaDB, and Sequelize, which spends more CPU on a row than MariaDB does, builds less.
const excerptColumns = ['id', 'publicId', 'sourceId', 'locatorType', 'locatorValue', 'version', 'approvedVersion'];
const sourceColumns = ['id', 'publicId', 'title', 'sourceType', 'creators', 'dateEdtf', 'place', 'languages', 'holdingInstitution', 'shelfmark', 'publication', 'version', 'approvedVersion'];

/** One excerpt (E…) or source (S…) by public id, or null when it is not citable. */
export async function findCitable(id: string, version?: number): Promise<CitableTarget | null> {
  if (id.startsWith('E')) {
    const excerpt = await Excerpt.findOne({
      where: { publicId: id },
      attributes: excerptColumns,
      include: [{ model: Source, as: 'source', attributes: sourceColumns }],
    });
    if (!excerpt) return null;
    const data = await atVersion('excerpt', excerpt, version);
    const source = excerpt.source;
    const sourceData = data && source ? await atVersion('source', source) : null;
    if (!data || !sourceData) return null;
    return { kind: 'excerpt', id, excerpt: asExcerpt(data), source: asSource(sourceData) };
  }
  if (id.startsWith('S')) {
    const source = await Source.findOne({ where: { publicId: id }, attributes: sourceColumns });
    const data = source ? await atVersion('source', source, version) : null;
    return data ? { kind: 'source', id, source: asSource(data) } : null;
  }
  return null;
}

export async function loadCitable(id: string, kind: 'excerpt' | 'source', version?: number): Promise<CitableTarget> {
  const target = (kind === 'excerpt') === id.startsWith('E') ? await findCitable(id, version) : null;
  if (!target) throw notFound(kind === 'excerpt' ? 'The excerpt' : 'The source');
  return target;
}

/** Many ids at once (deduplicated, in the order given); `missing` lists those not citable. */
export async function findCitables(ids: string[]): Promise<{ found: Map<string, CitableTarget>; missing: string[] }> {
  const unique = [...new Set(ids)];
  const excerptIds = unique.filter((id) => id.startsWith('E'));
  const sourceIds = unique.filter((id) => id.startsWith('S'));
  // One round trip each to learn which ids exist at all; the per-item checks then stay simple.
  const [excerpts, sources] = await Promise.all([
    excerptIds.length ? Excerpt.findAll({ where: { publicId: { [Op.in]: excerptIds } }, attributes: ['publicId'] }) : [],
    sourceIds.length ? Source.findAll({ where: { publicId: { [Op.in]: sourceIds } }, attributes: ['publicId'] }) : [],
  ]);
  const existing = new Set([...excerpts, ...sources].map((r) => r.publicId));
  const found = new Map<string, CitableTarget>();
  const missing: string[] = [];
  for (const id of unique) {
    const target = existing.has(id) ? await findCitable(id) : null;
    if (target) found.set(id, target);
    else missing.push(id);
  }
  return { found, missing };
}

export function cslOptions(accessed?: Date) {
  return { publicUrl: publicUrl(getConfig()).replace(/\/$/, ''), accessed };
}

export function toCitable(target: CitableTarget, accessed?: Date): Citable {
  const options = cslOptions(accessed);
  if (target.excerpt) return excerptToCsl(target.excerpt, target.source, options);
  const item = sourceToCsl(target.source, options);
  return { item, cite: { id: item.id } };
}
