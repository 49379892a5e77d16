import { Router } from 'express';
import { notFound } from '../../errors';
import { Op } from 'sequelize';
import { validate } from '../../http/validate';
import { allow, authorize } from '../../policies';
import { reviewPolicy } from '../../policies/review';
import { Excerpt, Review, Source } from '../../models';
import { decideReview } from '../../commands/decide-review';
import { presentReview, presentSubmission } from '../../presenters/review';
import { decisionSchema, reviewQueueQuerySchema, targetParamsSchema, type Decision, type ReviewQueueQuery } from '@shared/review/schemas';
import type { EntityKind, MySubmission } from '@shared/review/types';
import { loadQueue } from './queue';
import { buildReviewDetail } from './detail';
import { findTarget, ownerScope } from './targets';

/** The last decision on each item, keyed by entity id. */
async function lastReviews(kind: EntityKind, ids: number[]): Promise<Map<number, Review>> {
  const map = new Map<number, Review>();
  if (!ids.length) return map;
  const reviews = await Review.findAll({ where: { entityType: kind, entityId: ids }, include: ['editor'], order: [['createdAt', 'ASC'], ['id', 'ASC']] });
  for (const review of reviews) map.set(review.entityId, review);
  return map;
}

const urgency: Record<string, number> = { returned: 0, draft: 1, submitted: 2, rejected: 3, approved: 4, withdrawn: 5 };

export function reviewsRouter(): Router {
  const router = Router();

  router.get('/', allow(reviewPolicy.queue, 'Only editors see the review queue.'), validate({ query: reviewQueueQuerySchema }), async (req, res) => {
    res.json(await loadQueue(req.query as unknown as ReviewQueueQuery));
  });

  router.post('/', allow(reviewPolicy.decide, 'Only editors approve, return or reject submissions.'), validate({ body: decisionSchema }), async (req, res) => {
    const { review, target, alsoApproved } = await decideReview(req.user!, req.body as Decision);
    const { item } = target;
    res.status(201).json({
      data: presentReview(review),
      item: { kind: target.kind, id: item.publicId, status: item.status, version: item.version, approvedVersion: item.approvedVersion },
      alsoApproved: alsoApproved.map((e) => e.publicId),
    });
  });

  /** My submissions: everything the signed-in contributor added, with the last decision on each. */
  router.get('/mine', allow(reviewPolicy.mine, 'Sign in as a contributor to see your submissions.'), async (req, res) => {
    const me = req.user!.id;
    const sources = await Source.findAll({ where: { contributorId: me }, order: [['updatedAt', 'DESC']], limit: 500 });
    const excerpts = await Excerpt.findAll({
      where: { [Op.or]: [{ contributorId: me }, { sourceId: sources.map((s) => s.id) }] },
      include: ['source'],
      order: [['updatedAt', 'DESC']],
      limit: 2000,
    });
    const [sourceReviews, excerptReviews] = await Promise.all([
      lastReviews('source', sources.map((s) => s.id)),
      lastReviews('excerpt', excerpts.map((e) => e.id)),
    ]);
    const data: MySubmission[] = [
      ...sources.map((s) => presentSubmission('source', s, s, sourceReviews.get(s.id))),
      ...excerpts.map((e) => presentSubmission('excerpt', e, e.source!, excerptReviews.get(e.id))),
    ].sort((a, b) => urgency[a.status] - urgency[b.status] || b.updatedAt.localeCompare(a.updatedAt));
    res.json({ data });
  });

  router.get('/:kind/:id', validate({ params: targetParamsSchema }), async (req, res) => {
    const target = await findTarget(req.params.kind as EntityKind, req.params.id as string);
    const allowed = reviewPolicy.read(req.user, target.item, ownerScope(target));
    // Signed-in strangers learn nothing of another's unpublished work: it does not exist for them.
    if (!allowed && req.user && target.item.status !== 'approved') throw notFound('This item');
    authorize(req.user, allowed, 'Only editors and the contributor see this review.');
    res.json({ data: await buildReviewDetail(req.user, target) });
  });

  return router;
}
