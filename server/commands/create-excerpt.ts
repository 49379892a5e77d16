import type { SessionUser } from '../auth/passport';
import { getSequelize } from '../db';
import { Excerpt } from '../models';
import { notFound } from '../errors';
import { authorize } from '../policies';
import { sourcePolicy } from '../policies/source';
import { excerptPolicy } from '../policies/excerpt';
import { newPublicId } from '../services/public-ids';
import type { ExcerptFields } from '@shared/catalogue/schemas';
import { assertEditable, dateColumns, lockSource, recordExcerptVersion, replaceTags } from './support';

/** A new draft excerpt of a source, with its mentions and pitch tags, revision 1 and outbox row. */
export async function createExcerpt(actor: SessionUser, sourcePublicId: string, input: ExcerptFields): Promise<Excerpt> {
  const { mentions, pitchTags, dateEdtf, ...fields } = input;
  const date = dateColumns(dateEdtf);
  return getSequelize().transaction(async (transaction) => {
    // Locking the source keeps a concurrent submission from missing this excerpt.
    const source = await lockSource(sourcePublicId, transaction);
    if (!sourcePolicy.read(actor, source)) throw notFound('The source');
    authorize(actor, excerptPolicy.create(actor, source), 'Only the contributor of this source or an editor may add excerpts to it.');
    assertEditable('source', source.status);
    const excerpt = await Excerpt.create(
      { ...fields, ...date, publicId: newPublicId('E'), sourceId: source.id, status: 'draft', version: 1, approvedVersion: null, contributorId: actor.id },
      { transaction },
    );
    await replaceTags(excerpt.id, { mentions, pitchTags }, transaction);
    await recordExcerptVersion(excerpt, source.publicId, actor.id, 'Created', transaction);
    return excerpt;
  });
}
