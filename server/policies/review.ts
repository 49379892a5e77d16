import type { Excerpt, Source } from '../models';
import { atLeast, type Actor } from './index';
import { sourcePolicy } from './source';

type Owned = Pick<Source | Excerpt, 'contributorId'>;

/** The contributor of the item or, for an excerpt, of its source. */
export const isContributorOf = (actor: Actor, item: Owned, source?: Owned) =>
  !!actor && (actor.id === item.contributorId || (!!source && actor.id === source.contributorId));

/**
 * Review rules. Only editors and admins decide; nobody decides on their own work — an
 * editor who contributed an item waits for another editor, as any contributor does.
 */
export const reviewPolicy = {
  queue: (actor: Actor) => sourcePolicy.review(actor),
  decide: (actor: Actor) => sourcePolicy.review(actor),
  /** False when the actor contributed the item (or its source): the four-eyes rule. */
  decideOn: (actor: Actor, item: Owned, source?: Owned) => sourcePolicy.review(actor) && !isContributorOf(actor, item, source),
  /** The review page: editors, and the contributor reading what the editors said. */
  read: (actor: Actor, item: Owned, source?: Owned) => atLeast(actor, 'editor') || isContributorOf(actor, item, source),
  mine: (actor: Actor) => atLeast(actor, 'contributor'),
  /** Resubmitting an excerpt: its contributor, the source's owner, or an editor. */
  submitExcerpt: (actor: Actor, item: Owned, source: Owned) => atLeast(actor, 'editor') || (atLeast(actor, 'contributor') && isContributorOf(actor, item, source)),
  /** History of versions: editors and the contributor see every version; others only approved ones. */
  readAllVersions: (actor: Actor, item: Owned, source?: Owned) => atLeast(actor, 'editor') || isContributorOf(actor, item, source),
  restore: (actor: Actor) => atLeast(actor, 'editor'),
  editConcordance: (actor: Actor) => atLeast(actor, 'editor'),
  outbox: (actor: Actor) => atLeast(actor, 'admin'),
};

export const ownWorkMessage = (kind: 'source' | 'excerpt') =>
  `You contributed this ${kind}, so another editor must decide on it: editors never approve, return or reject their own work.`;
