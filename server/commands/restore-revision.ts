import type { Transaction } from 'sequelize';
import { getSequelize } from '../db';
import { Excerpt, InstrumentMention, PitchTag, Revision, Source } from '../models';
import { conflict, notFound } from '../errors';
import { snapshotStatus } from '../presenters/revision';
import type { SessionUser } from '../auth/passport';
import { centsFromModern, roundTo } from '@shared/reckoner/pitch';
import { fieldLabels } from '@shared/review/fields';
import type { EntityKind } from '@shared/review/types';
import { loadExcerptChildren, lockTarget, writeNextVersion, type Target } from './decide-review';

/** Content columns a restore copies back (dates with their computed bounds). */
const restoredColumns: Record<EntityKind, string[]> = {
  source: [...Object.keys(fieldLabels.source), 'dateEarliest', 'dateLatest', 'dateLabel'],
  excerpt: [...Object.keys(fieldLabels.excerpt).filter((f) => f !== 'mentions' && f !== 'pitchTags'), 'dateEarliest', 'dateLatest', 'dateLabel'],
};

async function replaceExcerptChildren(excerpt: Excerpt, snapshot: Record<string, unknown>, transaction: Transaction) {
  const mentions = Array.isArray(snapshot.mentions) ? (snapshot.mentions as Record<string, unknown>[]) : [];
  const tags = Array.isArray(snapshot.pitchTags) ? (snapshot.pitchTags as Record<string, unknown>[]) : [];
  await InstrumentMention.destroy({ where: { excerptId: excerpt.id }, transaction });
  await PitchTag.destroy({ where: { excerptId: excerpt.id }, transaction });
  await InstrumentMention.bulkCreate(
    mentions.map((m, position) => ({
      excerptId: excerpt.id, term: String(m.term), language: String(m.language), sizeSlug: String(m.sizeSlug),
      certainty: m.certainty as InstrumentMention['certainty'], note: (m.note as string | null) ?? null, position,
    })),
    { transaction },
  );
  await PitchTag.bulkCreate(
    tags.map((t, position) => ({
      excerptId: excerpt.id, statement: String(t.statement), aHz: Number(t.aHz), centsFrom440: roundTo(centsFromModern(Number(t.aHz)), 1),
      derivation: t.derivation as PitchTag['derivation'], note: (t.note as string | null) ?? null, position,
    })),
    { transaction },
  );
  await loadExcerptChildren(excerpt, transaction);
}

export interface RestoreResult {
  target: Target;
  version: number;
  status: string;
}

/**
 * Restores an old version as a NEW version (nothing is overwritten): its content is
 * copied back, with a Revision and a search outbox row, in one transaction.
 * Restoring a version that was approved republishes it at once (the editor's reason is
 * recorded); restoring any other version puts the item in the review queue (submitted).
 */
export async function restoreRevision(
  actor: SessionUser,
  input: { kind: EntityKind; publicId: string; version: number; reason: string; baseVersion?: number },
): Promise<RestoreResult> {
  return getSequelize().transaction(async (transaction) => {
    const target = await lockTarget(input.kind, input.publicId, transaction);
    const { item } = target;
    if (input.baseVersion !== undefined && input.baseVersion !== item.version) {
      throw conflict(`This ${input.kind} changed while you were looking at it: now version ${item.version}, you saw ${input.baseVersion}. Reload the history first.`);
    }
    if (item.status === 'withdrawn') throw conflict(`This ${input.kind} was withdrawn by its contributor; it must be reopened before a version can be restored.`);
    if (input.version === item.version) throw conflict(`Version ${input.version} is already the current version.`);
    const revision = await Revision.findOne({ where: { entityType: input.kind, entityId: item.id, version: input.version }, transaction });
    if (!revision) throw notFound(`Version ${input.version}`);
    const snapshot = revision.snapshot;
    const wasApproved = snapshotStatus(snapshot) === 'approved' || (item.approvedVersion !== null && input.version === item.approvedVersion);
    const changes: Record<string, unknown> = {};
    for (const column of restoredColumns[input.kind]) if (column in snapshot) changes[column] = snapshot[column];
    if (item instanceof Excerpt) await replaceExcerptChildren(item, snapshot, transaction);
    const status = wasApproved ? 'approved' : 'submitted';
    Object.assign(changes, { status, ...(wasApproved ? { approvedVersion: item.version + 1 } : {}) });
    if (item instanceof Source && status === 'submitted') changes.submittedAt = new Date();
    const version = await writeNextVersion(target, changes, actor.id, `Restored version ${input.version}: ${input.reason}`, transaction);
    return { target, version, status };
  });
}
