import type { Transaction } from 'sequelize';
import type { SessionUser } from '../auth/passport';
import { getSequelize } from '../db';
import { Source } from '../models';
import { newPublicId } from '../services/public-ids';
import type { SourceFields } from '@shared/catalogue/schemas';
import { dateColumns, recordSourceVersion } from './support';

/** A new draft source at version 1, with its first revision and search outbox row, in one transaction. */
export async function createSource(actor: SessionUser, input: SourceFields): Promise<Source> {
  return getSequelize().transaction((transaction) => insertDraftSource(actor, input, 'Created', transaction));
}

/** The insert itself, inside the caller's transaction (an import creates many sources in one). */
export async function insertDraftSource(actor: SessionUser, input: SourceFields, reason: string, transaction: Transaction): Promise<Source> {
  const date = dateColumns(input.dateEdtf);
  const source = await Source.create(
    {
      ...input,
      publicId: newPublicId('S'),
      dateEdtf: date.dateEdtf!,
      dateEarliest: date.dateEarliest!,
      dateLatest: date.dateLatest!,
      dateLabel: date.dateLabel!,
      status: 'draft',
      version: 1,
      approvedVersion: null,
      submittedAt: null,
      contributorId: actor.id,
    },
    { transaction },
  );
  await recordSourceVersion(source, actor.id, reason, transaction);
  return source;
}
