import type { z } from 'zod';
import type { SessionUser } from '../auth/passport';
import { getSequelize } from '../db';
import type { Source } from '../models';
import { invalid, notFound } from '../errors';
import { authorize } from '../policies';
import { sourcePolicy } from '../policies/source';
import type { updateSourceSchema } from '@shared/catalogue/schemas';
import { assertEditable, assertVersion, dateColumns, lockSource, recordPublishedEdit, recordSourceVersion, stateAfterEdit } from './support';

export type UpdateSourceInput = z.output<typeof updateSourceSchema>;

/**
 * Saves a new version of a source (optimistic locking on `version`). Approved sources
 * go back to draft for review, keeping `approvedVersion`, unless an editor publishes.
 */
export async function updateSource(actor: SessionUser, publicId: string, input: UpdateSourceInput): Promise<Source> {
  const { version, reason, publish = false, ...changes } = input;
  const changed = Object.entries(changes).filter(([, value]) => value !== undefined);
  if (changed.length === 0) throw invalid({ _: 'Send at least one field to change.' }, 'Nothing to change.');
  if (publish) {
    authorize(actor, sourcePolicy.publish(actor), 'Only editors may publish a change without review; leave out "publish" to submit it for review.');
    if (!reason) throw invalid({ reason: 'Say why this change is published without review.' });
  }

  return getSequelize().transaction(async (transaction) => {
    const source = await lockSource(publicId, transaction);
    if (!sourcePolicy.read(actor, source)) throw notFound('The source');
    authorize(actor, sourcePolicy.update(actor, source), 'Only the contributor of this source or an editor may edit it.');
    assertEditable('source', source.status);
    assertVersion('source', source.version, version);
    if (publish && source.status !== 'approved') {
      throw invalid({ publish: 'Only approved sources can be published without review; submit this one instead.' });
    }

    source.set(Object.fromEntries(changed) as Partial<Source>);
    if (changes.dateEdtf !== undefined) source.set(dateColumns(changes.dateEdtf) as Partial<Source>);
    const nextVersion = source.version + 1;
    source.set({ version: nextVersion, status: stateAfterEdit(source.status, publish), approvedVersion: publish ? nextVersion : source.approvedVersion });
    await source.save({ transaction });
    await recordSourceVersion(source, actor.id, reason ?? null, transaction);
    if (publish) await recordPublishedEdit('source', source.id, nextVersion, actor.id, reason!, transaction);
    return source;
  });
}
