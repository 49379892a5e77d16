import { Router } from 'express';
import { validate } from '../../http/validate';
import { allow, authorize, isSignedIn } from '../../policies';
import { excerptPolicy } from '../../policies/excerpt';
import { reviewPolicy } from '../../policies/review';
import { conflict, notFound } from '../../errors';
import { getSequelize } from '../../db';
import { assertVersion, lockExcerpt, recordExcerptVersion } from '../../commands/support';
import { notifyEditorsOfSubmission } from '../../services/notifications';
import type { SessionUser } from '../../auth/passport';
import type { WorkflowState } from '@shared/catalogue/vocabulary';
import { stateLabels, transition } from '@shared/catalogue/workflow';
import { submitExcerptSchema, targetParamsSchema } from '@shared/review/schemas';

/** Sources whose excerpts may go to review one by one; a draft source takes its excerpts with it. */
const sourceStatesForSingleSubmit = ['submitted', 'approved'];

async function submitExcerpt(actor: SessionUser, publicId: string, input: { version?: number; reason?: string }) {
  return getSequelize().transaction(async (transaction) => {
    const { excerpt, source } = await lockExcerpt(publicId, transaction);
    if (!excerptPolicy.read(actor, excerpt, source)) throw notFound('The excerpt');
    authorize(actor, reviewPolicy.submitExcerpt(actor, excerpt, source), 'Only the contributor of this excerpt, the owner of its source or an editor may submit it.');
    if (input.version !== undefined) assertVersion('excerpt', excerpt.version, input.version);
    const next = transition(excerpt.status, 'submit');
    if (!next) {
      throw conflict(`This excerpt is “${stateLabels[excerpt.status as WorkflowState]}” and cannot be submitted: only drafts and returned excerpts go to review.`, { status: `The excerpt is ${excerpt.status}.` });
    }
    if (!sourceStatesForSingleSubmit.includes(source.status)) {
      throw conflict(`Its source is “${stateLabels[source.status as WorkflowState]}”: submit the source, and its excerpts go to review with it.`, { status: `The source is ${source.status}.` });
    }
    const resubmission = excerpt.status === 'returned';
    excerpt.set({ status: next, version: excerpt.version + 1 });
    await excerpt.save({ transaction });
    await recordExcerptVersion(excerpt, source.publicId, actor.id, input.reason ?? (resubmission ? 'Resubmitted after changes' : 'Submitted for review'), transaction);
    excerpt.source = source;
    return excerpt;
  });
}

/**
 * `POST /api/excerpts/:id/submit`: sends one draft or returned excerpt (back) to review,
 * e.g. after the contributor fixed what an editor returned, while its source is under
 * review or already approved.
 */
export function excerptSubmitRouter(): Router {
  const router = Router();
  router.post('/:id/submit', allow(isSignedIn), validate({ params: targetParamsSchema.pick({ id: true }), body: submitExcerptSchema }), async (req, res) => {
    const excerpt = await submitExcerpt(req.user!, req.params.id as string, req.body);
    await notifyEditorsOfSubmission(excerpt);
    res.json({ data: { id: excerpt.publicId, status: excerpt.status, version: excerpt.version } });
  });
  return router;
}
