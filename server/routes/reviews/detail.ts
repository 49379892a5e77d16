import { Excerpt, Facsimile, Review, User } from '../../models';
import { presentReview } from '../../presenters/review';
import { snapshotExcerpt, snapshotSource } from '../../presenters/revision';
import { diffSnapshots } from '../../services/diffs';
import { revisionAt } from '../../services/revisions';
import { ownWorkMessage, reviewPolicy } from '../../policies/review';
import type { Actor } from '../../policies';
import { formatLocator } from '@shared/catalogue/locator';
import type { WorkflowState } from '@shared/catalogue/vocabulary';
import { stateLabels } from '@shared/catalogue/workflow';
import type { EntityKind, FacsimileInfo, ReviewDetail, VersionDiff } from '@shared/review/types';
import { presentCredit } from '../../presenters/user';
import { presentFacsimile } from '../../presenters/facsimile';
import { ownerScope, type LoadedTarget } from './targets';

export const currentSnapshot = (target: LoadedTarget) =>
  target.kind === 'source' ? snapshotSource(target.item) : snapshotExcerpt(target.item);

/** Diff between a stored version (or nothing) and the current content. */
export async function diffFromVersion(target: LoadedTarget, from: number | null): Promise<VersionDiff> {
  const { kind, item } = target;
  const base = from ? await revisionAt(kind, item.id, from) : null;
  return { kind, id: item.publicId, from: base ? from : null, to: item.version, changes: diffSnapshots(kind, base?.snapshot ?? null, currentSnapshot(target)) };
}

async function facsimileOf(target: LoadedTarget): Promise<FacsimileInfo | null> {
  const facsimile = await Facsimile.findOne({ where: { sourceId: target.source.id }, include: [{ model: User, as: 'uploadedBy', attributes: ['id', 'displayName'] }], order: [['createdAt', 'ASC']] });
  if (!facsimile) return null;
  return { view: presentFacsimile(facsimile, target.source.publicId), page: target.kind === 'excerpt' ? target.item.facsimilePage : 1 };
}

function decideAbility(actor: Actor, target: LoadedTarget): { decide: boolean; reason: string | null } {
  if (!reviewPolicy.decide(actor)) return { decide: false, reason: 'Only editors decide on submissions.' };
  if (!reviewPolicy.decideOn(actor, target.item, ownerScope(target))) return { decide: false, reason: ownWorkMessage(target.kind) };
  if (target.item.status !== 'submitted') return { decide: false, reason: `This ${target.kind} is “${stateLabels[target.item.status as WorkflowState]}”, not awaiting review.` };
  return { decide: true, reason: null };
}

/** Everything the review page shows about one source or excerpt. */
export async function buildReviewDetail(actor: Actor, target: LoadedTarget): Promise<ReviewDetail> {
  const { kind, item, source } = target;
  const reviews = await Review.findAll({
    where: { entityType: kind, entityId: item.id },
    include: [{ model: User, as: 'editor', attributes: ['id', 'displayName'] }],
    order: [['createdAt', 'DESC'], ['id', 'DESC']],
  });
  const contributor = await User.findByPk(item.contributorId, { attributes: ['id', 'displayName'] });
  const approved = item.approvedVersion && item.approvedVersion < item.version ? item.approvedVersion : null;
  const lastReviewed = reviews[0]?.version;
  const excerpts =
    kind === 'source'
      ? (await Excerpt.findAll({ where: { sourceId: source.id }, order: [['id', 'ASC']] })).map((e) => ({
          id: e.publicId,
          locator: formatLocator(e.locatorType, e.locatorValue),
          status: e.status,
          version: e.version,
        }))
      : [];
  return {
    kind,
    id: item.publicId,
    title: kind === 'source' ? source.title : `${source.title}, ${formatLocator(target.item.locatorType, target.item.locatorValue)}`,
    status: item.status,
    statusLabel: stateLabels[item.status as WorkflowState],
    version: item.version,
    approvedVersion: item.approvedVersion,
    contributor: presentCredit(contributor),
    source: { id: source.publicId, title: source.title, status: source.status },
    item: currentSnapshot(target),
    facsimile: await facsimileOf(target),
    diff: await diffFromVersion(target, approved),
    sinceLastReview: lastReviewed && lastReviewed < item.version ? await diffFromVersion(target, lastReviewed) : null,
    reviews: reviews.map(presentReview),
    excerpts,
    abilities: decideAbility(actor, target),
  };
}

export const kindOf = (value: string): EntityKind => (value === 'source' ? 'source' : 'excerpt');
