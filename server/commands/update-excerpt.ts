import type { z } from 'zod';
import type { SessionUser } from '../auth/passport';
import { getSequelize } from '../db';
import type { Excerpt } from '../models';
import { invalid, notFound } from '../errors';
import { authorize } from '../policies';
import { excerptPolicy } from '../policies/excerpt';
import type { updateExcerptSchema } from '@shared/catalogue/schemas';
import { isValidLocator, locatorMessage } from '@shared/catalogue/locator';
import {
  assertEditable, assertVersion, dateColumns, lockExcerpt, recordExcerptVersion, recordPublishedEdit, replaceTags, stateAfterEdit,
} from './support';

export type UpdateExcerptInput = z.output<typeof updateExcerptSchema>;

/**
 * Saves a new version of an excerpt (optimistic locking on `version`); `mentions` and
 * `pitchTags`, when sent, replace the old lists. Approved excerpts go back to draft unless an editor publishes.
 */
export async function updateExcerpt(actor: SessionUser, publicId: string, input: UpdateExcerptInput): Promise<Excerpt> {
  const { version, reason, publish = false, mentions, pitchTags, dateEdtf, ...rest } = input;
  const fields = Object.fromEntries(Object.entries(rest).filter(([, value]) => value !== undefined)) as Partial<Excerpt>;
  if (Object.keys(fields).length === 0 && !mentions && !pitchTags && dateEdtf === undefined) {
    throw invalid({ _: 'Send at least one field to change.' }, 'Nothing to change.');
  }
  if (publish) {
    authorize(actor, excerptPolicy.publish(actor), 'Only editors may publish a change without review; leave out "publish" to submit it for review.');
    if (!reason) throw invalid({ reason: 'Say why this change is published without review.' });
  }

  return getSequelize().transaction(async (transaction) => {
    const { excerpt, source } = await lockExcerpt(publicId, transaction);
    if (!excerptPolicy.read(actor, excerpt, source)) throw notFound('The excerpt');
    authorize(actor, excerptPolicy.update(actor, excerpt, source), 'Only the contributor of this excerpt, the owner of its source or an editor may edit it.');
    assertEditable('excerpt', excerpt.status);
    assertVersion('excerpt', excerpt.version, version);
    if (publish && excerpt.status !== 'approved') {
      throw invalid({ publish: 'Only approved excerpts can be published without review; submit this one with its source instead.' });
    }
    // The schema checks a locator only when both parts are sent; check the pair as it will be stored.
    const locatorType = fields.locatorType ?? excerpt.locatorType;
    const locatorValue = fields.locatorValue ?? excerpt.locatorValue;
    if ((fields.locatorType || fields.locatorValue) && !isValidLocator(locatorType, locatorValue)) {
      throw invalid({ locatorValue: locatorMessage(locatorType) });
    }

    excerpt.set(fields);
    if (dateEdtf !== undefined) excerpt.set(dateColumns(dateEdtf));
    const nextVersion = excerpt.version + 1;
    excerpt.set({ version: nextVersion, status: stateAfterEdit(excerpt.status, publish), approvedVersion: publish ? nextVersion : excerpt.approvedVersion });
    await excerpt.save({ transaction });
    await replaceTags(excerpt.id, { mentions, pitchTags }, transaction);
    await recordExcerptVersion(excerpt, source.publicId, actor.id, reason ?? null, transaction);
    if (publish) await recordPublishedEdit('excerpt', excerpt.id, nextVersion, actor.id, reason!, transaction);
    return excerpt;
  });
}
