import type { Transaction } from 'sequelize';
import { Revision, type EntityType } from '../models/revision';
import { SearchOutbox } from '../models/search-outbox';

/**
 * Records version `version` of an entity as a full snapshot. Call it in the same
 * transaction as the change itself, so no change exists without its revision.
 */
export async function recordRevision(
  params: { entityType: EntityType; entityId: number; version: number; snapshot: Record<string, unknown>; authorId: number; reason?: string | null },
  transaction: Transaction,
): Promise<Revision> {
  return Revision.create({ ...params, reason: params.reason ?? null }, { transaction });
}

export async function revisionAt(entityType: EntityType, entityId: number, version: number, transaction?: Transaction) {
  return Revision.findOne({ where: { entityType, entityId, version }, transaction });
}

/**
 * Tells the search index to catch up with an entity; same transaction as the change,
 * so the database stays the truth even when the search service is down.
 */
export async function enqueueSearchSync(
  entityType: EntityType,
  entityId: number,
  operation: 'upsert' | 'delete',
  transaction: Transaction,
): Promise<void> {
  await SearchOutbox.create({ entityType, entityId, operation, availableAt: new Date(), lastError: null }, { transaction });
}
