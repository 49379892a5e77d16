/** Helpers shared by the catalogue commands: snapshots, locking, version checks, state rules. */
import type { Transaction } from 'sequelize';
import { Excerpt, InstrumentMention, PitchTag, Review, Source } from '../models';
import type { EntityType } from '../models/revision';
import { conflict, notFound } from '../errors';
import { notEditableReason } from '../policies/source';
import { enqueueSearchSync, recordRevision } from '../services/revisions';
import { snapshotExcerpt, snapshotSource } from '../presenters/revision';
import { describeEdtf } from '@shared/reckoner/dates';
import { centsFromModern, roundTo } from '@shared/reckoner/pitch';
import type { MentionFields, PitchTagFields } from '@shared/catalogue/schemas';
import type { WorkflowState } from '@shared/catalogue/vocabulary';

/** The full record at one version, as `Revision.snapshot` (the review workflow's shape) plus its excerpts' ids. */
export function sourceSnapshot(source: Source, excerptIds: string[]): Record<string, unknown> {
  return { ...snapshotSource(source), excerptIds };
}

export async function lockSource(publicId: string, transaction: Transaction): Promise<Source> {
  const source = await Source.findOne({ where: { publicId }, lock: transaction.LOCK.UPDATE, transaction });
  if (!source) throw notFound('The source');
  return source;
}

export async function lockExcerpt(publicId: string, transaction: Transaction): Promise<{ excerpt: Excerpt; source: Source }> {
  const excerpt = await Excerpt.findOne({ where: { publicId }, lock: transaction.LOCK.UPDATE, transaction });
  if (!excerpt) throw notFound('The excerpt');
  const source = await Source.findByPk(excerpt.sourceId, { transaction });
  if (!source) throw notFound('The source');
  return { excerpt, source };
}

/** Optimistic locking: the client sends the version it edited; a stale one changes nothing. */
export function assertVersion(what: 'source' | 'excerpt', current: number, sent: number): void {
  if (current === sent) return;
  throw conflict(
    `This ${what} was changed by someone else since you opened it (you edited version ${sent}; it is now at version ${current}). Reload it, then apply your changes again.`,
    { version: `Current version is ${current}; you sent ${sent}.` },
  );
}

export function assertEditable(what: 'source' | 'excerpt', status: WorkflowState): void {
  const reason = notEditableReason(what, status);
  if (reason) throw conflict(reason, { status: `The ${what} is ${status}.` });
}

/**
 * The state after an edit: editing approved material starts a new version that needs review
 * (the approved one stays public through `approvedVersion`), unless an editor publishes it.
 */
export function stateAfterEdit(status: WorkflowState, publish: boolean): WorkflowState {
  if (status === 'approved') return publish ? 'approved' : 'draft';
  return status;
}

export function dateColumns(edtf: string | null, field = 'dateEdtf') {
  if (!edtf) return { dateEdtf: null, dateEarliest: null, dateLatest: null, dateLabel: null };
  const date = describeEdtf(edtf, field);
  return { dateEdtf: date.edtf, dateEarliest: date.earliest, dateLatest: date.latest, dateLabel: date.label };
}

/** Replaces an excerpt's mentions and pitch tags in the order given. */
export async function replaceTags(
  excerptId: number,
  tags: { mentions?: MentionFields[]; pitchTags?: PitchTagFields[] },
  transaction: Transaction,
): Promise<void> {
  if (tags.mentions) {
    await InstrumentMention.destroy({ where: { excerptId }, transaction });
    await InstrumentMention.bulkCreate(tags.mentions.map((m, position) => ({ ...m, excerptId, position })), { transaction });
  }
  if (tags.pitchTags) {
    await PitchTag.destroy({ where: { excerptId }, transaction });
    await PitchTag.bulkCreate(
      tags.pitchTags.map((t, position) => ({ ...t, excerptId, position, centsFrom440: roundTo(centsFromModern(t.aHz), 1) })),
      { transaction },
    );
  }
}

/** Revision + search outbox row for the version just saved: the tail of every catalogue write. */
export async function recordSourceVersion(source: Source, authorId: number, reason: string | null, transaction: Transaction): Promise<void> {
  const excerpts = await Excerpt.findAll({ where: { sourceId: source.id }, attributes: ['publicId'], order: [['id', 'ASC']], transaction });
  const snapshot = sourceSnapshot(source, excerpts.map((e) => e.publicId));
  await recordRevision({ entityType: 'source', entityId: source.id, version: source.version, snapshot, authorId, reason }, transaction);
  await enqueueSearchSync('source', source.id, 'upsert', transaction);
}

export async function recordExcerptVersion(excerpt: Excerpt, sourcePublicId: string, authorId: number, reason: string | null, transaction: Transaction): Promise<void> {
  excerpt.mentions = await InstrumentMention.findAll({ where: { excerptId: excerpt.id }, order: [['position', 'ASC']], transaction });
  excerpt.pitchTags = await PitchTag.findAll({ where: { excerptId: excerpt.id }, order: [['position', 'ASC']], transaction });
  const snapshot = { ...snapshotExcerpt(excerpt), sourcePublicId };
  await recordRevision({ entityType: 'excerpt', entityId: excerpt.id, version: excerpt.version, snapshot, authorId, reason }, transaction);
  await enqueueSearchSync('excerpt', excerpt.id, 'upsert', transaction);
}

/** An editor's change published without review is recorded as an approval of that version. */
export async function recordPublishedEdit(entityType: EntityType, entityId: number, version: number, editorId: number, reason: string, transaction: Transaction) {
  await Review.create({ entityType, entityId, version, editorId, decision: 'approve', comment: reason, fieldComments: [] }, { transaction });
}
