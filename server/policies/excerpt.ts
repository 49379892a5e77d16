import type { Excerpt, Source } from '../models';
import type { ExcerptAbilities } from '@shared/catalogue/types';
import { isEditable } from '@shared/catalogue/workflow';
import { atLeast, type Actor } from './index';
import { isPublished, sourcePolicy } from './source';

type ExcerptLike = Pick<Excerpt, 'contributorId' | 'status' | 'approvedVersion'>;
type SourceLike = Pick<Source, 'contributorId' | 'status' | 'approvedVersion'>;

const isEditor = (actor: Actor): boolean => atLeast(actor, 'editor');
/** The excerpt's own contributor, or the owner of its source. */
const isOwner = (actor: Actor, excerpt: ExcerptLike, source: SourceLike): boolean =>
  atLeast(actor, 'contributor') && (actor.id === excerpt.contributorId || actor.id === source.contributorId);

export const excerptPolicy = {
  /** Adding an excerpt: the source's owner or an editor, while the source is editable. */
  create: (actor: Actor, source: SourceLike): boolean => sourcePolicy.update(actor, source),
  readCurrent: (actor: Actor, excerpt: ExcerptLike, source: SourceLike): boolean => isOwner(actor, excerpt, source) || isEditor(actor),
  read: (actor: Actor, excerpt: ExcerptLike, source: SourceLike): boolean =>
    (isPublished(excerpt) && isPublished(source)) || excerptPolicy.readCurrent(actor, excerpt, source),
  update: (actor: Actor, excerpt: ExcerptLike, source: SourceLike): boolean => isOwner(actor, excerpt, source) || isEditor(actor),
  publish: (actor: Actor): boolean => isEditor(actor),
};

export function excerptAbilities(actor: Actor, excerpt: ExcerptLike, source: SourceLike): ExcerptAbilities {
  const editable = isEditable(excerpt.status);
  return {
    update: excerptPolicy.update(actor, excerpt, source) && editable,
    review: isEditor(actor) && excerpt.status === 'submitted',
    publish: excerptPolicy.publish(actor) && editable,
  };
}
